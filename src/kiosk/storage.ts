import type { KioskFeed } from '@shared/schemas/kiosk-feed.ts';

/** What the player remembers between reloads (localStorage; the images live in the Cache API). */
export interface Pairing {
  token: string;
  screenId: string;
  screenName: string;
  venueName: string;
}

const PAIRING = 'starproof.kiosk.pairing';
const FEED = 'starproof.kiosk.feed';
const ORIENTATION = 'starproof.kiosk.orientation';

const read = <T>(key: string): T | null => {
  try {
    const raw = localStorage.getItem(key);
    return raw ? (JSON.parse(raw) as T) : null;
  } catch {
    return null;
  }
};

/** The screen's pairing, or null before pairing (or after a revocation). */
export const loadPairing = (): Pairing | null => read<Pairing>(PAIRING);

/** Keeps the token after a successful pairing. */
export function savePairing(pairing: Pairing): void {
  localStorage.setItem(PAIRING, JSON.stringify(pairing));
}

/** Forgets the token and the saved feed: the screen shows the pairing form. */
export function forgetPairing(): void {
  localStorage.removeItem(PAIRING);
  localStorage.removeItem(FEED);
  localStorage.removeItem(ORIENTATION);
}

/** How an admin set this screen to hang: auto (the viewport decides), landscape or portrait. */
export const loadScreenOrientation = (): 'auto' | 'landscape' | 'portrait' => {
  const v = localStorage.getItem(ORIENTATION);
  return v === 'landscape' || v === 'portrait' ? v : 'auto';
};

/**
 * Keeps the admin's setting from a heartbeat answer.
 * @returns true when it changed
 */
export function saveScreenOrientation(value: string): boolean {
  const v = value === 'landscape' || value === 'portrait' ? value : 'auto';
  if (v === loadScreenOrientation()) return false;
  localStorage.setItem(ORIENTATION, v);
  return true;
}

/** The last good feed with its ETag, to play through an outage and to revalidate with. */
export const loadSavedFeed = (): { feed: KioskFeed; etag: string } | null => read(FEED);

/** Saves a feed that was received whole and whose images were fetched. */
export function saveFeed(feed: KioskFeed, etag: string): void {
  try {
    localStorage.setItem(FEED, JSON.stringify({ feed, etag }));
  } catch {
    // Storage full: the feed in memory still plays; only a reload during an outage would lose it.
  }
}
