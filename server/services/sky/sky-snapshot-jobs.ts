import { enqueue } from '../../jobs/queue.ts';
import { logger } from '../../logger.ts';
import { Venue } from '../../models/index.ts';
import { refreshAllVenueSkies, refreshVenueSky } from './sky-snapshots.ts';

/** The job kind of the hourly sky refresh of every venue (each venue's night computed once). */
export const DAILY_SKY_JOB = 'sky.snapshots.daily';
/** The job kind of one venue's sky refresh, after its position, elevation or time zone changed. */
export const VENUE_SKY_JOB = 'sky.snapshots.venue';

/**
 * Recomputes one venue's sky for tonight and tomorrow night; queued when its position, elevation
 * or time zone changes. Without a running queue it runs inline.
 */
export async function enqueueVenueSky(data: { venueId: string }): Promise<void> {
  await enqueue(VENUE_SKY_JOB, data);
}

/** The venue job: recompute one venue's sky. */
export async function runVenueSkyJob({ venueId }: { venueId: string }): Promise<void> {
  const venue = await Venue.findByPk(venueId);
  if (venue) await refreshVenueSky(venue, new Date(), true);
}

/** The refresh job: every venue whose night in progress is not stored yet gets it. */
export async function runDailySkyJob(): Promise<void> {
  const computed = await refreshAllVenueSkies();
  if (computed) logger.info({ computed }, 'sky snapshots computed');
}

/**
 * Queues the refresh once now (start-up), besides its hourly schedule. Several workers starting
 * together queue it once (one job per key and five-minute slot); a venue's night is computed once
 * even when two refreshes do overlap (see refreshVenueSky).
 */
export async function enqueueDailySky(): Promise<void> {
  await enqueue(DAILY_SKY_JOB, {}, { singletonKey: 'start-up', singletonSeconds: 300 });
}
