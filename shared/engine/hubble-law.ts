/**
 * The simple Hubble law, d = cz/H0: a classroom model that holds only at small
 * redshift. Under it every distance measure is the same cz/H0 and times are z/H0.
 * Each result is compared with a standard FLRW model (hubble-law-limit.ts): the
 * difference widens its interval, and above the tolerance it carries a warning.
 */
import { SPEED_OF_LIGHT } from './constants.ts';
import { hubbleTimeGyr } from './units.ts';

/**
 * The warning shown when the Hubble law is used beyond its range.
 * @param difference this result's relative difference from the standard model
 * @param tolerance the tolerance it exceeds
 */
export function hubbleLawWarning(difference: number, tolerance: number): string {
  return `The simple Hubble law d = cz/H0 only holds for small redshifts; here it differs from a standard cosmology model (Planck 2018 densities) by ${(difference * 100).toPrecision(2)} %, more than our ${tolerance * 100} % tolerance — use a cosmology model instead.`;
}

/**
 * Distance under the Hubble law.
 * @param z redshift
 * @param H0 Hubble constant in km/s/Mpc
 * @returns cz/H0 in Mpc
 */
export function hubbleLawDistanceMpc(z: number, H0: number): number {
  return (SPEED_OF_LIGHT.value * z) / H0;
}

/**
 * Light-travel time under the Hubble law: the distance divided by c, i.e. z/H0.
 * @param z redshift
 * @param H0 Hubble constant in km/s/Mpc
 * @returns z/H0 in Gyr
 */
export function hubbleLawTimeGyr(z: number, H0: number): number {
  return z * hubbleTimeGyr(H0);
}
