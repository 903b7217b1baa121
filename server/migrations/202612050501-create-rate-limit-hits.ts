import type { Migration } from './runner.ts';

// Request counters of the per-address (and per-user) rate limits, shared by every app server: one
// row per limiter and client, counted and reset in one atomic upsert. Expired rows are purged hourly.
export const up: Migration['up'] = async ({ context: qi }) => {
  await qi.sequelize.query(`
    CREATE TABLE rate_limit_hits (
      key text PRIMARY KEY,
      hits integer NOT NULL,
      reset_at timestamptz NOT NULL
    )`);
  await qi.sequelize.query('CREATE INDEX rate_limit_hits_reset_at ON rate_limit_hits (reset_at)');
};

export const down: Migration['down'] = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TABLE rate_limit_hits');
};
