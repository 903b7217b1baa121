import type PgBoss from 'pg-boss';
import { logger } from '../../logger.ts';
import { Venue } from '../../models/index.ts';
import { refreshAllVenueSkies, refreshVenueSky } from './sky-snapshots.ts';
import { defineJob, enqueue } from '../../jobs/queue.ts';

const DAILY = 'sky.snapshots.daily';

/**
 * Recomputes one venue's sky for tonight and tomorrow night; enqueued when its position, elevation
 * or time zone changes. Without a running queue it runs inline.
 */
export const enqueueVenueSky = defineJob<{ venueId: string }>('sky.snapshots.venue', async ({ venueId }) => {
  const venue = await Venue.findByPk(venueId);
  if (venue) await refreshVenueSky(venue, new Date(), true);
});

defineJob<Record<string, never>>(DAILY, async () => {
  const computed = await refreshAllVenueSkies();
  if (computed) logger.info({ computed }, 'sky snapshots computed');
});

/**
 * Schedules the snapshot refresh. It runs hourly so that each venue gets its new night soon after
 * its own local date changes, whatever its time zone; a night already computed is not redone, so
 * each venue's sky is computed once a day. Also runs once now.
 * @param boss the running queue (from startJobQueue)
 */
export async function scheduleSkySnapshots(boss: PgBoss): Promise<void> {
  await boss.schedule(DAILY, '7 * * * *', {}, { tz: 'UTC' });
  await enqueue(DAILY, {});
}
