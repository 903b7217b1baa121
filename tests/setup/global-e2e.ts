import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { startServerProcess, stopServerProcess } from '../support/server-process.ts';
import { freshTestDatabase, stopTestCluster } from './test-postgres.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    e2eDatabaseUrl: string;
  }
}

/** Builds the client and runs the real server (as `npm start` does) on a fresh database. */
export default async function setup(project: TestProject) {
  const build = spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], { stdio: 'inherit' });
  if (build.status !== 0) throw new Error('vite build failed');
  const { url, startedCluster } = await freshTestDatabase('starproof_e2e_test');
  // Its own uploads folder: the browser tests never touch the development images.
  const uploadsDir = process.env.UPLOADS_DIR ?? fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-e2e-uploads-'));
  // The browser tests sign in a few hundred times from one address within minutes; the per-address
  // allowance (counted in the database, so it outlives server restarts) is tested in tests/api.
  const server = await startServerProcess({ DATABASE_URL: url, UPLOADS_DIR: uploadsDir, STARPROOF_SIGNIN_LIMIT: '100000' });
  // A server that dies under a test (an outage, a bug) says why, instead of tests failing with "fetch failed".
  let stopping = false;
  server.child.once('exit', (code, signal) => {
    if (!stopping)
      console.error(
        `\nThe e2e server stopped unexpectedly (${signal ?? code}). Its last output:\n${server.output().slice(-20_000)}`,
      );
  });
  project.provide('baseUrl', server.baseUrl);
  project.provide('e2eDatabaseUrl', url);
  return async () => {
    stopping = true;
    await stopServerProcess(server);
    // Kept for a look after a failed run (git-ignored); STARPROOF_E2E_LOG_LEVEL=info makes it say more.
    fs.mkdirSync('.data', { recursive: true });
    fs.writeFileSync('.data/e2e-server.log', server.output());
    if (startedCluster) stopTestCluster();
  };
}
