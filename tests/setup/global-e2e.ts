import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { freshTestDatabase, stopTestCluster } from './test-postgres.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    baseUrl: string;
    e2eDatabaseUrl: string;
  }
}

const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const srv = net.createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });

/** Builds the client and runs the real server (as `npm start` does) on a fresh database. */
export default async function setup(project: TestProject) {
  const build = spawnSync('npx', ['vite', 'build', '--logLevel', 'error'], { stdio: 'inherit' });
  if (build.status !== 0) throw new Error('vite build failed');
  const { url, startedCluster } = await freshTestDatabase('starproof_e2e_test');
  const port = await freePort();
  // Its own uploads folder: the browser tests never touch the development images.
  const uploadsDir = process.env.UPLOADS_DIR ?? fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-e2e-uploads-'));
  const server: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'server/cli/start.ts'], {
    env: { ...process.env, NODE_ENV: 'test', DATABASE_URL: url, PORT: String(port), HOST: '127.0.0.1', STARPROOF_SMTP_PORT: '0', LOG_LEVEL: 'warn', UPLOADS_DIR: uploadsDir },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${output}`)), 60_000);
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      if (output.includes('Starproof is ready')) {
        clearTimeout(timer);
        resolve();
      }
    };
    server.stdout!.on('data', onData);
    server.stderr!.on('data', onData);
    server.once('exit', (code) => reject(new Error(`server exited (${code}):\n${output}`)));
  });
  // A server that dies under a test (an outage, a bug) says why, instead of tests failing with "fetch failed".
  let stopping = false;
  server.once('exit', (code, signal) => {
    if (!stopping) console.error(`\nThe e2e server stopped unexpectedly (${signal ?? code}). Its last output:\n${output.slice(-20_000)}`);
  });
  project.provide('baseUrl', `http://127.0.0.1:${port}`);
  project.provide('e2eDatabaseUrl', url);
  return async () => {
    stopping = true;
    server.kill('SIGTERM');
    await new Promise((r) => server.once('exit', r));
    if (startedCluster) stopTestCluster();
  };
}
