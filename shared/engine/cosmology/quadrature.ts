/**
 * Numerical integration used by the distance integrals: Gauss–Legendre rules
 * (nodes computed once by Newton iteration on the Legendre polynomial, so no
 * hand-copied tables) and an adaptive bisecting Gauss–Legendre scheme.
 */
import { CalcError } from '../errors.ts';

/** Nodes and weights of an n-point Gauss–Legendre rule on [−1, 1]. */
export interface GaussRule {
  x: Float64Array;
  w: Float64Array;
}

/**
 * Computes an n-point Gauss–Legendre rule.
 * @param n number of points
 * @returns nodes and weights on [−1, 1]
 */
export function gaussLegendre(n: number): GaussRule {
  const x = new Float64Array(n);
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let t = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let dp = 0;
    for (let iter = 0; iter < 100; iter++) {
      let p0 = 1;
      let p1 = t;
      for (let k = 2; k <= n; k++) {
        const p2 = ((2 * k - 1) * t * p1 - (k - 1) * p0) / k;
        p0 = p1;
        p1 = p2;
      }
      dp = (n * (t * p1 - p0)) / (t * t - 1);
      const dt = p1 / dp;
      t -= dt;
      if (Math.abs(dt) < 1e-16) break;
    }
    x[i] = t;
    w[i] = 2 / ((1 - t * t) * dp * dp);
  }
  return { x, w };
}

const RULE = gaussLegendre(10);

/**
 * One application of the 10-point rule on [a, b].
 * @param f integrand
 * @param a lower limit
 * @param b upper limit
 * @returns the estimate
 */
export function gaussPanel(f: (x: number) => number, a: number, b: number, rule: GaussRule = RULE): number {
  const half = 0.5 * (b - a);
  const mid = 0.5 * (a + b);
  let sum = 0;
  for (let i = 0; i < rule.x.length; i++) sum += rule.w[i] * f(mid + half * rule.x[i]);
  return sum * half;
}

/**
 * Adaptive integration: bisects a panel until the 10-point estimate of the whole
 * agrees with the sum over its halves to the requested relative tolerance.
 * @param f integrand
 * @param a lower limit
 * @param b upper limit
 * @param relTol relative tolerance
 * @returns the integral
 * @throws CalcError when the integrand is not finite (a model that breaks down inside [a, b])
 */
export function integrate(f: (x: number) => number, a: number, b: number, relTol = 1e-12): number {
  if (a === b) return 0;
  const total = gaussPanel(f, a, b);
  if (!Number.isFinite(total)) throw new CalcError('non_finite_result', 'the integrand is not finite over the requested range');
  const scale = Math.abs(total) || 1;
  const recurse = (lo: number, hi: number, whole: number, depth: number): number => {
    const mid = 0.5 * (lo + hi);
    const left = gaussPanel(f, lo, mid);
    const right = gaussPanel(f, mid, hi);
    const both = left + right;
    if (!Number.isFinite(both)) throw new CalcError('non_finite_result', 'the integrand is not finite over the requested range');
    if (depth >= 40 || Math.abs(both - whole) <= relTol * scale) return both;
    return recurse(lo, mid, left, depth + 1) + recurse(mid, hi, right, depth + 1);
  };
  return recurse(a, b, total, 0);
}
