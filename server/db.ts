import { AsyncLocalStorage } from 'node:async_hooks';
import { Sequelize, type Transaction } from 'sequelize';
import { config } from './config.ts';

let instance: Sequelize | undefined;

/** Set while a public read runs on the replica; `wrote` once it wrote something (its reads then follow the write). */
const replicaScope = new AsyncLocalStorage<{ wrote: boolean }>();

/** Sequelize's connection settings for a `postgres://` URL (its replication settings take no URLs). */
function connectionOf(url: string) {
  const u = new URL(url);
  return {
    host: u.hostname,
    port: u.port ? Number(u.port) : 5432,
    username: decodeURIComponent(u.username),
    password: decodeURIComponent(u.password),
    database: decodeURIComponent(u.pathname.replace(/^\//, '')),
  };
}

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
      // With a read replica: a second pool, used only inside readFromReplica (see the hook below).
      ...(config.databaseReadUrl
        ? { replication: { write: connectionOf(url), read: [connectionOf(config.databaseReadUrl)] } }
        : {}),
    });
    // Sequelize would send every SELECT outside a transaction to the replica; Starproof sends only the
    // public reads there (staff must read their own writes), and a public read that wrote reads the primary.
    if (config.databaseReadUrl)
      instance.addHook('beforePoolAcquire', (options: { type?: string; useMaster?: boolean }) => {
        const scope = replicaScope.getStore();
        if (scope && options.type !== 'SELECT') scope.wrote = true;
        options.useMaster = !scope || scope.wrote || options.type !== 'SELECT';
      });
  }
  return instance;
}

/** Whether a read replica is configured (DATABASE_READ_URL). */
export const hasReadReplica = (): boolean => !!config.databaseReadUrl;

/**
 * Runs `work` with its plain SELECTs on the read replica (DATABASE_READ_URL; the primary when there
 * is none). Writes, transactions, and reads after a write in the same work go to the primary.
 * Callers decide whether the replica is fresh enough (services/publishing/public-reads.ts).
 * @param work the reading to do
 */
export function readFromReplica<T>(work: () => Promise<T>): Promise<T> {
  return replicaScope.run({ wrote: false }, work);
}

/**
 * Runs `work` on the primary even inside a public read on the replica (a nested public read asks
 * the primary where its WAL stands: a replica cannot answer that).
 * @param work the reading to do
 */
export function readFromPrimary<T>(work: () => Promise<T>): Promise<T> {
  return replicaScope.exit(work);
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
