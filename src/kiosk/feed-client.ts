import type { KioskFeed } from '@shared/schemas/kiosk-feed.ts';
import { learnServerTime } from './clock.ts';

/** What a feed request came to. */
export type FeedAnswer =
  | { kind: 'fresh'; feed: KioskFeed; etag: string }
  | { kind: 'unchanged' }
  | { kind: 'unpaired' }
  | { kind: 'unreachable'; reason: string };

const TIMEOUT_MS = 15_000;

/**
 * The feed gives absolute image addresses from PUBLIC_URL, which a screen on the building's own
 * network may not reach (or its Content-Security-Policy may not allow). This server's renditions
 * (`/media/files/…`) are read from the origin the player was loaded from; a CDN's stay as they are.
 */
function servedHere(url: string): string {
  try {
    const parsed = new URL(url, location.href);
    return parsed.pathname.startsWith('/media/files/') ? `${location.origin}${parsed.pathname}` : url;
  } catch {
    return url;
  }
}

function withImagesFromHere(feed: KioskFeed): KioskFeed {
  for (const item of feed.items ?? []) {
    const image = item._starproof?.slide?.image;
    if (image) {
      image.hd = servedHere(image.hd);
      image.uhd = servedHere(image.uhd);
    }
  }
  return feed;
}

/**
 * Revalidates the feed with If-None-Match. Only a 401 means "pair again"; anything else that
 * goes wrong (no network, a timeout, a 5xx, a broken body) means "keep playing what you have".
 * @param url the kiosk feed or the staff preview feed
 * @param token the screen's token (none for the staff preview, which uses the session)
 * @param etag the ETag of the feed being played
 */
export async function fetchFeed(url: string, token: string | null, etag: string | null): Promise<FeedAnswer> {
  const headers: Record<string, string> = { Accept: 'application/feed+json, application/json' };
  if (token) headers.Authorization = `Bearer ${token}`;
  if (etag) headers['If-None-Match'] = etag;
  const controller = new AbortController();
  const timer = setTimeout(() => controller.abort(), TIMEOUT_MS);
  try {
    const res = await fetch(url, { headers, cache: 'no-cache', credentials: 'same-origin', signal: controller.signal });
    learnServerTime(res.headers.get('date'));
    if (res.status === 304) return { kind: 'unchanged' };
    if (res.status === 401 || res.status === 403) return { kind: 'unpaired' };
    if (!res.ok) return { kind: 'unreachable', reason: `server answered ${res.status}` };
    const feed = (await res.json()) as KioskFeed;
    if (!feed || !Array.isArray(feed.items) || !feed._starproof) return { kind: 'unreachable', reason: 'not a Starproof feed' };
    return { kind: 'fresh', feed: withImagesFromHere(feed), etag: res.headers.get('etag') ?? '' };
  } catch (err) {
    return { kind: 'unreachable', reason: err instanceof Error ? err.message : 'network error' };
  } finally {
    clearTimeout(timer);
  }
}

export const MEDIA_CACHE = 'starproof-kiosk-media';

/** Every image URL a feed shows (HD or 4K, whichever this screen uses). */
export function feedImageUrls(feed: KioskFeed, uhd: boolean): string[] {
  return feed.items.flatMap((i) => {
    const img = i._starproof.slide.image;
    return img ? [uhd ? img.uhd : img.hd] : [];
  });
}

/**
 * Puts a feed's images in the Cache API before the feed is played, so a slide never waits for
 * the network and plays on through an outage; images no longer used are let go.
 * @returns true when every image is cached
 */
export async function cacheFeedImages(urls: string[]): Promise<boolean> {
  if (!('caches' in window)) return true;
  try {
    const cache = await caches.open(MEDIA_CACHE);
    const results = await Promise.all(
      urls.map(async (url) => {
        if (await cache.match(url)) return true;
        const res = await fetch(url, { credentials: 'same-origin' });
        if (!res.ok) return false;
        await cache.put(url, res);
        return true;
      }),
    );
    if (!results.every(Boolean)) return false;
    // Only once the new set is complete: until then the old feed (and its images) keeps playing.
    const keep = new Set(urls.map((u) => new URL(u, location.href).href));
    for (const req of await cache.keys()) if (!keep.has(req.url)) await cache.delete(req);
    return true;
  } catch {
    return false;
  }
}

const objectUrls = new Map<string, string>();

/**
 * A URL the slide can show without the network: an object URL of the cached bytes when the image
 * is in the Cache API, else the address itself.
 */
export async function localImageUrl(url: string): Promise<string> {
  const known = objectUrls.get(url);
  if (known) return known;
  if (!('caches' in window)) return url;
  try {
    const hit = await (await caches.open(MEDIA_CACHE)).match(url);
    if (!hit) return url;
    const local = URL.createObjectURL(await hit.blob());
    objectUrls.set(url, local);
    return local;
  } catch {
    return url;
  }
}

/** Lets go of object URLs for images the current feed no longer shows. */
export function releaseImagesExcept(urls: string[]): void {
  const keep = new Set(urls);
  for (const [url, local] of objectUrls) {
    if (!keep.has(url)) {
      URL.revokeObjectURL(local);
      objectUrls.delete(url);
    }
  }
}
