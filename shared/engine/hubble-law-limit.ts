/**
 * How far the simple Hubble law may be trusted, derived rather than assumed: the law is compared
 * with a standard FLRW model (the Planck 2018 densities, flat ΛCDM, with the law's own H0) for every
 * quantity the law answers, and the redshift at which the largest difference reaches the tolerance is
 * the warning threshold. Kept apart from hubble-law.ts because it calls the whole engine.
 */
import type { CalcQuantity, CalcSuccess } from '../schemas/calc.ts';
import { calculate } from './calculate.ts';
import { PLANCK18 } from './cosmology/presets.ts';
import { hubbleLawDistanceMpc, hubbleLawTimeGyr } from './hubble-law.ts';

/**
 * The tolerance: 3 %, the relative uncertainty at which our precision rule drops from three
 * significant figures to two. Below it the law's own error costs no figure; above it, it does.
 */
export const HUBBLE_LAW_TOLERANCE = 0.03;

/** The quantities the Hubble law answers from a redshift (all distances are cz/H0, times z/H0). */
const LAW_QUANTITIES: CalcQuantity[] = [
  'comoving_distance',
  'transverse_comoving_distance',
  'angular_diameter_distance',
  'luminosity_distance',
  'light_travel_distance',
  'proper_distance',
  'lookback_time',
];

/**
 * The standard model the law is measured against: Planck 2018 (astropy's Planck18 parameters)
 * with H0 replaced by the law's, so only the shape of the expansion differs.
 * @param H0 the law's Hubble constant
 */
export function referenceModel(H0: number) {
  const { name: _name, ...params } = PLANCK18.params;
  return { ...params, name: 'Planck 2018 densities (reference for the Hubble law)', H0 };
}

function resultValue(r: ReturnType<typeof calculate>): number {
  return 'value' in r ? (r as CalcSuccess).value : Number.NaN;
}

/**
 * The largest relative difference between the law and the reference model at a redshift, over
 * every quantity the law answers.
 * @param z redshift
 */
export function largestLawDifference(z: number): { difference: number; quantity: CalcQuantity } {
  let worst = { difference: 0, quantity: LAW_QUANTITIES[0] };
  for (const quantity of LAW_QUANTITIES) {
    // The law's value in closed form (a law request through calculate would compare itself again).
    const law = quantity === 'lookback_time' ? hubbleLawTimeGyr(z, 70) : hubbleLawDistanceMpc(z, 70);
    const flrw = resultValue(calculate({ quantity, inputs: { z }, model: referenceModel(70) }));
    const difference = Math.abs(law / flrw - 1);
    if (difference > worst.difference) worst = { difference, quantity };
  }
  return worst;
}

let threshold: number | undefined;

/**
 * The redshift above which the Hubble law differs from the standard model by more than the
 * tolerance in some quantity it answers (found by bisection; the difference grows with z).
 * @returns the threshold, about 0.024 (set by the angular diameter distance)
 */
export function hubbleLawMaxZ(): number {
  if (threshold === undefined) {
    let lo = 0.001;
    let hi = 0.5;
    for (let i = 0; i < 40; i++) {
      const mid = (lo + hi) / 2;
      if (largestLawDifference(mid).difference > HUBBLE_LAW_TOLERANCE) hi = mid;
      else lo = mid;
    }
    threshold = (lo + hi) / 2;
  }
  return threshold;
}
