import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '../db.ts';

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

/** The job kind that removes counters whose window has ended. */
export const RATE_LIMIT_PURGE_JOB = 'rate-limits.purge';

/** Removes counters whose window ended (hourly): a row per address that once called would otherwise stay. */
export async function runRateLimitPurgeJob(): Promise<void> {
  await getSequelize().query('DELETE FROM rate_limit_hits WHERE reset_at <= now()', { type: QueryTypes.DELETE });
}
