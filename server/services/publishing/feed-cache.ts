import { createHash } from 'node:crypto';
import { logger } from '../../logger.ts';
import { buildKioskFeed, type FeedTarget } from './feed-build.ts';
import { feedFingerprint, type FeedDeps } from './feed-fingerprint.ts';
import { config } from '../../config.ts';
import { readForPublic } from './public-reads.ts';

/** A built feed, ready to send as it is. */
export interface CachedFeed {
  body: Buffer;
  /** Strong validator: the SHA-256 of the exact bytes. */
  etag: string;
  deps: FeedDeps;
  fingerprint: string;
  /** Hash of the content without the build time, so a rebuild that changes nothing keeps its ETag. */
  contentHash: string;
  validUntil: number | null;
  checkedAt: number;
  builtAt: number;
}

/** How often (ms) a cached feed's fingerprint is compared with the database; other instances' changes show within this. */
const CHECK_MS = config.feedCheckMs;
/** From this age a request still answers from memory but starts the next check in the background. */
const RECHECK_MS = CHECK_MS / 2;

const entries = new Map<string, CachedFeed>();
const pending = new Map<string, { job: Promise<CachedFeed>; startedAt: number }>();
let generation = 0;
const stats = { builds: 0, checks: 0 };

const keyOf = (t: FeedTarget) => `${t.channelId ?? `venue:${t.venueId}`}|${t.language ?? ''}`;
const sha = (data: string | Buffer) => createHash('sha256').update(data).digest('base64url');

async function build(target: FeedTarget, previous: CachedFeed | undefined): Promise<CachedFeed> {
  return readForPublic((asOf) => buildAsOf(target, previous, asOf));
}

async function buildAsOf(target: FeedTarget, previous: CachedFeed | undefined, asOf: number): Promise<CachedFeed> {
  const startedGeneration = generation;
  let guess = previous?.deps;
  for (let attempt = 0; ; attempt += 1) {
    // Fingerprint before and after reading: equal means nothing moved while the feed was built.
    const before = guess ? await feedFingerprint(guess) : '';
    const now = Date.now();
    const built = await buildKioskFeed(target, now);
    const after = await feedFingerprint(built.deps);
    stats.builds += 1;
    const settled = before === after;
    if (!settled && attempt < 2) {
      guess = built.deps;
      continue;
    }
    const { server_time: _time, ...stable } = built.feed._starproof;
    const contentHash = sha(JSON.stringify({ ...built.feed, _starproof: stable }));
    const reuse = previous && previous.contentHash === contentHash;
    const body = reuse ? previous.body : Buffer.from(JSON.stringify(built.feed));
    const fingerprint = settled && generation === startedGeneration ? after : '';
    return {
      body,
      etag: reuse ? previous.etag : `"${sha(body)}"`,
      deps: built.deps,
      // Unsettled, or an event arrived meanwhile: keep the result but rebuild on the next request.
      fingerprint,
      contentHash,
      validUntil: built.validUntil,
      checkedAt: fingerprint ? asOf : 0,
      builtAt: now,
    };
  }
}

async function refresh(
  key: string,
  target: FeedTarget,
  previous: CachedFeed | undefined,
  checkOnly: boolean,
): Promise<CachedFeed> {
  if (checkOnly && previous) {
    stats.checks += 1;
    const startedGeneration = generation;
    const checked = await readForPublic(async (asOf) => {
      const same = (await feedFingerprint(previous.deps)) === previous.fingerprint && previous.fingerprint;
      return same ? asOf : null;
    });
    // An event during the check (a background one, say) outdates what it checked: build instead.
    if (checked !== null && generation === startedGeneration) {
      previous.checkedAt = checked;
      return previous;
    }
  }
  const fresh = await build(target, previous);
  entries.set(key, fresh);
  return fresh;
}

/**
 * The kiosk feed for a channel (or a screen without one), built once per change: from memory when
 * nothing it depends on has changed, rebuilt after a local domain event, when a slide window opens
 * or closes or the night changes, or when the fingerprint shows a change made by another instance.
 * Concurrent requests share one build or check.
 * @param target the channel and venue
 * @param checkedAfter when set, the answer must come from a check begun at or after this time (ms):
 *   a player whose validator does not match may have been served a newer feed by another server
 */
export async function getKioskFeed(target: FeedTarget, checkedAfter = 0): Promise<CachedFeed> {
  const key = keyOf(target);
  const entry = entries.get(key);
  const expired = !entry || (entry.validUntil !== null && Date.now() >= entry.validUntil);
  const ready = freshKioskFeed(target);
  if (ready && ready.checkedAt >= checkedAfter) return ready;
  return share(key, target, entry, !expired, checkedAfter);
}

/**
 * The kiosk feed from memory, without waiting, when it is still within its check time (else
 * undefined: ask getKioskFeed). Past half that time it starts the next check in the background, so
 * a channel polled steadily is checked before its time runs out and no request waits for the
 * database.
 * @param target the channel and venue
 */
export function freshKioskFeed(target: FeedTarget): CachedFeed | undefined {
  const key = keyOf(target);
  const entry = entries.get(key);
  if (!entry) return undefined;
  const now = Date.now();
  if (entry.validUntil !== null && now >= entry.validUntil) return undefined;
  const age = now - entry.checkedAt;
  if (age >= CHECK_MS) return undefined;
  if (age >= RECHECK_MS && !pending.has(key)) {
    share(key, target, entry, true).catch((error: unknown) =>
      logger.warn({ err: error, key }, 'kiosk feed background check failed'),
    );
  }
  return entry;
}

/**
 * The check or build already running for this feed (when it began late enough), or a new one;
 * concurrent requests share it.
 */
function share(
  key: string,
  target: FeedTarget,
  entry: CachedFeed | undefined,
  checkOnly: boolean,
  checkedAfter = 0,
): Promise<CachedFeed> {
  const inFlight = pending.get(key);
  if (inFlight && inFlight.startedAt >= checkedAfter) return inFlight.job;
  const startedAt = Date.now();
  const job: Promise<CachedFeed> = refresh(key, target, entry, checkOnly).finally(() => {
    if (pending.get(key)?.job === job) pending.delete(key);
  });
  pending.set(key, { job, startedAt });
  return job;
}

/** Drops every cached feed (a domain event: the next request rebuilds, keeping the ETag when nothing changed). */
export function invalidateKioskFeeds(reason: string): void {
  generation += 1;
  for (const [key, entry] of entries) entries.set(key, { ...entry, validUntil: 0 });
  // A check or build already running read the rows before the event: the next request starts anew.
  pending.clear();
  logger.debug({ reason }, 'kiosk feeds invalidated');
}

/** Counters for the benchmark and tests: how many builds and fingerprint checks ran. */
export function kioskFeedStats(): { builds: number; checks: number } {
  return { ...stats };
}
