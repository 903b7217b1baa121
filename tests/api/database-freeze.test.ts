import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ensureDatabase, localDatabaseUrl, startLocalPostgres, stopLocalPostgres } from '../../server/db/local-postgres.ts';
import { freePort } from '../support/server-process.ts';

// Issue 15, point 3: a frozen PostgreSQL (every process stopped with SIGSTOP, as a stalled disk
// or a paused VM looks) must not hang requests. This file freezes a cluster of its own, so the
// other API test files, which share the suite's cluster, are not frozen with it.

const dataDir = path.resolve(process.env.STARPROOF_TEST_PGDATA ?? '.data/test-postgres', '..', 'test-postgres-freeze');
let port = 0;
let base = '';
let close: () => Promise<void> = async () => undefined;
/** The bound documented in DEVELOPERS.md: waiting for a connection (5 s) plus one query timeout (8.5 s). */
let boundMs = 0;

/** The postmaster and every backend it started. */
function clusterPids(): number[] {
  const postmaster = Number(fs.readFileSync(path.join(dataDir, 'postmaster.pid'), 'utf8').split('\n')[0]);
  const children = fs
    .readdirSync('/proc')
    .filter((d) => /^\d+$/.test(d))
    .filter((pid) => {
      try {
        // Field 4 of /proc/PID/stat is the parent's pid (after the command name in parentheses).
        const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
        return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[1]) === postmaster;
      } catch {
        return false;
      }
    })
    .map(Number);
  return [postmaster, ...children];
}

const signal = (sig: NodeJS.Signals) => {
  for (const pid of clusterPids()) {
    try {
      process.kill(pid, sig);
    } catch {
      // A backend that ended meanwhile.
    }
  }
};

async function timed(url: string, init: RequestInit = {}) {
  const started = Date.now();
  const res = await fetch(url, { ...init, signal: AbortSignal.timeout(60_000) });
  const text = await res.text();
  return { status: res.status, ms: Date.now() - started, code: text.startsWith('{') ? JSON.parse(text).error?.code : undefined };
}

beforeAll(async () => {
  port = await freePort();
  await startLocalPostgres({ dataDir, port, database: 'postgres', fast: true });
  await ensureDatabase({ port, database: 'starproof_freeze' }, { recreate: true });
  // Before any server module reads it: this file's app talks to the private cluster only.
  process.env.DATABASE_URL = localDatabaseUrl({ port, database: 'starproof_freeze' });
  const { getSequelize, closeSequelize, ACQUIRE_TIMEOUT_MS } = await import('../../server/db.ts');
  const { config } = await import('../../server/config.ts');
  boundMs = ACQUIRE_TIMEOUT_MS + config.dbQueryTimeoutMs + 500;
  const { migrate } = await import('../../server/migrations/runner.ts');
  await migrate(getSequelize());
  const { createApp } = await import('../../server/app.ts');
  const app = createApp();
  const server = app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  close = async () => {
    server.closeAllConnections();
    server.close();
    await (app.locals.sessionPool as { end(): Promise<void> }).end();
    await closeSequelize();
  };
}, 120_000);

afterAll(async () => {
  signal('SIGCONT');
  await close();
  stopLocalPostgres(dataDir);
}, 60_000);

describe('a frozen database', () => {
  it('signed-in and anonymous requests answer a clean 503 within the bound, and all recover by themselves', async () => {
    const { buildUser, TEST_PASSWORD } = await import('../support/app.ts');
    const user = await buildUser({ role: 'editor' });
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: user.email, password: TEST_PASSWORD }),
    });
    expect(signIn.status).toBe(200);
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
    const headers = { cookie };
    expect((await timed(`${base}/api/auth/me`, { headers })).status).toBe(200);
    expect((await timed(`${base}/api/pages`, { headers })).status).toBe(200);

    signal('SIGSTOP');
    const frozenAt = Date.now();
    try {
      const wave = () =>
        Promise.all([
          timed(`${base}/api/auth/me`, { headers }),
          timed(`${base}/api/pages`, { headers }),
          timed(`${base}/api/catalogue/objects`, { headers }),
          timed(`${base}/api/public/pages`),
          timed(`${base}/api/auth/sign-in`, {
            method: 'POST',
            headers: { 'Content-Type': 'application/json' },
            body: JSON.stringify({ email: user.email, password: TEST_PASSWORD }),
          }),
        ]);
      // Two waves: the second finds the pooled connections still stuck on the first wave's queries.
      for (const answers of [await wave(), await wave()]) {
        for (const a of answers) {
          expect(a.status).toBe(503);
          expect(['database_unavailable', 'busy']).toContain(a.code);
          expect(a.ms).toBeLessThan(boundMs);
        }
      }
      // Frozen for 25 s in all, longer than any single timeout.
      const left = 25_000 - (Date.now() - frozenAt);
      if (left > 0) await new Promise((r) => setTimeout(r, left));
    } finally {
      signal('SIGCONT');
    }
    // No restart: the same process, pools and session answer again once the database thaws.
    await expect
      .poll(async () => (await timed(`${base}/api/auth/me`, { headers })).status, { timeout: 30_000, interval: 500 })
      .toBe(200);
    expect((await timed(`${base}/api/pages`, { headers })).status).toBe(200);
    expect((await timed(`${base}/api/public/pages`)).status).toBe(200);
  }, 180_000);
});
