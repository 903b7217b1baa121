import type PgBoss from 'pg-boss';
import { TIMELINE_TEMPLATE_IDS } from '@shared/statements/index.ts';
import { registerBatchJob, registerJob } from './jobs/queue.ts';
import { RATE_LIMIT_PURGE_JOB, runRateLimitPurgeJob } from './middlewares/rate-limit-store.ts';
import { forgetKioskAssignments, forgetKioskScreen } from './middlewares/kiosk-feed-auth.ts';
import { catalogueEvents } from './services/catalogue/index.ts';
import { RENDITIONS_JOB, registerMediaUsageProvider, runRenditionsJob } from './services/media/index.ts';
import {
  DIGEST_JOB,
  PAGE_RECHECK_JOB,
  PUBLISH_DUE_JOB,
  pagesUsingMedia,
  queuePageRecheck,
  queueRecheckClear,
  RECHECK_CLEAR_JOB,
  runRecheckClearJob,
  runDigestJob,
  runPageRecheckJob,
  runPublishDueJob,
} from './services/pages/index.ts';
import {
  channelsUsingMedia,
  invalidateKioskFeeds,
  invalidatePublicPages,
  publishingEvents,
  runScreenSilenceJob,
  SCREEN_SILENCE_JOB,
} from './services/publishing/index.ts';
import { settingsEvents } from './services/settings/index.ts';
import {
  DAILY_SKY_JOB,
  enqueueDailySky,
  runDailySkyJob,
  runVenueSkyJob,
  skyEvents,
  VENUE_SKY_JOB,
} from './services/sky/index.ts';
import {
  enqueueRecompute,
  queueRecompute,
  RECOMPUTE_BATCH,
  RECOMPUTE_JOB,
  runRecomputeJobs,
  statementEvents,
} from './services/statements/index.ts';
import { runTokenPurgeJob, TOKEN_PURGE_JOB } from './services/users/index.ts';

let wired = false;

/**
 * The server's whole event graph, in one place: which domain reacts to which other domain's event,
 * every background job, and who may say that an image is in use. Each domain declares its events
 * (`services/<domain>/events.ts`) and emits them after commit; nothing registers itself at import.
 * Called by createApp; idempotent, since tests build many apps in one process.
 */
export function wireServer(): void {
  if (wired) return;
  wired = true;

  // ── Catalogue → statements ────────────────────────────────────────────────────────────────
  // a measurement changes (created, edited, reviewed, retired) → its statements, and its object's, recompute
  catalogueEvents.on('measurementChanged', ({ measurementId }) => queueRecompute({ measurementId }));
  // a reviewer chooses another preferred measurement → the object's statements recompute
  catalogueEvents.on('preferredChanged', ({ skyObjectId }) => queueRecompute({ skyObjectId }));
  // a source's citation or identifiers change → the statements citing it recompute
  catalogueEvents.on('sourceChanged', ({ sourceId }) => queueRecompute({ sourceId }));
  // an object's name, kind or sentence names change → its statements recompute (a new kind may put one
  // outside its template's kinds, which sends it to review)
  catalogueEvents.on('objectChanged', ({ skyObjectId }) => queueRecompute({ skyObjectId }));

  // ── Sky → statements ──────────────────────────────────────────────────────────────────────
  // a venue's new night is computed (or the venue moved) → that venue's statements for that night recompute
  skyEvents.on('nightComputed', ({ venueId, localDate }) => queueRecompute({ venueId, localDate }));

  // ── Settings → statements (the settings service waits for these: see emitAndWait) ─────────
  // an admin adopts another cosmology → every statement recomputes
  settingsEvents.on('cosmologyAdopted', () => enqueueRecompute({ scope: { all: true } }));
  // the default band or the default spectral indices change → every statement recomputes
  settingsEvents.on('statementDefaultsChanged', () => enqueueRecompute({ scope: { all: true } }));
  // an admin edits Earth's timeline → the statements that compare with it ("when the light set out") recompute
  settingsEvents.on('timelineChanged', () => enqueueRecompute({ scope: { templateIds: [...TIMELINE_TEMPLATE_IDS] } }));

  // ── Statements → pages ────────────────────────────────────────────────────────────────────
  // statement text changes → pages using it go to re-check
  statementEvents.on('textChanged', queuePageRecheck);
  // a statement breaks → pages using it go to re-check
  statementEvents.on('broken', queuePageRecheck);
  // a statement reads again as it was signed (recomputed back, or its wording accepted) → pages whose
  // every statement is back leave "needs re-check" for the state they were signed off in
  statementEvents.on('recovered', queueRecheckClear);
  statementEvents.on('accepted', queueRecheckClear);

  // ── Statements and publishing → kiosk feeds (the feed's fingerprint decides what really moved) ──
  // page published / unpublished → kiosk feeds rebuild
  publishingEvents.on('pagePublished', () => invalidateKioskFeeds('page published'));
  publishingEvents.on('pageUnpublished', () => invalidateKioskFeeds('page unpublished'));
  // an image's credit, licence, alt text or focal point changes → kiosk feeds rebuild
  publishingEvents.on('mediaChanged', () => invalidateKioskFeeds('media changed'));
  // a channel or its slides are edited → kiosk feeds rebuild
  publishingEvents.on('channelChanged', () => invalidateKioskFeeds('channel changed'));
  // statement wording accepted, changed or broken → kiosk feeds rebuild
  statementEvents.on('accepted', () => invalidateKioskFeeds('statement accepted'));
  statementEvents.on('textChanged', () => invalidateKioskFeeds('statement changed'));
  statementEvents.on('broken', () => invalidateKioskFeeds('statement broken'));

  // ── Statements and publishing → the public API and Atom feed ──────────────────────────────
  // page published / unpublished, image details, statement wording accepted or changed → public pages rebuild
  publishingEvents.on('pagePublished', invalidatePublicPages);
  publishingEvents.on('pageUnpublished', invalidatePublicPages);
  publishingEvents.on('mediaChanged', invalidatePublicPages);
  // The public pages head pages about the Sun with the organisation's notice, in its current words.
  settingsEvents.on('eyeSafetyNoticeChanged', invalidatePublicPages);
  statementEvents.on('accepted', invalidatePublicPages);
  statementEvents.on('textChanged', invalidatePublicPages);

  // ── Publishing → kiosk sign-in cache ──────────────────────────────────────────────────────
  // a screen is revoked → its remembered sign-in ends at once
  publishingEvents.on('screenRevoked', ({ screenId }) => forgetKioskScreen(screenId));
  // a screen's language changes → its remembered sign-in (which carries the language) is read again
  publishingEvents.on('screenChanged', ({ screenId }) => forgetKioskScreen(screenId));
  // a channel changes (screens moved, channel removed) → screens' channel assignments are looked up again
  publishingEvents.on('channelChanged', forgetKioskAssignments);

  // ── Media usage: who may say an image is in use (the library refuses to delete it then) ────
  registerMediaUsageProvider('pages', pagesUsingMedia);
  registerMediaUsageProvider('channels', channelsUsingMedia);

  // ── Background jobs (pg-boss; inline when no queue runs) ──────────────────────────────────
  // statements: queued recomputes, up to RECOMPUTE_BATCH at once, merged into one
  registerBatchJob(RECOMPUTE_JOB, runRecomputeJobs, { batchSize: RECOMPUTE_BATCH });
  // pages: look for pages that use changed or broken statements
  registerJob(PAGE_RECHECK_JOB, runPageRecheckJob);
  registerJob(RECHECK_CLEAR_JOB, runRecheckClearJob);
  // pages: the morning digest e-mail, and publishing pages whose scheduled time has come
  registerJob(DIGEST_JOB, runDigestJob);
  registerJob(PUBLISH_DUE_JOB, runPublishDueJob);
  // media: an image's renditions
  registerJob(RENDITIONS_JOB, runRenditionsJob);
  // sky: every venue's night in progress, and one venue after it moved
  registerJob(DAILY_SKY_JOB, runDailySkyJob);
  registerJob(VENUE_SKY_JOB, runVenueSkyJob);
  // users: expired sign-in links
  registerJob(TOKEN_PURGE_JOB, runTokenPurgeJob);
  // rate limits: counters whose window has ended
  registerJob(RATE_LIMIT_PURGE_JOB, runRateLimitPurgeJob);
  // publishing: kiosk screens silent for longer than their channel allows → one e-mail to admins per outage
  registerJob(SCREEN_SILENCE_JOB, runScreenSilenceJob);
}

/**
 * Every schedule, on the running queue (server start-up only; tests run jobs directly). Times
 * are UTC.
 * @param boss the running queue (from startJobQueue)
 */
export async function startSchedules(boss: PgBoss): Promise<void> {
  // hourly at :07, so each venue gets its new night soon after its own local date changes (a
  // night already computed is not redone); and once now
  await boss.schedule(DAILY_SKY_JOB, '7 * * * *', {}, { tz: 'UTC' });
  await enqueueDailySky();
  // the page digest at 07:00 each day
  await boss.schedule(DIGEST_JOB, '0 7 * * *', {}, { tz: 'UTC' });
  // scheduled publications, checked every minute
  await boss.schedule(PUBLISH_DUE_JOB, '* * * * *', {}, { tz: 'UTC' });
  // expired sign-in links, removed daily at 03:17
  await boss.schedule(TOKEN_PURGE_JOB, '17 3 * * *', {}, { tz: 'UTC' });
  // rate-limit counters whose window has ended, hourly at :41
  await boss.schedule(RATE_LIMIT_PURGE_JOB, '41 * * * *', {}, { tz: 'UTC' });
  // silent kiosk screens, checked every minute
  await boss.schedule(SCREEN_SILENCE_JOB, '* * * * *', {}, { tz: 'UTC' });
}
