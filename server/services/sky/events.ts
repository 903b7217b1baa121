import { EventEmitter } from 'node:events';

/** What each sky event carries. */
export interface SkyEventMap {
  /** A venue's sky for the night in progress (or coming) was computed and stored: a new night, or the venue moved. */
  nightComputed: [{ venueId: string; localDate: string }];
}

/**
 * Domain events of the sky snapshots, emitted after the snapshot is stored. One process only:
 * listeners that must survive a restart enqueue a job.
 */
export const skyEvents = new EventEmitter<SkyEventMap>();
