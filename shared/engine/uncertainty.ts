/**
 * Uncertainty propagation by Monte Carlo with a seeded generator, so the same
 * request always gives the same interval. Inputs with asymmetric errors are drawn
 * from a two-piece (split) normal whose 16th and 84th percentiles are exactly
 * value − minus and value + plus; results report the 16th–84th percentile range.
 *
 * The standard-normal deviates are drawn once from the seeded stream and kept: every run reads
 * the same sequence in the same order (draw i, varied input j takes deviate i × inputs + j), so a
 * request's interval is the one it always had, without paying for logarithms and cosines again.
 */
import { quantilePair, type MonotoneMap } from './order-statistics.ts';

export type { MonotoneMap } from './order-statistics.ts';

/** An input value with its 68 % uncertainty (minus = plus = 0 when exact) and its source. */
export interface Measurement {
  value: number;
  minus: number;
  plus: number;
  source: string;
}

/** Number of Monte Carlo samples; enough for percentiles to ~1 % of the interval width. */
export const SAMPLES = 4000;
/** Fixed seed: intervals are reproducible. */
export const SEED = 0x5eed_2018;

/**
 * mulberry32: a small, fast, seeded 32-bit generator.
 * @param seed integer seed
 * @returns a function giving uniform numbers in [0, 1)
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/**
 * Standard normal deviates by the Box–Muller transform.
 * @param rand uniform generator
 * @returns a function giving N(0, 1) deviates
 */
export function normal(rand: () => number): () => number {
  return () => {
    const u = 1 - rand(); // in (0, 1], so log(u) is finite
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rand());
  };
}

/**
 * One draw from a measurement's split normal.
 * @param m the measurement
 * @param n a standard normal deviate
 * @returns the sampled value
 */
export function drawSplitNormal(m: Measurement, n: number): number {
  return m.value + n * (n < 0 ? m.minus : m.plus);
}

/**
 * The p-quantile of sorted data by linear interpolation.
 * @param sorted ascending values
 * @param p probability in [0, 1]
 * @returns the quantile
 */
export function quantile(sorted: Float64Array, p: number): number {
  const pos = p * (sorted.length - 1);
  const i = Math.floor(pos);
  const f = pos - i;
  return i + 1 < sorted.length ? sorted[i] * (1 - f) + sorted[i + 1] * f : sorted[i];
}

/**
 * The first `count` deviates of the seeded stream `normal(mulberry32(SEED))`, computed once and
 * kept (the stream is regenerated from its start when a longer prefix is needed).
 */
let deviates = new Float64Array(0);

/**
 * The seeded standard-normal deviates, at least `count` of them.
 * @param count how many are needed
 * @returns the shared array (do not write to it)
 */
export function seededDeviates(count: number): Float64Array {
  if (deviates.length < count) {
    const gauss = normal(mulberry32(SEED));
    const next = new Float64Array(Math.max(count, 5 * SAMPLES));
    for (let i = 0; i < next.length; i++) next[i] = gauss();
    deviates = next;
  }
  return deviates;
}

/** The outcome of a Monte Carlo run. */
export interface MonteCarloOutcome {
  low: number;
  high: number;
  samples: number;
  /** Per input name, how many draws fell outside where the quantity is defined. */
  failures: Map<string, number>;
  failed: number;
}

// The draws' buffer is reused from run to run: a fresh 32 kB typed array per run lives outside the
// JavaScript heap and costs more in garbage collection than the draws themselves. A run that starts
// while another holds it (a calculation nested in a draw) gets its own.
let scratch: Float64Array | null = null;
const takeScratch = (): Float64Array => {
  const s = scratch ?? new Float64Array(SAMPLES);
  scratch = null;
  return s;
};
const releaseScratch = (s: Float64Array): void => {
  scratch = s;
};

/** A Monte Carlo problem on numbered slots: the calculation reads its inputs from x by slot. */
export interface SlotProblem {
  /** Every slot's nominal value; the varied slots are overwritten for each draw. */
  x: Float64Array;
  /** The inputs with a non-zero uncertainty, in the order they take deviates, with their slots. */
  varied: Array<{ slot: number; m: Measurement }>;
  /** The calculation: NaN (or a throw) for a draw where the quantity is undefined. */
  f: (x: Float64Array) => number;
  /** Names the input responsible for a failed draw. */
  blame: (x: Float64Array) => string;
  /**
   * A monotonic last step of the calculation, left out of f: only the draws at the percentiles
   * go through it (the interval is the same as running it on every draw, for less work).
   */
  last?: MonotoneMap;
}

/** Where a run stands, shared with the draw loop so that a throwing draw can be skipped and the loop resumed. */
interface Run {
  draw: number;
  kept: number;
}

/**
 * Draws from `run.draw` to the end, keeping results in `out`. Free of try/catch and allocation:
 * a draw that throws leaves `run.draw` pointing at itself for the caller to count and skip.
 */
function drawAll(run: Run, p: SlotProblem, slots: Int32Array, centre: Float64Array, minus: Float64Array, plus: Float64Array, out: Float64Array, failed: () => void): void {
  const { x, f } = p;
  const n = slots.length;
  const dev = seededDeviates(SAMPLES * n);
  // With a monotonic last step still to come, ±Infinity may map to a finite result: keep all but NaN.
  const keepInfinite = p.last !== undefined;
  for (; run.draw < SAMPLES; run.draw++) {
    const base = run.draw * n;
    for (let j = 0; j < n; j++) {
      const d = dev[base + j];
      x[slots[j]] = centre[j] + d * (d < 0 ? minus[j] : plus[j]);
    }
    const r = f(x);
    // r − r is 0 only for finite r; r === r excludes only NaN.
    if (keepInfinite ? r === r : r - r === 0) out[run.kept++] = r;
    else failed();
  }
}

/** True when a monotonic map is finite (and does not throw) at the smallest and largest draw, hence at all. */
function finiteBetween(a: Float64Array, last: MonotoneMap): boolean {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < a.length; i++) {
    if (a[i] < lo) lo = a[i];
    if (a[i] > hi) hi = a[i];
  }
  try {
    return Number.isFinite(last.map(lo)) && Number.isFinite(last.map(hi));
  } catch {
    return false;
  }
}

/**
 * Propagates uncertainties by Monte Carlo over slot-numbered inputs.
 * @param p the problem
 * @returns 68 % interval and failure counts
 */
export function propagate(p: SlotProblem): MonteCarloOutcome {
  const slots = Int32Array.from(p.varied, (v) => v.slot);
  const centre = Float64Array.from(p.varied, (v) => v.m.value);
  const minus = Float64Array.from(p.varied, (v) => v.m.minus);
  const plus = Float64Array.from(p.varied, (v) => v.m.plus);
  const out = takeScratch();
  const failures = new Map<string, number>();
  const failed = (): void => {
    const who = p.blame(p.x);
    failures.set(who, (failures.get(who) ?? 0) + 1);
  };
  const run: Run = { draw: 0, kept: 0 };
  while (run.draw < SAMPLES) {
    try {
      drawAll(run, p, slots, centre, minus, plus, out, failed);
    } catch {
      // The draw at run.draw threw: it counts as outside the domain, and sampling resumes after it.
      failed();
      run.draw++;
    }
  }
  const kept = out.subarray(0, run.kept);
  const last = p.last;
  if (last && run.kept > 0 && !finiteBetween(kept, last)) {
    // Some draws leave the range where the last step is finite: run it on every draw instead.
    releaseScratch(out);
    return propagate({ ...p, f: (x) => last.map(p.f(x)), last: undefined });
  }
  const interval = run.kept > 0 ? quantilePair(kept, 0.16, 0.84, last) : { low: NaN, high: NaN };
  const outcome = {
    low: interval.low,
    high: interval.high,
    samples: run.kept,
    failures,
    failed: SAMPLES - run.kept,
  };
  releaseScratch(out);
  return outcome;
}

let sortedFirst: Float64Array | null = null;

/** The first SAMPLES deviates in ascending order: the order of the draws when one input is varied. */
function sortedDeviates(): Float64Array {
  sortedFirst ??= seededDeviates(SAMPLES).slice(0, SAMPLES).sort();
  return sortedFirst;
}

/**
 * The Monte Carlo interval of g(X) for a single varied input X and a monotonic g, without drawing.
 * Draw i gives X = value + d·(d < 0 ? minus : plus) for the i-th deviate d, which rises with d, so
 * the k-th smallest draw of X comes from the k-th smallest deviate, and the k-th smallest g(X) from
 * that or (g decreasing) the k-th largest. The result is the run `propagate` would make.
 * @param m the one varied input
 * @param g the calculation as a monotonic function of it
 * @param everyDraw the full run, used when g is not finite at the extreme draws (some draws fail)
 * @returns 68 % interval and failure counts
 */
export function propagateOne(m: Measurement, g: MonotoneMap, everyDraw: () => MonteCarloOutcome): MonteCarloOutcome {
  const sorted = sortedDeviates();
  const n = SAMPLES;
  const drawAt = (rank: number): number => {
    const d = sorted[rank];
    return m.value + d * (d < 0 ? m.minus : m.plus);
  };
  const finiteAt = (rank: number): boolean => {
    try {
      return Number.isFinite(g.map(drawAt(rank)));
    } catch {
      return false;
    }
  };
  if (!finiteAt(0) || !finiteAt(n - 1)) return everyDraw();
  const quantileAt = (p: number): number => {
    const pos = p * (n - 1);
    const i = Math.floor(pos);
    const f = pos - i;
    const rank = g.decreasing ? n - 1 - i : i;
    const x = g.map(drawAt(rank));
    return i + 1 < n ? x * (1 - f) + g.map(drawAt(g.decreasing ? rank - 1 : rank + 1)) * f : x;
  };
  return { low: quantileAt(0.16), high: quantileAt(0.84), samples: n, failures: new Map(), failed: 0 };
}

/**
 * Propagates uncertainties through f by Monte Carlo, with inputs by name.
 * @param inputs measurements by name (only those with a non-zero uncertainty are varied)
 * @param f the calculation; returns NaN (or throws) for draws where the quantity is undefined
 * @param blame names the input responsible for a failed draw
 * @returns 68 % interval and failure counts
 */
export function monteCarlo(
  inputs: Record<string, Measurement>,
  f: (values: Record<string, number>) => number,
  blame: (values: Record<string, number>) => string,
): MonteCarloOutcome {
  const names = Object.keys(inputs);
  const values: Record<string, number> = {};
  const byName = (x: Float64Array): Record<string, number> => {
    names.forEach((k, i) => (values[k] = x[i]));
    return values;
  };
  return propagate({
    x: Float64Array.from(names, (k) => inputs[k].value),
    varied: names.flatMap((k, slot) => (inputs[k].minus > 0 || inputs[k].plus > 0 ? [{ slot, m: inputs[k] }] : [])),
    f: (x) => f(byName(x)),
    blame: (x) => blame(byName(x)),
  });
}
