/**
 * Uncertainty propagation by Monte Carlo with a seeded generator, so the same
 * request always gives the same interval. Inputs with asymmetric errors are drawn
 * from a two-piece (split) normal whose 16th and 84th percentiles are exactly
 * value − minus and value + plus; results report the 16th–84th percentile range.
 *
 * The standard-normal deviates are drawn once from the seeded stream and kept: every run reads
 * the same sequence in the same order (draw i, varied input j takes deviate i × inputs + j), so a
 * request's interval is the one it always had, without paying for logarithms and cosines again.
 * The runs themselves are in monte-carlo.ts.
 */

import erfc from '@stdlib/math-base-special-erfc';
import erfcinv from '@stdlib/math-base-special-erfcinv';

/** An input value with its 68 % uncertainty (minus = plus = 0 when exact) and its source. */
export interface Measurement {
  value: number;
  minus: number;
  plus: number;
  source: string;
  /**
   * A physical lower bound (extinction ≥ 0, a distance > 0): the draws come from the two-piece
   * normal truncated there, i.e. conditioned on lying above it, instead of failing below it.
   */
  lower?: number;
}

/** Below this (in standard deviations) a bound changes no draw in double precision: Φ(−8.5) ≈ 10⁻¹⁷. */
const NO_EFFECT = -8.5;

/**
 * Φ at the bound's deviate for a measurement with a lower bound, or 0 when the bound is too far
 * below the value to change any draw (so unbounded inputs keep exactly their draws).
 * @param m the measurement
 * @returns Φ(a), a = the deviate at which the draw equals the bound
 */
export function boundMass(m: Measurement): number {
  if (m.lower === undefined) return 0;
  const below = m.lower < m.value;
  const width = below ? m.minus : m.plus;
  if (!(width > 0)) return 0;
  const a = (m.lower - m.value) / width;
  return a < NO_EFFECT ? 0 : 0.5 * erfc(-a / Math.SQRT2);
}

/**
 * A standard-normal deviate mapped into the normal truncated below: the same quantile of the
 * truncated distribution, u′ = Φ(a) + u (1 − Φ(a)) with u = Φ(d). Monotonic in d, so order
 * statistics and the one-input shortcut still hold. The upper tail is mapped through 1 − u to
 * keep its precision (erfc and erfcinv from stdlib, accurate to double precision).
 * @param d the deviate
 * @param mass Φ(a) from boundMass (0 < mass < 1)
 */
export function truncatedDeviate(d: number, mass: number): number {
  if (d <= 0) return -Math.SQRT2 * erfcinv(2 * (mass + 0.5 * erfc(-d / Math.SQRT2) * (1 - mass)));
  return Math.SQRT2 * erfcinv(2 * (0.5 * erfc(d / Math.SQRT2) * (1 - mass)));
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

const ranges = new Map<string, { min: number; max: number }>();

/**
 * The smallest and largest deviate an input takes over a run: the deviates of position j when n
 * inputs are varied (draw i reads deviate i × n + j).
 * @param n how many inputs are varied
 * @param j the input's position among them
 */
export function deviateRange(n: number, j: number): { min: number; max: number } {
  const key = `${n}:${j}`;
  let range = ranges.get(key);
  if (!range) {
    const d = seededDeviates(SAMPLES * n);
    range = { min: Infinity, max: -Infinity };
    for (let i = 0; i < SAMPLES; i++) {
      const v = d[i * n + j];
      if (v < range.min) range.min = v;
      if (v > range.max) range.max = v;
    }
    ranges.set(key, range);
  }
  return range;
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
