/**
 * The simple Hubble law, d = cz/H0: a classroom model that holds only at small
 * redshift. Under it every distance measure is the same cz/H0 and times are z/H0;
 * results carry a warning when z > 0.1, where the law is no longer a good guide.
 */
import { SPEED_OF_LIGHT } from './constants.ts';

/** Above this redshift the Hubble law's working carries a warning. */
export const HUBBLE_LAW_MAX_Z = 0.1;

/** The warning shown when the Hubble law is used beyond its range. */
export const HUBBLE_LAW_WARNING =
  'The simple Hubble law d = cz/H0 only holds for small redshifts (z < 0.1); at this redshift it misstates the distance — use a cosmology model instead.';

/**
 * Distance under the Hubble law.
 * @param z redshift
 * @param H0 Hubble constant in km/s/Mpc
 * @returns cz/H0 in Mpc
 */
export function hubbleLawDistanceMpc(z: number, H0: number): number {
  return (SPEED_OF_LIGHT.value * z) / H0;
}
