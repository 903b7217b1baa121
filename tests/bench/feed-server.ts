/**
 * A server for `npm run bench:feed`, in its own process so it does not share a CPU with the load
 * generator: `app` runs Starproof (createApp) on DATABASE_URL; `static <file>` serves one file with
 * express.static, the peer. Prints the bound port as JSON, then serves until killed.
 *
 * Over the IPC channel the parent sends `'reset'` before a run and `'report'` after it; the answer
 * is the event-loop delay (p50, p99, max, in ms) and the garbage collector's pauses during the run,
 * the two places a tail hides that the latency figures alone do not tell apart; and, for
 * `npm run bench:capacity`, the process's CPU time and the statements it sent to PostgreSQL.
 */
import express from 'express';
import path from 'node:path';
import { monitorEventLoopDelay, PerformanceObserver } from 'node:perf_hooks';

const [mode, file] = process.argv.slice(2);
let app: express.Express;
let queries = 0;
let cpuAtReset = process.cpuUsage();
if (mode === 'static') {
  app = express();
  app.disable('x-powered-by');
  app.use(express.static(path.dirname(path.resolve(file)), { maxAge: 0, dotfiles: 'allow' }));
} else {
  // Every statement the app sends to PostgreSQL, whichever pool sends it (Sequelize, the session
  // store): counted at the driver, for the queries-per-request figures of bench:capacity.
  const pg = (await import('pg')).default;
  const send = pg.Client.prototype.query as (...args: unknown[]) => unknown;
  pg.Client.prototype.query = function (this: unknown, ...args: unknown[]) {
    queries += 1;
    return send.apply(this, args);
  } as typeof pg.Client.prototype.query;
  const { createApp } = await import('../../server/app.ts');
  app = createApp();
}

const delay = monitorEventLoopDelay({ resolution: 10 });
delay.enable();
let gc = { count: 0, totalMs: 0, maxMs: 0 };
new PerformanceObserver((list) => {
  for (const entry of list.getEntries()) {
    gc.count += 1;
    gc.totalMs += entry.duration;
    gc.maxMs = Math.max(gc.maxMs, entry.duration);
  }
}).observe({ entryTypes: ['gc'] });
const ms = (ns: number) => Math.round(ns / 1e5) / 10;
process.on('message', (message) => {
  if (message === 'reset') {
    delay.reset();
    gc = { count: 0, totalMs: 0, maxMs: 0 };
    queries = 0;
    cpuAtReset = process.cpuUsage();
    process.send?.('ok');
  } else if (message === 'report') {
    process.send?.({
      loop: { p50: ms(delay.percentile(50)), p99: ms(delay.percentile(99)), max: ms(delay.max) },
      gc: { count: gc.count, totalMs: Math.round(gc.totalMs), maxMs: Math.round(gc.maxMs * 10) / 10 },
      // CPU of the whole process (every thread) since the reset, and the statements sent to PostgreSQL.
      cpuMs: (() => {
        const used = process.cpuUsage(cpuAtReset);
        return (used.user + used.system) / 1000;
      })(),
      queries,
    });
  }
});

// An orderly exit, so a --cpu-prof profile is written.
process.on('SIGTERM', () => process.exit(0));

const server = app.listen(0, '127.0.0.1', () => {
  console.log(JSON.stringify({ port: (server.address() as { port: number }).port }));
});
