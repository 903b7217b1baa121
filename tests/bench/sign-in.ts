/**
 * `npm run bench:sign-in`: 200 correct sign-ins sent at once to the app (bcrypt at its production
 * cost, 11), against a healthy database.
 *
 * Starts its own cluster (.data/bench-sign-in-pg, port 54598), builds the app in this process and
 * listens on loopback, so the event-loop delay printed is the server's own loop (the client's
 * 200 fetches share it, which only makes the figure worse). Prints how many answered 200, 429 and
 * 5xx, p50/p99 latency, the worst event-loop delay, and, as a peer measured in the same run, the
 * latency of a cheap request (`/api/health`) sent while the sign-ins were in flight.
 * Targets (issue 15): no 5xx; the event loop never blocked over 50 ms.
 */
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { Worker } from 'node:worker_threads';
import { ensureDatabase, localDatabaseUrl, startLocalPostgres, stopLocalPostgres } from '../../server/db/local-postgres.ts';

const CONCURRENT = Number(process.env.SIGN_INS ?? 200);
const dataDir = path.resolve('.data/bench-sign-in-pg');
const pgPort = Number(process.env.BENCH_SIGN_IN_PGPORT ?? 54598);
const database = 'starproof_bench_sign_in';

await startLocalPostgres({ dataDir, port: pgPort, database: 'postgres', fast: true });
await ensureDatabase({ port: pgPort, database }, { recreate: true });
process.env.DATABASE_URL = localDatabaseUrl({ port: pgPort, database });
process.env.NODE_ENV = 'production';
process.env.LOG_LEVEL = 'warn';
// The per-address limiter would refuse one client sending 200 sign-ins; this measures hashing.
process.env.STARPROOF_SIGNIN_LIMIT = '100000';
process.env.PUBLIC_URL ??= 'http://127.0.0.1';

const { getSequelize, closeSequelize } = await import('../../server/db.ts');
const { migrate } = await import('../../server/migrations/runner.ts');
await migrate(getSequelize());
const { createApp } = await import('../../server/app.ts');
const { User } = await import('../../server/models/index.ts');
const { hashPassword } = await import('../../server/services/users/passwords.ts');
const { closePasswordPool } = await import('../../server/auth/password-pool.ts');

const app = createApp();
const password = 'bench-dome-lantern-42';
const passwordHash = await hashPassword(password);
const emails = Array.from({ length: CONCURRENT }, (_, i) => `bench-${i}@corrie-vale.example`);
await User.bulkCreate(emails.map((email, i) => ({ email, name: `Bench Person ${i} (demo)`, role: 'writer', passwordHash })));

const server = app.listen(0, '127.0.0.1');
await new Promise((r) => server.once('listening', r));
const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

/** Cheap requests, 100 ms apart: the peer whose latency is compared with and without the burst. */
async function healthPings(into: number[]) {
  for (let i = 0; i < 20; i++) {
    const t0 = performance.now();
    await (await fetch(`${base}/api/health`)).arrayBuffer();
    into.push(performance.now() - t0);
    await new Promise((r) => setTimeout(r, 100));
  }
}

// Warm up (first requests compile code and open connections), then a quiet baseline on this machine.
await fetch(`${base}/api/auth/sign-in`, {
  method: 'POST',
  headers: { 'Content-Type': 'application/json' },
  body: JSON.stringify({ email: emails[0], password }),
});
const quiet = monitorEventLoopDelay({ resolution: 5 });
const quietHealth: number[] = [];
quiet.enable();
await healthPings(quietHealth);
quiet.disable();

const loop = monitorEventLoopDelay({ resolution: 5 });
loop.enable();
// The 200 clients run in a worker thread with its own event loop, so the loop measured here is the server's alone.
const clientCode = `
const { parentPort, workerData } = require('node:worker_threads');
const { base, emails, password } = workerData;
Promise.all(emails.map(async (email) => {
  const t0 = performance.now();
  const res = await fetch(base + '/api/auth/sign-in', {
    method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify({ email, password }),
  });
  const body = await res.text();
  let code = '';
  try { code = JSON.parse(body).error?.code ?? ''; } catch {}
  return { status: res.status, code, ms: performance.now() - t0 };
})).then((results) => parentPort.postMessage(results));
`;
const started = Date.now();
const burst = new Promise<Array<{ status: number; code: string; ms: number }>>((resolve, reject) => {
  const worker = new Worker(clientCode, { eval: true, workerData: { base, emails, password } });
  worker.once('message', resolve);
  worker.once('error', reject);
});
const healthTimes: number[] = [];
const peer = healthPings(healthTimes);
const [results] = await Promise.all([burst, peer]);
loop.disable();
const times = results.map((r) => r.ms);
const statusOf = results.map((r) => r.status);
const statuses = new Map<number, number>();
for (const { status } of results) statuses.set(status, (statuses.get(status) ?? 0) + 1);

const pct = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))] ?? 0;
};
const fivexx = [...statuses].filter(([s]) => s >= 500).reduce((n, [, c]) => n + c, 0);
console.log(`sign-in bench: ${CONCURRENT} correct sign-ins at once, bcrypt cost 11, ${Date.now() - started} ms in all`);
console.log(`  answers: ${[...statuses].map(([s, c]) => `${c} × ${s}`).join(', ')} (5xx: ${fivexx}, target 0)`);
const codes = [...new Set(results.filter((r) => r.status >= 500).map((r) => r.code))];
if (codes.length) console.log(`  5xx codes: ${codes.join(', ')}`);
console.log(`  success: ${statuses.get(200) ?? 0} of ${CONCURRENT}`);
console.log(`  sign-in latency p50 ${pct(times, 50).toFixed(0)} ms, p99 ${pct(times, 99).toFixed(0)} ms`);
const ms = (ns: number) => (ns / 1e6).toFixed(1);
console.log(
  `  /api/health during the burst: p50 ${pct(healthTimes, 50).toFixed(1)} ms, max ${Math.max(...healthTimes).toFixed(1)} ms;` +
    ` quiet (same run): p50 ${pct(quietHealth, 50).toFixed(1)} ms, max ${Math.max(...quietHealth).toFixed(1)} ms;` +
    ` ratio of p50s ${(pct(healthTimes, 50) / pct(quietHealth, 50)).toFixed(2)}`,
);
console.log(
  `  event-loop delay during the burst: max ${ms(loop.max)} ms, p99 ${ms(loop.percentile(99))} ms; quiet (same run): max ${ms(quiet.max)} ms, p99 ${ms(quiet.percentile(99))} ms (target: max under 50 ms)`,
);
const by = (status: number) => times.filter((_, i) => statusOf[i] === status);
for (const status of [200, 429])
  if (by(status).length)
    console.log(`  ${status}: p50 ${pct(by(status), 50).toFixed(0)} ms, p99 ${pct(by(status), 99).toFixed(0)} ms`);

server.close();
await (app.locals.sessionPool as { end(): Promise<void> }).end();
await closePasswordPool();
await closeSequelize();
stopLocalPostgres(dataDir);
