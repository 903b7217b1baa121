import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '../db.ts';
import { logger } from '../logger.ts';

/**
 * express-rate-limit's counters in PostgreSQL (table `rate_limit_hits`), so every app server
 * behind a balancer counts against one limit: a client cannot multiply its allowance by the number
 * of servers. Each hit is one atomic upsert that starts a fresh window when the old one has ended.
 * A database error fails the request (express-rate-limit's default), as any other query would.
 */
export class PgRateLimitStore implements Store {
  /** Counted in the database, so a key incremented on one server counts on all of them. */
  localKeys = false;
  prefix: string;
  private windowMs = 60_000;

  /** @param name the limiter's name, prefixed to its keys so limiters never share a counter */
  constructor(name: string) {
    this.prefix = `${name}:`;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<IncrementResponse | undefined> {
    const [row] = await getSequelize().query<{ hits: number; reset_at: Date }>(
      'SELECT hits, reset_at FROM rate_limit_hits WHERE key = :key AND reset_at > now()',
      { replacements: { key: this.prefix + key }, type: QueryTypes.SELECT },
    );
    return row ? { totalHits: row.hits, resetTime: row.reset_at } : undefined;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const [row] = await getSequelize().query<{ hits: number; reset_at: Date }>(
      `INSERT INTO rate_limit_hits AS r (key, hits, reset_at)
         VALUES (:key, 1, now() + make_interval(secs => :windowMs / 1000.0))
       ON CONFLICT (key) DO UPDATE SET
         hits = CASE WHEN r.reset_at <= now() THEN 1 ELSE r.hits + 1 END,
         reset_at = CASE WHEN r.reset_at <= now() THEN EXCLUDED.reset_at ELSE r.reset_at END
       RETURNING hits, reset_at`,
      { replacements: { key: this.prefix + key, windowMs: this.windowMs }, type: QueryTypes.SELECT },
    );
    return { totalHits: row!.hits, resetTime: row!.reset_at };
  }

  async decrement(key: string): Promise<void> {
    await getSequelize().query('UPDATE rate_limit_hits SET hits = greatest(hits - 1, 0) WHERE key = :key', {
      replacements: { key: this.prefix + key },
      type: QueryTypes.UPDATE,
    });
  }

  async resetKey(key: string): Promise<void> {
    await getSequelize().query('DELETE FROM rate_limit_hits WHERE key = :key', {
      replacements: { key: this.prefix + key },
      type: QueryTypes.DELETE,
    });
  }
}

/** How often a tallied store adds its hits to the shared counters. */
const TALLY_FLUSH_MS = 1000;

/**
 * A shared counter for the public paths, read by the thousand per second: hits are counted in memory
 * and added to `rate_limit_hits` once a second, every address in one statement, instead of one
 * upsert on the primary per page view. A client's total is the shared count as of the last flush
 * plus this server's hits since; so across N servers a client may pass the limit by what it sends
 * the others within a second, which is fine for an allowance meant to stop scraping, not guessing
 * (sign-in and pairing keep the exact store). A failed flush is logged and its hits dropped: public
 * reads keep answering while the database is away.
 */
export class TalliedPgRateLimitStore implements Store {
  localKeys = false;
  prefix: string;
  private windowMs = 60_000;
  /** Hits on this server not yet added to the shared counters. */
  private pending = new Map<string, number>();
  /** The shared counters as the last flush returned them. */
  private shared = new Map<string, IncrementResponse>();
  private timer: NodeJS.Timeout | undefined;
  private flushing: Promise<void> | undefined;

  /** @param name the limiter's name, prefixed to its keys so limiters never share a counter */
  constructor(name: string) {
    this.prefix = `${name}:`;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async get(key: string): Promise<IncrementResponse | undefined> {
    const pending = this.pending.get(key) ?? 0;
    const shared = this.current(key);
    if (!shared && !pending) return undefined;
    return { totalHits: (shared?.totalHits ?? 0) + pending, resetTime: shared?.resetTime };
  }

  async increment(key: string): Promise<IncrementResponse> {
    const pending = (this.pending.get(key) ?? 0) + 1;
    this.pending.set(key, pending);
    this.timer ??= setTimeout(() => void this.flush(), TALLY_FLUSH_MS).unref();
    const shared = this.current(key);
    return {
      totalHits: (shared?.totalHits ?? 0) + pending,
      resetTime: shared?.resetTime ?? new Date(Date.now() + this.windowMs),
    };
  }

  async decrement(key: string): Promise<void> {
    const pending = this.pending.get(key) ?? 0;
    if (pending > 0) this.pending.set(key, pending - 1);
  }

  async resetKey(key: string): Promise<void> {
    this.pending.delete(key);
    this.shared.delete(key);
    await getSequelize().query('DELETE FROM rate_limit_hits WHERE key = :key', {
      replacements: { key: this.prefix + key },
      type: QueryTypes.DELETE,
    });
  }

  /** Adds this server's hits to the shared counters now (also what the timer calls). */
  flush(): Promise<void> {
    this.flushing ??= this.addPending().finally(() => {
      this.flushing = undefined;
    });
    return this.flushing;
  }

  private current(key: string): IncrementResponse | undefined {
    const shared = this.shared.get(key);
    if (shared?.resetTime && shared.resetTime.getTime() <= Date.now()) {
      this.shared.delete(key);
      return undefined;
    }
    return shared;
  }

  private async addPending(): Promise<void> {
    this.timer = undefined;
    const now = Date.now();
    for (const [key, counter] of this.shared)
      if (counter.resetTime && counter.resetTime.getTime() <= now) this.shared.delete(key);
    const batch = this.pending;
    if (!batch.size) return;
    this.pending = new Map();
    const keys = [...batch.keys()];
    try {
      const rows = await getSequelize().query<{ key: string; hits: number; reset_at: Date }>(
        `INSERT INTO rate_limit_hits AS r (key, hits, reset_at)
           SELECT t.key, t.hits, now() + make_interval(secs => :windowMs / 1000.0)
             FROM unnest(ARRAY[:keys]::text[], ARRAY[:hits]::int[]) AS t(key, hits)
         ON CONFLICT (key) DO UPDATE SET
           hits = CASE WHEN r.reset_at <= now() THEN EXCLUDED.hits ELSE r.hits + EXCLUDED.hits END,
           reset_at = CASE WHEN r.reset_at <= now() THEN EXCLUDED.reset_at ELSE r.reset_at END
         RETURNING key, hits, reset_at`,
        {
          replacements: { keys: keys.map((k) => this.prefix + k), hits: keys.map((k) => batch.get(k)!), windowMs: this.windowMs },
          type: QueryTypes.SELECT,
        },
      );
      for (const row of rows)
        this.shared.set(row.key.slice(this.prefix.length), { totalHits: row.hits, resetTime: row.reset_at });
    } catch (err) {
      logger.warn(
        { err, limiter: this.prefix.slice(0, -1), keys: keys.length },
        'rate-limit tally not saved; its hits are dropped',
      );
    }
  }
}

/** The job kind that removes counters whose window has ended. */
export const RATE_LIMIT_PURGE_JOB = 'rate-limits.purge';

/** Removes counters whose window ended (hourly): a row per address that once called would otherwise stay. */
export async function runRateLimitPurgeJob(): Promise<void> {
  await getSequelize().query('DELETE FROM rate_limit_hits WHERE reset_at <= now()', { type: QueryTypes.DELETE });
}
