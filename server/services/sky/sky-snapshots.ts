import { QueryTypes } from 'sequelize';
import { SkyInputError } from '@shared/sky/errors.ts';
import { computeSkyTonight } from '@shared/sky/tonight.ts';
import { isLocalDate, nextDate, nightDateAt } from '@shared/sky/time-zone.ts';
import { SKY_VERSION, type SkyTonight } from '@shared/sky/types.ts';
import { getSequelize } from '../../db.ts';
import { SkySnapshot, Venue } from '../../models/index.ts';
import { skyEvents } from './events.ts';

/** The venue fields the sky depends on; a snapshot made for other values, or by older rules, is stale. */
function matchesVenue(sky: SkyTonight, venue: Venue): boolean {
  const o = sky.observer;
  return (
    sky.version === SKY_VERSION &&
    o.latitude === venue.latitude &&
    o.longitude === venue.longitude &&
    o.elevationM === venue.elevationM &&
    sky.timeZone === venue.timeZone
  );
}

/**
 * Computes and stores (replacing any earlier one) the sky for a venue and night.
 * @param venue the venue
 * @param localDate the evening's date "YYYY-MM-DD" in the venue's time zone
 * @param now the clock to record as computedAt
 */
export async function computeSkySnapshot(venue: Venue, localDate: string, now = new Date()): Promise<SkySnapshot> {
  const sky = computeSkyTonight({
    latitude: venue.latitude,
    longitude: venue.longitude,
    elevationM: venue.elevationM,
    timeZone: venue.timeZone,
    localDate,
    now,
  });
  // One row per venue and night: two jobs racing simply leave the later result.
  await getSequelize().query(
    `INSERT INTO sky_snapshots (venue_id, local_date, computed_at, data) VALUES (:venueId, :localDate, :computedAt, CAST(:data AS jsonb))
     ON CONFLICT (venue_id, local_date) DO UPDATE SET computed_at = EXCLUDED.computed_at, data = EXCLUDED.data`,
    { replacements: { venueId: venue.id, localDate, computedAt: now, data: JSON.stringify(sky) }, type: QueryTypes.INSERT },
  );
  return (await SkySnapshot.findOne({ where: { venueId: venue.id, localDate } }))!;
}

/**
 * The stored sky for a venue and night, computed now if it is missing or was made for the venue's
 * old position or time zone. For the feed and the staff screens.
 * @param venueId the venue
 * @param localDate the evening's date "YYYY-MM-DD"
 * @returns the snapshot, or null when there is no such venue
 * @throws SkyInputError when the date is not a real date
 */
export async function getSkySnapshot(venueId: string, localDate: string): Promise<SkySnapshot | null> {
  if (!isLocalDate(localDate))
    throw new SkyInputError('localDate', 'The date must be a real calendar date written YYYY-MM-DD, between 1800 and 2200.');
  const venue = await Venue.findByPk(venueId);
  if (!venue) return null;
  const stored = await SkySnapshot.findOne({ where: { venueId, localDate } });
  if (stored && matchesVenue(stored.data, venue)) return stored;
  return computeSkySnapshot(venue, localDate);
}

/**
 * Makes sure a venue has snapshots for the night in progress (or coming) and the next one. When
 * the night in progress is computed (a new night, or the venue moved) it says so (`nightComputed`),
 * so statements about the venue's night follow. Runs under a lock per venue (held by a transaction
 * that only waits), so two workers refreshing at once compute each night once: the second finds
 * the first's snapshots when the lock is released.
 * @param force recompute even when present (after the venue moved)
 */
export async function refreshVenueSky(venue: Venue, now = new Date(), force = false): Promise<number> {
  return getSequelize().transaction(async (transaction) => {
    await getSequelize().query("SELECT pg_advisory_xact_lock(hashtext('sky:' || :venueId))", {
      replacements: { venueId: venue.id },
      type: QueryTypes.SELECT,
      transaction,
    });
    const tonight = nightDateAt(now.getTime(), venue.timeZone);
    let computed = 0;
    for (const localDate of [tonight, nextDate(tonight)]) {
      const stored = force ? null : await SkySnapshot.findOne({ where: { venueId: venue.id, localDate } });
      if (stored && matchesVenue(stored.data, venue)) continue;
      await computeSkySnapshot(venue, localDate, now);
      computed += 1;
      if (localDate === tonight) skyEvents.emit('nightComputed', { venueId: venue.id, localDate });
    }
    return computed;
  });
}

/** Every venue's coming nights, and old snapshots removed (kept a week for the record). */
export async function refreshAllVenueSkies(now = new Date()): Promise<number> {
  let computed = 0;
  for (const venue of await Venue.findAll({ order: [['name', 'ASC']] })) computed += await refreshVenueSky(venue, now);
  await getSequelize().query("DELETE FROM sky_snapshots WHERE local_date < (CURRENT_DATE - INTERVAL '8 days')");
  return computed;
}
