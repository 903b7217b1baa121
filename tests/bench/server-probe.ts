/**
 * Loaded into a server a benchmark starts (`node --import tsx --import ./tests/bench/server-probe.ts
 * server/cli/start.ts`), so the server runs exactly as `npm start` runs it and the figures are its
 * own thread's. Over the IPC channel the benchmark sends `'reset'` before a run and `'report'`
 * after it; the answer is the event-loop delay (p50, p99, max, in ms), the garbage collector's
 * pauses, the time its event loop was busy and the process's CPU time over the run.
 *
 * BENCH_STALL_MS=40 (diagnostics only: it samples the thread's stack every 250 µs, which costs
 * time of its own): the report also says what ran during each stall of the event loop longer than
 * that, from a CPU profile of the run: the functions with the most time of their own, and the
 * GC pauses that fell inside it; the last entry is the whole run. BENCH_PROFILE_OUT=<file> keeps
 * that profile. With BENCH_STALL_PROFILE=0 there is no profiler (much cheaper): each stall says
 * instead how long the thread ran in it, how long it waited for a core, and how many requests
 * began in it.
 */
import diagnostics from 'node:diagnostics_channel';
import fs from 'node:fs';
import { Session } from 'node:inspector/promises';
import { monitorEventLoopDelay, PerformanceObserver, performance } from 'node:perf_hooks';

interface Stall {
  startMs: number;
  ms: number;
  gcMs: number;
  top: string[];
}

const delay = monitorEventLoopDelay({ resolution: 5 });
delay.enable();
/** GC pauses over the run; `longest` names the kind of the longest (scavenge, mark-compact, …). */
let gc = { count: 0, totalMs: 0, maxMs: 0, longest: '' };
const GC_KINDS: Record<number, string> = { 1: 'scavenge', 2: 'mark-compact', 4: 'incremental marking', 8: 'weak callbacks' };
/** GC pauses as [start, end] in monotonic microseconds, for placing them inside stalls. */
let pauses: Array<[number, number]> = [];
/** Microseconds of the monotonic clock (the CPU profile's clock) at performance.now() = 0. */
const origin = Number(process.hrtime.bigint() / 1000n) - Math.round(performance.now() * 1000);
new PerformanceObserver((list) => {
  for (const entry of list.getEntries()) {
    gc.count += 1;
    gc.totalMs += entry.duration;
    if (entry.duration > gc.maxMs) {
      gc.maxMs = entry.duration;
      const kind = (entry as { detail?: { kind?: number } }).detail?.kind ?? 0;
      gc.longest = GC_KINDS[kind] ?? `kind ${kind}`;
    }
    const start = origin + Math.round(entry.startTime * 1000);
    pauses.push([start, start + Math.round(entry.duration * 1000)]);
  }
}).observe({ entryTypes: ['gc'] });
/**
 * The main thread's CPU time and its time spent ready to run but waiting for a core (ms), from
 * Linux's scheduler statistics for that thread alone (zeros elsewhere): on a machine shared with
 * other work, the second says how much of a stall was the thread not being run at all.
 */
function mainThreadSched(): { cpuMs: number; waitMs: number } {
  try {
    const [cpu, wait] = fs.readFileSync(`/proc/self/task/${process.pid}/schedstat`, 'utf8').split(' ').map(Number);
    return { cpuMs: cpu / 1e6, waitMs: wait / 1e6 };
  } catch {
    return { cpuMs: 0, waitMs: 0 };
  }
}
let cpuAtReset = process.cpuUsage();
let schedAtReset = mainThreadSched();
let eluAtReset = performance.eventLoopUtilization();

const stallMs = Number(process.env.BENCH_STALL_MS ?? 0);
const session = stallMs > 0 && process.env.BENCH_STALL_PROFILE !== '0' ? new Session() : undefined;
/** Gaps between ticks of a 2-ms timer longer than stallMs, as [start, end] in monotonic µs. */
let gaps: Array<[number, number]> = [];
/** For each gap: what the thread did in it (ms ran, ms waited for a core, requests begun). */
let gapSched: Array<{ ranMs: number; waitMs: number; requests: number }> = [];
let requestsBegun = 0;
let requestsAtReset = 0;
let resetAtUs = Number(process.hrtime.bigint() / 1000n);
if (stallMs > 0) {
  diagnostics.subscribe('http.server.request.start', () => {
    requestsBegun += 1;
  });
  if (session) {
    session.connect();
    await session.post('Profiler.enable');
    await session.post('Profiler.setSamplingInterval', { interval: Number(process.env.BENCH_STALL_SAMPLE_US ?? 250) });
  }
  const now = () => Number(process.hrtime.bigint() / 1000n);
  let last = now();
  let lastSched = mainThreadSched();
  let lastRequests = 0;
  setInterval(() => {
    const t = now();
    const sched = mainThreadSched();
    if (t - last > stallMs * 1000) {
      gaps.push([last, t]);
      gapSched.push({
        ranMs: Math.round((sched.cpuMs - lastSched.cpuMs) * 10) / 10,
        waitMs: Math.round((sched.waitMs - lastSched.waitMs) * 10) / 10,
        requests: requestsBegun - lastRequests,
      });
    }
    last = t;
    lastSched = sched;
    lastRequests = requestsBegun;
  }, 2).unref();
}

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number };
  children?: number[];
}
interface Profile {
  nodes: ProfileNode[];
  startTime: number;
  samples: number[];
  timeDeltas: number[];
}

/** For each stall, and for the whole run: the functions that ran longest (self time), from the profile's samples. */
function explainStalls(profile: Profile): Stall[] {
  const nodes = new Map(profile.nodes.map((n) => [n.id, n]));
  const times: number[] = [];
  let t = profile.startTime;
  for (const d of profile.timeDeltas) {
    t += d;
    times.push(t);
  }
  const where = (n: ProfileNode) =>
    `${n.callFrame.functionName || '(anonymous)'} ${n.callFrame.url.replace(/^.*node_modules\//, '').replace(/^file:\/\/.*?\/(server|tests)\//, '$1/')}:${n.callFrame.lineNumber + 1}`;
  const whole: [number, number] = [profile.startTime, times.at(-1) ?? profile.startTime];
  return [...gaps, whole].map(([a, b]) => {
    const self = new Map<string, number>();
    for (let i = 0; i < times.length; i += 1) {
      if (times[i] < a || times[i] > b) continue;
      const node = nodes.get(profile.samples[i])!;
      if (node.callFrame.functionName === '(idle)') continue;
      const key = where(node);
      self.set(key, (self.get(key) ?? 0) + ((times[i + 1] ?? times[i]) - times[i]));
    }
    const gcUs = pauses.reduce((sum, [s, e]) => sum + Math.max(0, Math.min(e, b) - Math.max(s, a)), 0);
    return {
      startMs: Math.round((a - profile.startTime) / 1000),
      ms: Math.round((b - a) / 100) / 10,
      gcMs: Math.round(gcUs / 100) / 10,
      top: [...self]
        .sort((x, y) => y[1] - x[1])
        .slice(0, 6)
        .map(([name, us]) => `${(us / 1000).toFixed(1)} ms ${name}`),
    };
  });
}

const ms = (ns: number) => Math.round(ns / 1e5) / 10;
process.on('message', async (message) => {
  if (message === 'reset') {
    delay.reset();
    gc = { count: 0, totalMs: 0, maxMs: 0, longest: '' };
    pauses = [];
    gaps = [];
    gapSched = [];
    resetAtUs = Number(process.hrtime.bigint() / 1000n);
    requestsAtReset = requestsBegun;
    cpuAtReset = process.cpuUsage();
    schedAtReset = mainThreadSched();
    eluAtReset = performance.eventLoopUtilization();
    await session?.post('Profiler.start');
    process.send?.('ok');
  } else if (message === 'report') {
    const used = process.cpuUsage(cpuAtReset);
    const report = {
      loop: { p50: ms(delay.percentile(50)), p99: ms(delay.percentile(99)), max: ms(delay.max) },
      gc: { count: gc.count, totalMs: Math.round(gc.totalMs), maxMs: Math.round(gc.maxMs * 10) / 10, longest: gc.longest },
      cpuMs: (used.user + used.system) / 1000,
      mainCpuMs: Math.round(mainThreadSched().cpuMs - schedAtReset.cpuMs),
      mainWaitMs: Math.round(mainThreadSched().waitMs - schedAtReset.waitMs),
      // Time the event loop spent running code (not waiting for I/O), this thread only.
      busyMs: Math.round(performance.eventLoopUtilization(eluAtReset).active),
      stalls: undefined as Stall[] | undefined,
    };
    if (stallMs > 0 && !session) {
      report.stalls = gaps.map(([a, b], i) => ({
        startMs: Math.round((a - resetAtUs) / 1000),
        ms: Math.round((b - a) / 100) / 10,
        gcMs: Math.round(pauses.reduce((sum, [s, e]) => sum + Math.max(0, Math.min(e, b) - Math.max(s, a)), 0) / 100) / 10,
        top: [
          `thread ran ${gapSched[i].ranMs} ms, waited ${gapSched[i].waitMs} ms for a core; ${gapSched[i].requests} requests begun`,
        ],
      }));
      report.stalls.push({
        startMs: 0,
        ms: Math.round((Number(process.hrtime.bigint() / 1000n) - resetAtUs) / 1000),
        gcMs: gc.totalMs,
        top: [`${requestsBegun - requestsAtReset} requests begun`],
      });
    }
    if (session) {
      const { profile } = await session.post('Profiler.stop');
      report.stalls = explainStalls(profile as Profile);
      // The run's whole profile, for Chrome's DevTools or any .cpuprofile reader.
      if (process.env.BENCH_PROFILE_OUT) fs.writeFileSync(process.env.BENCH_PROFILE_OUT, JSON.stringify(profile));
    }
    process.send?.(report);
  }
});
