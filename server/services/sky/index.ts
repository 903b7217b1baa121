/**
 * The sky of a venue: venues, the stored nightly sky snapshots and the jobs that compute them.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { skyEvents } from './events.ts';
export { DAILY_SKY_JOB, enqueueDailySky, runDailySkyJob, runVenueSkyJob, VENUE_SKY_JOB } from './sky-snapshot-jobs.ts';
export { getSkySnapshot } from './sky-snapshots.ts';
export { createVenue, deleteVenue, updateVenue } from './venue-save.ts';
