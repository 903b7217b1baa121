/**
 * A server for `npm run bench:feed`, in its own process so it does not share a CPU with the load
 * generator: `app` runs Starproof (createApp) on DATABASE_URL; `static <file>` serves one file with
 * express.static, the peer. Prints the bound port as JSON, then serves until killed.
 *
 * Over the IPC channel the parent sends `'reset'` before a run and `'report'` after it; the answer
 * is the event-loop delay (p50, p99, max, in ms) and the garbage collector's pauses during the run,
 * the two places a tail hides that the latency figures alone do not tell apart.
 */
import express from 'express';
import path from 'node:path';
import { monitorEventLoopDelay, PerformanceObserver } from 'node:perf_hooks';

const [mode, file] = process.argv.slice(2);
let app: express.Express;
if (mode === 'static') {
  app = express();
  app.disable('x-powered-by');
  app.use(express.static(path.dirname(path.resolve(file)), { maxAge: 0, dotfiles: 'allow' }));
} else {
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
    process.send?.('ok');
  } else if (message === 'report') {
    process.send?.({
      loop: { p50: ms(delay.percentile(50)), p99: ms(delay.percentile(99)), max: ms(delay.max) },
      gc: { count: gc.count, totalMs: Math.round(gc.totalMs), maxMs: Math.round(gc.maxMs * 10) / 10 },
    });
  }
});

// An orderly exit, so a --cpu-prof profile is written.
process.on('SIGTERM', () => process.exit(0));

const server = app.listen(0, '127.0.0.1', () => {
  console.log(JSON.stringify({ port: (server.address() as { port: number }).port }));
});
