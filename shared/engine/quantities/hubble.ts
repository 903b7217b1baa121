/**
 * Quantities under the simple Hubble law d = cz/H0, each recording its step. The comparison with
 * a standard model, the warning and the widened interval are added by calculate.ts.
 */
import { SPEED_OF_LIGHT } from '../constants.ts';
import { CalcError } from '../errors.ts';
import { hubbleTimeGyr } from '../units.ts';
import { fromConstant, record } from '../working.ts';
import { type Ctx, currentH0, h0Value, inputValue } from './context.ts';

// The law's range is not decided here: the next step of the working compares the result with a standard model.
const LAW_NOTE = 'A classroom model for small redshifts; the step after it compares it with a standard cosmology model.';

function checkZ(z: number): void {
  if (!(z > -1)) throw new CalcError('out_of_range', `z must be greater than −1 (got ${z})`);
}

/**
 * Any distance measure under the Hubble law: cz/H0.
 * @param ctx evaluation context
 * @param z redshift
 * @param measure which distance the request asked for, named in the step
 * @returns distance in Mpc
 */
export function hubbleLawDistanceSteps(ctx: Ctx, z: number, measure: string): number {
  checkZ(z);
  return record(ctx.steps, (SPEED_OF_LIGHT.value * z) / currentH0(ctx), () => ({
    title: `Hubble law: distance proportional to redshift (used here for the ${measure})`,
    formula: 'd = c z / H0',
    inputs: [inputValue(ctx, 'z', z), h0Value(ctx)],
    constants: [fromConstant(SPEED_OF_LIGHT)],
    result: { symbol: 'd', name: `${measure} (Hubble law)`, unit: 'Mpc' },
    note: `Under the simple Hubble law every distance measure equals cz/H0. ${LAW_NOTE}`,
  }));
}

/**
 * Light-travel time under the Hubble law: d/c = z/H0.
 * @param ctx evaluation context
 * @param z redshift
 * @returns time in Gyr
 */
export function hubbleLawTimeSteps(ctx: Ctx, z: number): number {
  checkZ(z);
  return record(ctx.steps, z * hubbleTimeGyr(currentH0(ctx)), () => ({
    title: 'Hubble law: light-travel time is the distance divided by the speed of light',
    formula: 't = d / c = z / H0',
    inputs: [inputValue(ctx, 'z', z), h0Value(ctx)],
    constants: [],
    result: { symbol: 't', name: 'light-travel time (Hubble law)', unit: 'Gyr' },
    note: `1/H0 converted to Gyr with the IAU parsec and the Julian year. ${LAW_NOTE}`,
  }));
}

/**
 * Redshift from a distance or a time under the Hubble law.
 * @param ctx evaluation context
 * @param key the input used (distance_mpc or lookback_gyr)
 * @param x its value
 * @returns z
 */
export function hubbleLawRedshiftSteps(ctx: Ctx, key: 'distance_mpc' | 'lookback_gyr', x: number): number {
  if (!(x > 0)) throw new CalcError('out_of_range', `${key} must be greater than 0 (got ${x})`);
  const H0 = currentH0(ctx);
  const z = key === 'distance_mpc' ? (H0 * x) / SPEED_OF_LIGHT.value : x / hubbleTimeGyr(H0);
  return record(ctx.steps, z, () => ({
    title: 'Hubble law solved for the redshift',
    formula: key === 'distance_mpc' ? 'z = H0 d / c' : 'z = H0 t',
    inputs: [inputValue(ctx, key, x), h0Value(ctx)],
    constants: key === 'distance_mpc' ? [fromConstant(SPEED_OF_LIGHT)] : [],
    result: { symbol: 'z', name: 'redshift (Hubble law)', unit: '' },
    note: LAW_NOTE,
  }));
}
