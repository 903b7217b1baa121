/**
 * The calculation contract in words: what each quantity and input is called on screen, and the
 * engine's messages (which name the contract's snake_case keys, as the API states them) rewritten
 * for people. The calculator's form and the statements' "cannot be worked out" reasons use them.
 */
import { CALC_NUMERIC_INPUTS, CALC_QUANTITIES, type CalcNumericInput, type CalcQuantity } from '../schemas/calc.ts';

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

const lowerFirst = (s: string) => `${s.charAt(0).toLowerCase()}${s.slice(1)}`;

const KEY_PATTERN = new RegExp(
  `\\b(${[...CALC_NUMERIC_INPUTS, ...CALC_QUANTITIES].sort((a, b) => b.length - a.length).join('|')})\\b`,
  'g',
);

/**
 * Rewrites an engine message in words: input and quantity keys become their labels, and the value
 * at fault is shown with a true minus sign.
 * @param message e.g. "parallax_mas must be greater than 0 (got -1)"
 * @returns e.g. "Parallax (mas) must be greater than 0 (the value is −1)"
 */
export function engineMessageInWords(message: string): string {
  const text = message
    .replace(KEY_PATTERN, (key) => {
      // Only the label's first letter: "the Sun", "z" and "A" keep their case inside a sentence.
      if (key in INPUT_LABELS) {
        const l = INPUT_LABELS[key as CalcNumericInput];
        return `${lowerFirst(l.label)}${l.unit ? ` (${l.unit})` : ''}`;
      }
      // A quantity's label may explain itself after a colon ("Lookback time: how long ago …").
      return lowerFirst(QUANTITY_LABELS[key as CalcQuantity].split(':')[0]);
    })
    .replace(/\bmodel\.(\w+)/g, 'the model’s $1')
    .replace(/\(got (-?)([^()]*?)\)/g, (_all, minus: string, rest: string) =>
      /^[\d.e+-]+$/.test(rest) ? `(the value is ${minus ? '−' : ''}${rest})` : `(got ${minus ? '−' : ''}${rest})`,
    );
  return text.charAt(0).toUpperCase() + text.slice(1);
}
