import path from 'node:path';
import {
  ensureDatabase,
  isRunning,
  localDatabaseUrl,
  startLocalPostgres,
  stopLocalPostgres,
} from '../../server/db/local-postgres.ts';

/** The test cluster: its own folder and port, never the development data. */
export const TEST_CLUSTER = {
  dataDir: path.resolve(process.env.STARPROOF_TEST_PGDATA ?? '.data/test-postgres'),
  port: Number(process.env.STARPROOF_TEST_PGPORT ?? 54391),
};

/**
 * Starts (or reuses) the test cluster and recreates one empty database in it.
 * @returns the URL and whether this call started the cluster (and so should stop it)
 */
export async function freshTestDatabase(database: string): Promise<{ url: string; startedCluster: boolean }> {
  if (process.env.STARPROOF_TEST_DATABASE_URL) {
    // Bring-your-own server: still one database per suite.
    const url = new URL(process.env.STARPROOF_TEST_DATABASE_URL);
    url.pathname = `/${database}`;
    return { url: url.toString(), startedCluster: false };
  }
  const startedCluster = !isRunning(TEST_CLUSTER.dataDir);
  await startLocalPostgres({ ...TEST_CLUSTER, database: 'postgres', fast: true });
  await ensureDatabase({ port: TEST_CLUSTER.port, database }, { recreate: true });
  return { url: localDatabaseUrl({ port: TEST_CLUSTER.port, database }), startedCluster };
}

export function stopTestCluster(): void {
  stopLocalPostgres(TEST_CLUSTER.dataDir);
}
