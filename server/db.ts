import { Sequelize, type Transaction } from 'sequelize';
import { config } from './config.ts';

let instance: Sequelize | undefined;

/** Longest wait for a free pooled connection (ms). */
export const ACQUIRE_TIMEOUT_MS = 5_000;

/**
 * Timeouts for every pg pool (Sequelize, sessions, pg-boss): connecting gives up after 5 s; a query
 * is cancelled by the server after `dbQueryTimeoutMs` (statement_timeout) and, when the server is
 * frozen and cannot cancel anything, abandoned by the client just after (query_timeout). A request
 * therefore answers within acquire + one query timeout, however long the database stays frozen.
 * @param queryTimeoutMs the pool's own bound, when shorter than the setting (sessions)
 */
export function poolTimeouts(queryTimeoutMs = config.dbQueryTimeoutMs) {
  return {
    connectionTimeoutMillis: 5_000,
    statement_timeout: queryTimeoutMs,
    query_timeout: queryTimeoutMs + 500,
    // random_page_cost 1.1 (common practice for solid-state storage, instead of the default 4 that
    // assumes spinning disks): with 4, PostgreSQL prefers a name index whose heap happens to be in
    // name order over the catalogue's exact partial index, and filters through 500,000 rows.
    options: '-c random_page_cost=1.1',
  };
}

/** The one Sequelize instance; created on first use so the URL can be decided at start-up. */
export function getSequelize(): Sequelize {
  if (!instance) {
    const url = config.databaseUrl;
    if (!url) throw new Error('DATABASE_URL is not set and no local PostgreSQL was started.');
    instance = new Sequelize(url, {
      dialect: 'postgres',
      logging: false,
      // Waiting for a free connection ends after ACQUIRE_TIMEOUT_MS with 503 `busy` (see error-handler.ts).
      pool: { max: 10, min: 0, acquire: ACQUIRE_TIMEOUT_MS, idle: 10_000 },
      // A dead or frozen database must fail requests quickly rather than hang them.
      dialectOptions: poolTimeouts(),
    });
  }
  return instance;
}

/** Closes the pool (tests, shutdown). */
export async function closeSequelize(): Promise<void> {
  if (instance) {
    await instance.close();
    instance = undefined;
  }
}

/**
 * Lets one transaction's statements run for up to `seconds` (a bulk import), on the server
 * (statement_timeout) and in the client (pg's query_timeout, which would otherwise abandon the
 * query at the pool's bound); the connection gets the pool's bound back when the transaction ends.
 */
export async function allowLongStatements(transaction: Transaction, seconds: number): Promise<void> {
  await getSequelize().query(`SET LOCAL statement_timeout = '${Math.round(seconds)}s'`, { transaction });
  const connection = (transaction as unknown as { connection?: { connectionParameters?: { query_timeout?: number } } })
    .connection;
  const params = connection?.connectionParameters;
  if (!params) return;
  const normal = params.query_timeout;
  params.query_timeout = seconds * 1000 + 5_000;
  // Sequelize calls cleanup() on commit and on rollback alike, just before the connection goes back to the pool.
  const cleanup = (transaction as unknown as { cleanup?: () => unknown }).cleanup?.bind(transaction);
  (transaction as unknown as { cleanup: () => unknown }).cleanup = () => {
    params.query_timeout = normal;
    return cleanup?.();
  };
}
