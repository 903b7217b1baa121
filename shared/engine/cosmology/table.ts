/**
 * Precomputed tables of the comoving-distance and lookback-time integrals in the
 * smooth variable u = ln(1+z). Each node holds the integral and its exact
 * derivative, so cubic Hermite interpolation errs by about h⁴/384 × (third
 * derivative of the integrand): with h = 0.005 that is below 3e-10 relative
 * (measured by the benchmark). This is what makes a million distances take milliseconds.
 */
import { gaussLegendre } from './quadrature.ts';

/** Tabulated integrals: values and exact derivatives with respect to u. */
export interface IntegralTable {
  /** Step in u. */
  readonly h: number;
  /** Last tabulated u. */
  readonly uMax: number;
  /** ∫0^z dz'/E(z') at each node, and its u-derivative (1+z)/E. */
  readonly comoving: Float64Array;
  readonly comovingSlope: Float64Array;
  /** ∫0^z dz'/((1+z')E(z')) at each node, and its u-derivative 1/E. */
  readonly lookback: Float64Array;
  readonly lookbackSlope: Float64Array;
}

const RULE = gaussLegendre(8);

/**
 * Builds the table on [0, ln(1+zMax)] with panels of width h, integrating each
 * panel with an 8-point Gauss–Legendre rule.
 * @param e2 E(z)² of the model (must be positive on the range)
 * @param zMax last redshift to tabulate
 * @param h step in u
 * @returns the table
 */
export function buildTable(e2: (z: number) => number, zMax = 1e4, h = 0.005): IntegralTable {
  const n = Math.ceil(Math.log1p(zMax) / h) + 1;
  const comoving = new Float64Array(n);
  const comovingSlope = new Float64Array(n);
  const lookback = new Float64Array(n);
  const lookbackSlope = new Float64Array(n);
  const invE = (u: number): number => 1 / Math.sqrt(e2(Math.expm1(u)));
  for (let i = 0; i < n; i++) {
    const u = i * h;
    const ie = invE(u);
    comovingSlope[i] = Math.exp(u) * ie;
    lookbackSlope[i] = ie;
    if (i === 0) continue;
    let sc = 0;
    let st = 0;
    const mid = u - 0.5 * h;
    for (let k = 0; k < RULE.x.length; k++) {
      const uk = mid + 0.5 * h * RULE.x[k];
      const iek = invE(uk);
      sc += RULE.w[k] * Math.exp(uk) * iek;
      st += RULE.w[k] * iek;
    }
    comoving[i] = comoving[i - 1] + 0.5 * h * sc;
    lookback[i] = lookback[i - 1] + 0.5 * h * st;
  }
  return { h, uMax: (n - 1) * h, comoving, comovingSlope, lookback, lookbackSlope };
}

/**
 * Cubic Hermite interpolation in the table (u must lie in [0, uMax]).
 * @param values node values
 * @param slopes node derivatives with respect to u
 * @param h node spacing
 * @param u where to evaluate
 * @returns the interpolated integral
 */
export function interpolate(values: Float64Array, slopes: Float64Array, h: number, u: number): number {
  const t = u / h;
  let i = Math.floor(t);
  if (i >= values.length - 1) i = values.length - 2;
  const s = t - i;
  const s2 = s * s;
  const s3 = s2 * s;
  return (
    (2 * s3 - 3 * s2 + 1) * values[i] +
    (s3 - 2 * s2 + s) * h * slopes[i] +
    (3 * s2 - 2 * s3) * values[i + 1] +
    (s3 - s2) * h * slopes[i + 1]
  );
}
