/**
 * Inverse problems: the redshift at which the lookback time or the luminosity
 * distance takes a given value, found by bracketing and Brent's method in
 * u = ln(1+z), where both curves are smooth.
 *
 * Every solution or none: a luminosity distance reached at several redshifts (a closed model, where
 * D_L rises, falls and rises again) is refused with all of them named. And the answer's sensitivity
 * is checked: the condition number κ = |(x/z)(dz/dx)| says by how many per cent z moves for a 1 %
 * change of the given x. Above WARN_CONDITION the result carries a warning; above MAX_CONDITION (a
 * 0.1 % change of the time or distance would move z by more than 100 %) it is refused.
 */
import { ageIntegral, brent, expansionRate, lookbackIntegral, luminosityDistanceMpc } from '../cosmology/distances.ts';
import { CalcError } from '../errors.ts';
import { record } from '../working.ts';
import { type Ctx, currentH0, h0Value, inputValue, requireCosmology } from './context.ts';

/** Above this condition number an inverse result carries a warning (1 % in the input moves z by over 10 %). */
export const WARN_CONDITION = 10;
/** Above this condition number an inverse is refused (0.1 % in the input would move z by over 100 %). */
export const MAX_CONDITION = 1000;

/** Warns or refuses by the condition number; returns the sentence for the working. */
function conditionNote(ctx: Ctx, kappa: number, key: string): string {
  const shown = kappa.toPrecision(3);
  if (!(kappa <= MAX_CONDITION)) {
    throw new CalcError(
      'ill_conditioned',
      `${key} is where the redshift hardly changes it (condition number ${shown}: a 0.1 % change of ${key} would move z by over 100 %), so z cannot be told from it; give a redshift instead`,
    );
  }
  if (kappa > WARN_CONDITION) {
    ctx.warnings?.add(
      `The redshift is sensitive to ${key}: a 1 % change of ${key} moves z by about ${Math.round(kappa)} % (condition number ${shown}).`,
    );
  }
  return `Condition number |(x/z) dz/dx| = ${shown}: a 1 % change of ${key} moves z by about ${kappa < 0.1 ? kappa.toPrecision(1) : kappa.toPrecision(2)} %.`;
}

// Largest redshift searched: far beyond recombination, where every model here is radiation dominated.
const U_LIMIT = Math.log1p(1e8);

// Step of the outward scan for crossings, in ln(1+z): two crossings closer than this could be missed.
const SCAN_STEP = 0.05;

function searchLimit(zBounce: number): number {
  return zBounce === Infinity ? U_LIMIT : Math.min(U_LIMIT, Math.log1p(zBounce) * (1 - 1e-9));
}

/** z such that the lookback time equals lookback_gyr. */
export function zFromLookbackSteps(ctx: Ctx, t: number): number {
  const c = requireCosmology(ctx);
  if (!(t > 0)) throw new CalcError('out_of_range', `lookback_gyr must be greater than 0 (got ${t})`);
  const tH = c.model.hubbleTime / ctx.h0Scale;
  if (c.model.hasBigBang) {
    const age = ageIntegral(c, 0) * tH;
    if (t >= age) {
      throw new CalcError(
        'no_solution',
        `lookback_gyr must be less than the age of the universe in this model, ${age.toFixed(4)} Gyr (got ${t})`,
      );
    }
  }
  const f = (u: number): number => lookbackIntegral(c, Math.expm1(u)) * tH - t;
  const uHi = bracket(f, searchLimit(c.model.zBounce));
  if (uHi === null) throw new CalcError('no_solution', `lookback_gyr = ${t} is longer than any lookback time this model reaches`);
  const z = Math.expm1(brent(f, 0, uHi));
  // dt/dz = t_H / ((1+z) E(z)), so κ = (t/z)(dz/dt) = t (1+z) E(z) / (t_H z).
  const conditioned = conditionNote(ctx, (t * (1 + z) * expansionRate(c, z)) / (tH * z), 'lookback_gyr');
  return record(ctx.steps, z, () => ({
    title: 'Redshift at which the lookback time equals the given time',
    formula: 'solve t_H ∫₀^z dz′ / ((1+z′) E(z′)) = t_L for z',
    inputs: [inputValue(ctx, 'lookback_gyr', t), h0Value(ctx)],
    constants: [],
    result: { symbol: 'z', name: 'redshift', unit: '' },
    note: `Solved by Brent's method in ln(1+z) to a relative tolerance of 1e-13; check: the lookback time at this z is ${(f(Math.log1p(z)) + t).toPrecision(10)} Gyr. ${conditioned}`,
  }));
}

/** z such that the luminosity distance equals distance_mpc. */
export function zFromLuminosityDistanceSteps(ctx: Ctx, d: number): number {
  const c = requireCosmology(ctx);
  if (!(d > 0)) throw new CalcError('out_of_range', `distance_mpc must be greater than 0 (got ${d})`);
  const f = (u: number): number => luminosityDistanceMpc(c, Math.expm1(u)) / ctx.h0Scale - d;
  // The luminosity distance need not be monotonic in a closed model: it can rise, then fall, so a
  // distance may be reached twice, and both crossings are looked for. Flat and open models rise
  // monotonically (both 1+z and D_M do), so there the first crossing is the only one.
  const closed = c.model.Ok0 < 0;
  const limit = Math.min(searchLimit(c.model.zBounce), Math.log1p(1e6));
  const roots: number[] = [];
  let lo = 0;
  let fLo = f(0);
  for (let u = SCAN_STEP; lo < limit; u += SCAN_STEP) {
    const uu = Math.min(u, limit);
    const fu = f(uu);
    if (fLo < 0 && fu >= 0) {
      roots.push(Math.expm1(fu === 0 ? uu : brent(f, lo, uu)));
      lo = uu;
      break;
    }
    lo = uu;
    fLo = fu;
  }
  if (closed && roots.length === 1) {
    // Past the first crossing a closed model's D_L rises to a maximum, then falls towards zero at the
    // antipode: a second crossing is where it falls below d again. Steps grow geometrically from the
    // first root, and the scan stops where the distance is no longer defined.
    let prev = lo;
    for (let step = SCAN_STEP; prev < limit; step *= 1.5) {
      const uu = Math.min(prev + step, limit);
      let fu: number;
      try {
        fu = f(uu);
      } catch {
        break;
      }
      if (!Number.isFinite(fu)) break;
      if (fu < 0) {
        roots.push(Math.expm1(brent(f, prev, uu)));
        break;
      }
      prev = uu;
    }
  }
  if (roots.length === 0)
    throw new CalcError(
      'no_solution',
      `distance_mpc = ${d} is larger than any luminosity distance this model reaches below z = 10⁶`,
    );
  if (roots.length > 1) {
    throw new CalcError(
      'several_solutions',
      `distance_mpc = ${d} is the luminosity distance at ${roots.length} redshifts in this model (z = ${roots.map((r) => r.toPrecision(6)).join(', ')}): the distance alone cannot tell which, so no single redshift is given`,
    );
  }
  const z = roots[0];
  // κ = (d/z)(dz/dd) = d / (z dD_L/dz), the slope by a central difference in z.
  const h = 1e-5 * (1 + z);
  const slope = (luminosityDistanceMpc(c, z + h) - luminosityDistanceMpc(c, Math.max(0, z - h))) / (z + h - Math.max(0, z - h));
  const conditioned = conditionNote(ctx, d / (z * slope * (1 / ctx.h0Scale)), 'distance_mpc');
  return record(ctx.steps, z, () => ({
    title: 'Redshift at which the luminosity distance equals the given distance',
    formula: 'solve (1+z) D_M(z) = d_L for z',
    inputs: [inputValue(ctx, 'distance_mpc', d), h0Value(ctx)],
    constants: [],
    result: { symbol: 'z', name: 'redshift', unit: '' },
    note: `Solved by Brent's method in ln(1+z) to a relative tolerance of 1e-13 (H0 = ${currentH0(ctx)} km/s/Mpc); check: the luminosity distance at this z is ${(f(Math.log1p(z)) + d).toPrecision(10)} Mpc. Every crossing between z = 0 and the search limit was looked for ${closed ? '(the model is closed: past the first crossing, on through the maximum of D_L to where it is no longer defined)' : '(the model is not closed, so D_L rises with z)'}; this is the only one. ${conditioned}`,
  }));
}

/** Doubles the upper end until f changes sign; null when it never does below the limit. */
function bracket(f: (u: number) => number, limit: number): number | null {
  for (let u = Math.min(1, limit); ; u = Math.min(2 * u, limit)) {
    if (f(u) >= 0) return u;
    if (u >= limit) return null;
  }
}
