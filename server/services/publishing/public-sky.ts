import type { FeedSky } from '@shared/schemas/kiosk-feed.ts';
import { nightDateAt } from '@shared/sky/time-zone.ts';
import { Venue } from '../../models/index.ts';
import { getSkySnapshot } from '../sky/index.ts';
import { feedSky } from './feed-sky.ts';
import { slugify } from './feed-text.ts';

/** A venue as the public site names it: its name and a slug made from it. */
export interface PublicVenue {
  id: string;
  name: string;
  slug: string;
}

/**
 * Every venue, by name, each with a slug (two venues of one name both get the start of their id,
 * as pages do). Venue names are public: they are the places visitors come to.
 */
export async function listPublicVenues(): Promise<PublicVenue[]> {
  const venues = await Venue.findAll({ attributes: ['id', 'name'], order: [['name', 'ASC']] });
  const count = new Map<string, number>();
  for (const v of venues) count.set(slugify(v.name), (count.get(slugify(v.name)) ?? 0) + 1);
  return venues.map((v) => {
    const base = slugify(v.name);
    return { id: v.id, name: v.name, slug: (count.get(base) ?? 0) > 1 ? `${base}-${v.id.slice(0, 8)}` : base };
  });
}

/**
 * A venue's sky for the night in progress there, in words and local times (the table the kiosks
 * show), from the stored nightly snapshot (computed now when missing).
 * @param slugOrId the venue's public slug or its id
 * @param now the server clock, epoch ms
 * @returns null when no venue has that slug or id
 */
export async function venueSkyTonight(slugOrId: string, now = Date.now()): Promise<{ venue: PublicVenue; sky: FeedSky } | null> {
  const key = slugOrId.toLowerCase();
  const venue = (await listPublicVenues()).find((v) => v.slug === key || v.id === key);
  if (!venue) return null;
  const row = await Venue.findByPk(venue.id, { attributes: ['id', 'timeZone'] });
  if (!row) return null;
  const snapshot = await getSkySnapshot(venue.id, nightDateAt(now, row.timeZone));
  if (!snapshot) return null;
  return { venue, sky: feedSky(snapshot.data, snapshot.computedAt, venue.name) };
}
