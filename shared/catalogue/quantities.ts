/**
 * The quantities a measurement can be of: each with its canonical unit (what the database stores),
 * the units accepted on entry with their factor to the canonical unit, and whether a photometric
 * band is needed. Factors derive from shared/engine/constants.ts so entry and engine agree.
 */
import {
  ASTRONOMICAL_UNIT,
  GRAVITATIONAL_CONSTANT,
  LIGHT_YEAR,
  PARSEC,
  SOLAR_MASS_PARAMETER,
  SOLAR_RADIUS,
} from '../engine/constants.ts';

/** A unit accepted for a quantity: value_in_canonical = value × toCanonical. */
export interface QuantityUnit {
  id: string;
  label: string;
  toCanonical: number;
  /** Other spellings accepted in forms and CSV files (compared case-sensitively: Mpc ≠ mpc). */
  aliases?: readonly string[];
  /** Where the factor comes from, when it is not a plain power of ten. */
  source?: string;
}

/** One kind of measured quantity. */
export interface QuantityDefinition {
  id: string;
  label: string;
  symbol: string;
  canonicalUnit: string;
  units: readonly QuantityUnit[];
  needsBand: boolean;
  /** Values (canonical) must be above this, when set. */
  exclusiveMin?: number;
  /** Values (canonical) must be at least this, when set. */
  inclusiveMin?: number;
  /** Values (canonical) must be at most this, when set. */
  inclusiveMax?: number;
  /**
   * Why the limits are what they are, for a person: ends the message of a value out of range.
   * The same limits are check constraints on `measurements` (migration 202612050201).
   */
  limitReason?: string;
  hint: string;
}

/**
 * Earth's nominal mass parameter GM⊕ (IAU 2015 Resolution B3). Not in the engine's constants
 * because no engine computation needs it; only mass entry in Earth masses does.
 */
export const EARTH_MASS_PARAMETER = {
  value: 3.986004e14,
  unit: 'm³ s⁻²',
  source: 'IAU 2015 Resolution B3 (nominal terrestrial mass parameter)',
} as const;

const G = GRAVITATIONAL_CONSTANT.value;
const PC_M = PARSEC.value;

const DIMENSIONLESS: QuantityUnit = { id: '', label: 'no unit', toCanonical: 1, aliases: ['1', '-', 'dimensionless', 'none'] };
const MAG: QuantityUnit = { id: 'mag', label: 'mag', toCanonical: 1, aliases: ['magnitude', 'magnitudes'] };

/** Every quantity, by id. */
export const QUANTITIES = {
  redshift: {
    id: 'redshift',
    label: 'Redshift',
    symbol: 'z',
    canonicalUnit: '',
    units: [DIMENSIONLESS],
    needsBand: false,
    exclusiveMin: -1,
    // 1 + z is the ratio of observed to emitted wavelength, which is positive, so z > −1 (common practice).
    limitReason: '1 + z is a ratio of wavelengths, which is never zero or negative',
    hint: 'Dimensionless; negative for objects approaching us (blueshift).',
  },
  apparent_magnitude: {
    id: 'apparent_magnitude',
    label: 'Apparent magnitude',
    symbol: 'm',
    canonicalUnit: 'mag',
    units: [MAG],
    needsBand: true,
    // The Sun is about −26.7 mag in V and the faintest objects ever measured about +31 (recalled from
    // memory): −30 to +40 leaves room for every band and still catches a value typed in the wrong field.
    inclusiveMin: -30,
    inclusiveMax: 40,
    limitReason: 'nothing in the sky is brighter than −30 (the Sun is about −26.7) or fainter than +40',
    hint: 'In a named band, e.g. V.',
  },
  extinction: {
    id: 'extinction',
    label: 'Extinction',
    symbol: 'A',
    canonicalUnit: 'mag',
    units: [MAG],
    needsBand: true,
    inclusiveMin: 0,
    // Dust only dims: extinction is never negative. About 30 mag in V towards the Galactic centre is
    // the largest known (recalled from memory), so 100 mag is a typing error.
    inclusiveMax: 100,
    limitReason: 'dust only dims the light, and no line of sight is dimmed by more than 100 magnitudes',
    hint: 'Interstellar extinction in a named band; zero or more.',
  },
  spectral_index: {
    id: 'spectral_index',
    label: 'Spectral index',
    symbol: 'α',
    canonicalUnit: '',
    units: [DIMENSIONLESS],
    needsBand: false,
    // Observed radio and optical spectral indices lie within about ±3 (common practice); ±10 only catches
    // a value in the wrong field, never a real steep or inverted spectrum.
    inclusiveMin: -10,
    inclusiveMax: 10,
    limitReason: 'measured spectral indices lie within about ±3, so a value beyond ±10 is a typing error',
    hint: 'α in f_ν ∝ ν^α; dimensionless.',
  },
  parallax: {
    id: 'parallax',
    label: 'Parallax',
    symbol: 'ϖ',
    canonicalUnit: 'mas',
    needsBand: false,
    units: [
      { id: 'mas', label: 'mas', toCanonical: 1 },
      { id: 'arcsec', label: 'arcsec', toCanonical: 1000, aliases: ['as', '″', '"'] },
      { id: 'µas', label: 'µas', toCanonical: 1e-3, aliases: ['μas', 'uas'] },
    ],
    // Negative parallaxes are published (noise around a tiny true value) and kept. The nearest star's is
    // about 768 mas (recalled from memory), so beyond ±1000 mas (1 arcsec) is a unit or typing error.
    inclusiveMin: -1000,
    inclusiveMax: 1000,
    limitReason: 'no star has a parallax larger than 1 arcsecond (1000 mas); the nearest is about 768 mas',
    hint: 'Measured parallaxes of distant stars can be negative; keep them as published.',
  },
  distance: {
    id: 'distance',
    label: 'Distance',
    symbol: 'd',
    canonicalUnit: 'pc',
    needsBand: false,
    exclusiveMin: 0,
    units: [
      { id: 'pc', label: 'pc', toCanonical: 1 },
      { id: 'kpc', label: 'kpc', toCanonical: 1e3 },
      { id: 'Mpc', label: 'Mpc', toCanonical: 1e6 },
      { id: 'ly', label: 'ly', toCanonical: LIGHT_YEAR.value / PC_M, source: `${LIGHT_YEAR.source}; ${PARSEC.source}` },
      {
        id: 'au',
        label: 'au',
        toCanonical: ASTRONOMICAL_UNIT.value / PC_M,
        source: `${ASTRONOMICAL_UNIT.source}; ${PARSEC.source}`,
      },
      { id: 'km', label: 'km', toCanonical: 1000 / PC_M, source: PARSEC.source },
    ],
    // A distance is a length: above zero. Past about 15,000 Mpc is beyond the observable universe
    // (comoving radius about 14,300 Mpc, recalled from memory): 100,000 Mpc catches a wrong unit.
    inclusiveMax: 1e11,
    limitReason: 'a distance is above zero and within the observable universe (less than 100,000 Mpc)',
    hint: 'A measured distance (not one computed from redshift).',
  },
  radius: {
    id: 'radius',
    label: 'Radius',
    symbol: 'R',
    canonicalUnit: 'km',
    needsBand: false,
    exclusiveMin: 0,
    units: [
      { id: 'km', label: 'km', toCanonical: 1 },
      {
        id: 'R_sun',
        label: 'R☉ (nominal)',
        toCanonical: SOLAR_RADIUS.value / 1000,
        aliases: ['R☉', 'Rsun'],
        source: SOLAR_RADIUS.source,
      },
      { id: 'au', label: 'au', toCanonical: ASTRONOMICAL_UNIT.value / 1000, source: ASTRONOMICAL_UNIT.source },
    ],
    // A size is above zero.
    limitReason: 'a radius is a size, so it is above zero',
    hint: 'Equatorial or mean radius as published.',
  },
  mass: {
    id: 'mass',
    label: 'Mass',
    symbol: 'M',
    canonicalUnit: 'kg',
    needsBand: false,
    exclusiveMin: 0,
    units: [
      { id: 'kg', label: 'kg', toCanonical: 1 },
      {
        id: 'M_sun',
        label: 'M☉ (nominal)',
        toCanonical: SOLAR_MASS_PARAMETER.value / G,
        aliases: ['M☉', 'Msun'],
        source: `${SOLAR_MASS_PARAMETER.source} GM☉ ÷ ${GRAVITATIONAL_CONSTANT.source} G`,
      },
      {
        id: 'M_earth',
        label: 'M⊕ (nominal)',
        toCanonical: EARTH_MASS_PARAMETER.value / G,
        aliases: ['M⊕', 'Mearth'],
        source: `${EARTH_MASS_PARAMETER.source} ÷ ${GRAVITATIONAL_CONSTANT.source} G`,
      },
    ],
    // A mass is above zero.
    limitReason: 'a mass is above zero',
    hint: 'Solar and Earth masses are the nominal mass parameters divided by G.',
  },
  angular_size: {
    id: 'angular_size',
    label: 'Angular size',
    symbol: 'θ',
    canonicalUnit: 'arcsec',
    needsBand: false,
    exclusiveMin: 0,
    units: [
      { id: 'arcsec', label: 'arcsec', toCanonical: 1, aliases: ['″', '"'] },
      { id: 'arcmin', label: 'arcmin', toCanonical: 60, aliases: ['′', "'"] },
      { id: 'deg', label: 'deg', toCanonical: 3600, aliases: ['°', 'degree', 'degrees'] },
    ],
    // An apparent diameter is above zero and cannot exceed half the sky, 180° (648,000 arcsec).
    inclusiveMax: 648_000,
    limitReason: 'an apparent diameter is above zero and at most 180°',
    hint: 'Apparent diameter across the sky.',
  },
} as const satisfies Record<string, QuantityDefinition>;

export type QuantityId = keyof typeof QUANTITIES;
export const QUANTITY_IDS = Object.keys(QUANTITIES) as QuantityId[];

/** @returns the quantity, or undefined for an unknown id */
export function findQuantity(id: string): QuantityDefinition | undefined {
  return (QUANTITIES as Record<string, QuantityDefinition>)[id];
}

/**
 * The accepted unit for a quantity matching what a person typed (id, label or alias).
 * @returns the unit, or undefined when it does not fit the quantity
 */
export function findUnit(quantity: QuantityDefinition, typed: string | null | undefined): QuantityUnit | undefined {
  const text = (typed ?? '').trim();
  return quantity.units.find((u) => u.id === text || u.label === text || u.aliases?.includes(text));
}

/** The units a quantity accepts, written for an error message: "pc, kpc, Mpc, ly, au or km". */
export function describeUnits(quantity: QuantityDefinition): string {
  const names = quantity.units.map((u) => (u.id === '' ? 'no unit' : u.id));
  return names.length === 1 ? names[0] : `${names.slice(0, -1).join(', ')} or ${names[names.length - 1]}`;
}

/**
 * Checks a canonical value against the quantity's physical range.
 * @returns a message for a person, or undefined when the value is possible
 */
export function checkRange(quantity: QuantityDefinition, canonical: number): string | undefined {
  if (!Number.isFinite(canonical)) return 'The value must be a finite number.';
  const unit = quantity.canonicalUnit ? ` ${quantity.canonicalUnit}` : '';
  const why = quantity.limitReason ? `: ${quantity.limitReason}.` : '.';
  const number = (n: number) => n.toLocaleString('en-GB', { maximumFractionDigits: 6 }).replace('-', '−');
  if (quantity.exclusiveMin !== undefined && !(canonical > quantity.exclusiveMin))
    return `${quantity.label} must be greater than ${number(quantity.exclusiveMin)}${unit}${why}`;
  if (quantity.inclusiveMin !== undefined && canonical < quantity.inclusiveMin)
    return `${quantity.label} cannot be less than ${number(quantity.inclusiveMin)}${unit}${why}`;
  if (quantity.inclusiveMax !== undefined && canonical > quantity.inclusiveMax)
    return `${quantity.label} cannot be more than ${number(quantity.inclusiveMax)}${unit}${why}`;
  return undefined;
}
