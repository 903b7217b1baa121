/**
 * Inverse problems: the redshift at which the lookback time or the luminosity
 * distance takes a given value, found by bracketing and Brent's method in
 * u = ln(1+z), where both curves are smooth.
 */
import { ageIntegral, brent, lookbackIntegral, luminosityDistanceMpc } from '../cosmology/distances.ts';
import { CalcError } from '../errors.ts';
import { record } from '../working.ts';
import { type Ctx, currentH0, h0Value, inputValue, requireCosmology } from './context.ts';

// Largest redshift searched: far beyond recombination, where every model here is radiation dominated.
const U_LIMIT = Math.log1p(1e8);

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
  return record(ctx.steps, z, () => ({
    title: 'Redshift at which the lookback time equals the given time',
    formula: 'solve t_H ∫₀^z dz′ / ((1+z′) E(z′)) = t_L for z',
    inputs: [inputValue(ctx, 'lookback_gyr', t), h0Value(ctx)],
    constants: [],
    result: { symbol: 'z', name: 'redshift', unit: '' },
    note: `Solved by Brent's method in ln(1+z) to a relative tolerance of 1e-13; check: the lookback time at this z is ${(f(Math.log1p(z)) + t).toPrecision(10)} Gyr.`,
  }));
}

/** z such that the luminosity distance equals distance_mpc. */
export function zFromLuminosityDistanceSteps(ctx: Ctx, d: number): number {
  const c = requireCosmology(ctx);
  if (!(d > 0)) throw new CalcError('out_of_range', `distance_mpc must be greater than 0 (got ${d})`);
  const f = (u: number): number => luminosityDistanceMpc(c, Math.expm1(u)) / ctx.h0Scale - d;
  // The luminosity distance need not be monotonic in a closed model: step outward to the first crossing.
  const limit = Math.min(searchLimit(c.model.zBounce), Math.log1p(1e6));
  let lo = 0;
  let hi = -1;
  for (let u = 0.05; ; u += 0.05) {
    const uu = Math.min(u, limit);
    if (f(uu) >= 0) {
      hi = uu;
      break;
    }
    lo = uu;
    if (uu >= limit) break;
  }
  if (hi < 0)
    throw new CalcError(
      'no_solution',
      `distance_mpc = ${d} is larger than any luminosity distance this model reaches below z = 10⁶`,
    );
  const z = Math.expm1(brent(f, lo, hi));
  return record(ctx.steps, z, () => ({
    title: 'Redshift at which the luminosity distance equals the given distance',
    formula: 'solve (1+z) D_M(z) = d_L for z',
    inputs: [inputValue(ctx, 'distance_mpc', d), h0Value(ctx)],
    constants: [],
    result: { symbol: 'z', name: 'redshift', unit: '' },
    note: `Solved by Brent's method in ln(1+z) to a relative tolerance of 1e-13 (H0 = ${currentH0(ctx)} km/s/Mpc); check: the luminosity distance at this z is ${(f(Math.log1p(z)) + d).toPrecision(10)} Mpc.`,
  }));
}

/** Doubles the upper end until f changes sign; null when it never does below the limit. */
function bracket(f: (u: number) => number, limit: number): number | null {
  for (let u = Math.min(1, limit); ; u = Math.min(2 * u, limit)) {
    if (f(u) >= 0) return u;
    if (u >= limit) return null;
  }
}
