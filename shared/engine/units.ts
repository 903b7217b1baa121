/**
 * Unit conversions between the units results are given in (Mpc, Gyr, pc) and
 * the units public text uses (light-years, km, years). All derive from constants.ts.
 */
import { ASTRONOMICAL_UNIT, JULIAN_YEAR, LIGHT_YEAR, PARSEC, SPEED_OF_LIGHT } from './constants.ts';

/** Kilometres in one megaparsec. */
export const KM_PER_MPC = (PARSEC.value * 1e6) / 1000;
/** Seconds in one gigayear (10⁹ Julian years). */
export const SECONDS_PER_GYR = JULIAN_YEAR.value * 1e9;
/** Light-years in one parsec. */
export const LY_PER_PC = PARSEC.value / LIGHT_YEAR.value;
/** Astronomical units in one parsec (648000/π). */
export const AU_PER_PC = PARSEC.value / ASTRONOMICAL_UNIT.value;

/** @param mpc distance in Mpc @returns distance in light-years */
export const mpcToLy = (mpc: number): number => mpc * 1e6 * LY_PER_PC;
/** @param mpc distance in Mpc @returns distance in km */
export const mpcToKm = (mpc: number): number => mpc * KM_PER_MPC;
/** @param pc distance in parsecs @returns distance in light-years */
export const pcToLy = (pc: number): number => pc * LY_PER_PC;
/** @param gyr time in Gyr @returns time in years */
export const gyrToYr = (gyr: number): number => gyr * 1e9;

/**
 * Hubble distance c/H0.
 * @param H0 Hubble constant in km/s/Mpc
 * @returns c/H0 in Mpc
 */
export const hubbleDistanceMpc = (H0: number): number => SPEED_OF_LIGHT.value / H0;

/**
 * Hubble time 1/H0.
 * @param H0 Hubble constant in km/s/Mpc
 * @returns 1/H0 in Gyr
 */
export const hubbleTimeGyr = (H0: number): number => KM_PER_MPC / H0 / SECONDS_PER_GYR;

/** A value in another unit, for display beside the result. */
export interface Conversion {
  value: number;
  unit: string;
}

/**
 * Conversions offered beside a result, so public text can use familiar units.
 * @param value the result's value
 * @param unit the result's unit
 * @returns the same value in other units (empty when none apply)
 */
export function conversionsFor(value: number, unit: string): Conversion[] {
  if (unit === 'Mpc') {
    const ly = mpcToLy(value);
    return [
      { value: ly, unit: 'ly' },
      { value: ly / 1e9, unit: 'Gly' },
      { value: mpcToKm(value), unit: 'km' },
    ];
  }
  if (unit === 'Gyr') return [{ value: gyrToYr(value), unit: 'yr' }];
  if (unit === 'pc')
    return [
      { value: pcToLy(value), unit: 'ly' },
      { value: value * AU_PER_PC, unit: 'au' },
    ];
  return [];
}
