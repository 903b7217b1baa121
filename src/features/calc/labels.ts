/**
 * Plain-English names for the calculation contract's quantities, inputs, bands
 * and units, for forms and results. The contract itself keeps its snake_case keys.
 */
import { SOLAR_MAGNITUDES } from '@shared/engine/solar-magnitudes.ts';
import type { CalcNumericInput, CalcQuantity } from '@shared/schemas/calc.ts';

/** What each quantity is, as a person would ask for it. */
export const QUANTITY_LABELS: Record<CalcQuantity, string> = {
  comoving_distance: 'Comoving distance along the line of sight',
  transverse_comoving_distance: 'Transverse comoving distance',
  angular_diameter_distance: 'Angular-diameter distance',
  luminosity_distance: 'Luminosity distance',
  light_travel_distance: 'Light-travel distance',
  proper_distance: 'Proper distance today',
  lookback_time: 'Lookback time: how long ago the light set out',
  age_at_z: 'Age of the universe when the light set out',
  age_now: 'Age of the universe today',
  hubble_parameter: 'Expansion rate H(z) at a redshift',
  distance_modulus: 'Distance modulus',
  absolute_magnitude: 'Absolute magnitude',
  luminosity_ratio_sun: 'Luminosity compared with the Sun',
  z_from_lookback_time: 'Redshift from a lookback time',
  z_from_luminosity_distance: 'Redshift from a luminosity distance',
  parallax_distance: 'Distance from a parallax',
  flux_ratio: 'Brightness ratio of two sources',
};

/** Each numeric input: its label and, where it has one, its unit. */
export const INPUT_LABELS: Record<CalcNumericInput, { label: string; unit?: string; hint?: string }> = {
  z: { label: 'Redshift z' },
  m: { label: 'Apparent magnitude m', unit: 'mag' },
  extinction: { label: 'Extinction A', unit: 'mag', hint: 'Dimming by interstellar dust; 0 when left empty.' },
  alpha: { label: 'Spectral index α', hint: 'For the K-correction of a power law f_ν ∝ ν^α; needs a redshift.' },
  parallax_mas: { label: 'Parallax', unit: 'mas' },
  lookback_gyr: { label: 'Lookback time', unit: 'Gyr' },
  distance_mpc: { label: 'Luminosity distance', unit: 'Mpc' },
  m1: { label: 'Magnitude of the first source m₁', unit: 'mag' },
  m2: { label: 'Magnitude of the second source m₂', unit: 'mag' },
  delta_mag: { label: 'Magnitude difference Δm', unit: 'mag' },
  distance_1: { label: 'Distance to the first position d₁', hint: 'Any unit, the same for both distances.' },
  distance_2: { label: 'Distance to the second position d₂', hint: 'Any unit, the same for both distances.' },
};

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
