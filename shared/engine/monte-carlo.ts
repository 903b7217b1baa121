/**
 * Monte Carlo runs over the seeded deviates of uncertainty.ts: a draw loop free of allocation and
 * try/catch over slot-numbered inputs, percentiles by selection rather than sorting, an optional
 * monotonic last step computed only at the percentiles, and, for one varied input and a monotonic
 * calculation, no drawing at all. Every shortcut gives the interval the plain loop would.
 */
import { quantileFromStatistics, quantilePair, type MonotoneMap } from './order-statistics.ts';
import { LEVELS, recalledRun, rememberRun, type DrawSummary } from './recent-runs.ts';
import { boundMass, SAMPLES, seededDeviates, truncatedDeviate, type Measurement, type MonteCarloOutcome } from './uncertainty.ts';

export type { MonotoneMap } from './order-statistics.ts';

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
  /**
   * Names everything f's draws depend on (the calculation, the model, every slot's value and
   * uncertainty). Two runs with the same key draw the same values, so the second reuses the
   * first's draws: how two statements about one object share one Monte Carlo.
   */
  drawsKey?: string;
  /** Called once before drawing (not when earlier draws are reused): set up what only drawing needs. */
  prepare?: () => void;
  /**
   * Computes every draw of f a column at a time (column-draws.ts), after prepare: the same values
   * as the loop, for less. Returns false, leaving the loop to draw, when it does not apply or
   * some draw is not finite.
   */
  fill?: (out: Float64Array) => boolean;
}

/** True when a monotonic map is finite (and does not throw) at both ends of the draws, hence at all. */
function finiteAtEnds(min: number, max: number, last: MonotoneMap): boolean {
  try {
    return Number.isFinite(last.map(min)) && Number.isFinite(last.map(max));
  } catch {
    return false;
  }
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
function drawAll(
  run: Run,
  p: SlotProblem,
  slots: Int32Array,
  centre: Float64Array,
  minus: Float64Array,
  plus: Float64Array,
  mass: Float64Array,
  out: Float64Array,
  failed: () => void,
): void {
  const { x, f } = p;
  const n = slots.length;
  const dev = seededDeviates(SAMPLES * n);
  // With a monotonic last step still to come, ±Infinity may map to a finite result: keep all but NaN.
  const keepInfinite = p.last !== undefined;
  for (; run.draw < SAMPLES; run.draw++) {
    const base = run.draw * n;
    for (let j = 0; j < n; j++) {
      // An input with a physical bound draws from its distribution truncated there (mass > 0).
      const d = mass[j] > 0 ? truncatedDeviate(dev[base + j], mass[j]) : dev[base + j];
      x[slots[j]] = centre[j] + d * (d < 0 ? minus[j] : plus[j]);
    }
    const r = f(x);
    // r − r is 0 only for finite r.
    if (keepInfinite ? !Number.isNaN(r) : r - r === 0) out[run.kept++] = r;
    else failed();
  }
}

function finiteAll(a: Float64Array): boolean {
  for (let i = 0; i < a.length; i++) if (a[i] - a[i] !== 0) return false;
  return true;
}

/** True when a monotonic map is finite (and does not throw) at the smallest and largest draw, hence at all. */
function finiteBetween(a: Float64Array, last: MonotoneMap): boolean {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = 0; i < a.length; i++) {
    if (a[i] < lo) lo = a[i];
    if (a[i] > hi) hi = a[i];
  }
  return finiteAtEnds(lo, hi, last);
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
  const mass = Float64Array.from(p.varied, (v) => boundMass(v.m));
  const failures = new Map<string, number>();
  const failed = (): void => {
    const who = p.blame(p.x);
    failures.set(who, (failures.get(who) ?? 0) + 1);
  };
  const last = p.last;
  // Drawing again with the last step folded in; prepare is repeated so the draws are the same whether or not this run was reused.
  const fold = () => propagate({ ...p, f: (x) => last!.map(p.f(x)), last: undefined, drawsKey: undefined, fill: undefined });
  const fromSummary = ({ stats }: DrawSummary): MonteCarloOutcome => {
    const at = (rank: number) => stats.get(rank)!;
    return {
      low: quantileFromStatistics(SAMPLES, LEVELS[0], last, at),
      high: quantileFromStatistics(SAMPLES, LEVELS[1], last, at),
      samples: SAMPLES,
      failures: new Map(),
      failed: 0,
    };
  };
  const reused = p.drawsKey === undefined ? undefined : recalledRun(p.drawsKey);
  if (reused) {
    // Some draws leave the range where the last step is finite: run it on every draw instead.
    return last && !finiteAtEnds(reused.min, reused.max, last) ? fold() : fromSummary(reused);
  }
  p.prepare?.();
  const run: Run = { draw: 0, kept: 0 };
  const out = takeScratch();
  if (p.fill?.(out)) {
    run.draw = SAMPLES;
    run.kept = SAMPLES;
  }
  while (run.draw < SAMPLES) {
    try {
      drawAll(run, p, slots, centre, minus, plus, mass, out, failed);
    } catch {
      // The draw at run.draw threw: it counts as outside the domain, and sampling resumes after it.
      failed();
      run.draw++;
    }
  }
  const kept = out.subarray(0, run.kept);
  // Only a run where every draw was kept is worth sharing (and then keepInfinite cannot matter).
  if (p.drawsKey !== undefined && run.kept === SAMPLES && finiteAll(kept)) {
    const summary = rememberRun(p.drawsKey, kept);
    releaseScratch(out);
    return last && !finiteAtEnds(summary.min, summary.max, last) ? fold() : fromSummary(summary);
  }
  if (last && run.kept > 0 && !finiteBetween(kept, last)) {
    // Some draws leave the range where the last step is finite: run it on every draw instead.
    releaseScratch(out);
    return fold();
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
  const mass = boundMass(m);
  const drawAt = (rank: number): number => {
    const d = mass > 0 ? truncatedDeviate(sorted[rank], mass) : sorted[rank];
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
