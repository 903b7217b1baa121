/**
 * Plain-English names for the calculator's choices of inputs, bands and units, for forms and
 * results (the contract's quantities and inputs are named in shared/contract/words.ts, which the
 * statements use too). The contract itself keeps its snake_case keys.
 */
import { SOLAR_MAGNITUDES } from '@shared/engine/solar-magnitudes.ts';

/** How a group of alternative inputs is offered in a choice ("Distance from …"). */
export const GROUP_LABELS: Record<string, string> = {
  z: 'a redshift',
  distance_mpc: 'a luminosity distance',
  parallax_mas: 'a parallax',
  delta_mag: 'a magnitude difference',
  'm1,m2': 'two magnitudes',
  'distance_1,distance_2': 'two distances (inverse-square law)',
};

/**
 * A band's label for a select, e.g. "Johnson V (Vega)".
 * @param band a key of SOLAR_MAGNITUDES
 * @returns the label
 */
export function bandLabel(band: string): string {
  const b = SOLAR_MAGNITUDES[band];
  return b ? `${b.label} (${b.system} magnitudes)` : band;
}

/** Unit symbols in words, for results read aloud and for the unit line under a value. */
export const UNIT_WORDS: Record<string, string> = {
  Mpc: 'megaparsecs',
  Gyr: 'billion years',
  mag: 'magnitudes',
  'km/s/Mpc': 'kilometres per second per megaparsec',
  pc: 'parsecs',
  ly: 'light-years',
  Gly: 'billion light-years',
  km: 'kilometres',
  yr: 'years',
  au: 'astronomical units',
};
