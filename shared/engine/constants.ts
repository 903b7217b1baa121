/**
 * Physical and astronomical constants used by the engine, each with its unit
 * and the published source that defines or recommends it. Working steps quote
 * these objects directly so a reviewer sees the same value and source the code used.
 */

/** A constant: value, unit, symbol, a name in words and its published source. */
export interface Constant {
  readonly symbol: string;
  readonly name: string;
  readonly value: number;
  readonly unit: string;
  readonly source: string;
}

const SI_2019 = 'SI defining constant (CGPM 2018, in force 2019); exact';

/** Speed of light in vacuum, exact by definition of the metre. */
export const SPEED_OF_LIGHT: Constant = {
  symbol: 'c',
  name: 'speed of light',
  value: 299_792.458,
  unit: 'km/s',
  source: 'SI definition of the metre (CGPM 1983); exact',
};

/** Astronomical unit, exact by definition. */
export const ASTRONOMICAL_UNIT: Constant = {
  symbol: 'au',
  name: 'astronomical unit',
  value: 149_597_870_700,
  unit: 'm',
  source: 'IAU 2012 Resolution B2; exact',
};

/** Parsec, defined from the astronomical unit: pc = au × 648000/π. */
export const PARSEC: Constant = {
  symbol: 'pc',
  name: 'parsec',
  value: (ASTRONOMICAL_UNIT.value * 648_000) / Math.PI,
  unit: 'm',
  source: 'IAU 2015 Resolution B2: pc = (648000/π) au; exact',
};

/** Julian year, the year used for light-years and for Gyr. */
export const JULIAN_YEAR: Constant = {
  symbol: 'yr',
  name: 'Julian year',
  value: 365.25 * 86_400,
  unit: 's',
  source: 'IAU: Julian year = 365.25 days of 86400 s; exact',
};

/** Light-year: distance light travels in one Julian year. */
export const LIGHT_YEAR: Constant = {
  symbol: 'ly',
  name: 'light-year',
  value: SPEED_OF_LIGHT.value * 1000 * JULIAN_YEAR.value,
  unit: 'm',
  source: 'IAU: c × Julian year; exact',
};

/** Newtonian constant of gravitation; enters only the radiation density via the critical density. */
export const GRAVITATIONAL_CONSTANT: Constant = {
  symbol: 'G',
  name: 'Newtonian constant of gravitation',
  value: 6.6743e-11,
  unit: 'm³ kg⁻¹ s⁻²',
  source: 'CODATA 2018 recommended value',
};

/** Stefan–Boltzmann constant, exact since it follows from h, k and c. */
export const STEFAN_BOLTZMANN: Constant = {
  symbol: 'σ',
  name: 'Stefan–Boltzmann constant',
  value: 5.670374419e-8,
  unit: 'W m⁻² K⁻⁴',
  source: `${SI_2019} (derived from h, k_B, c; CODATA 2018 value)`,
};

/** Boltzmann constant in eV/K, used for the neutrino mass-to-temperature ratio. */
export const BOLTZMANN_EV: Constant = {
  symbol: 'k_B',
  name: 'Boltzmann constant',
  value: 8.617333262e-5,
  unit: 'eV/K',
  source: `${SI_2019} (k_B / e; CODATA 2018 value)`,
};

/** Nominal solar radius. */
export const SOLAR_RADIUS: Constant = {
  symbol: 'R☉',
  name: 'nominal solar radius',
  value: 6.957e8,
  unit: 'm',
  source: 'IAU 2015 Resolution B3',
};

/** Nominal total solar irradiance. */
export const SOLAR_IRRADIANCE: Constant = {
  symbol: 'S☉',
  name: 'nominal total solar irradiance',
  value: 1361,
  unit: 'W m⁻²',
  source: 'IAU 2015 Resolution B3',
};

/** Nominal solar luminosity. */
export const SOLAR_LUMINOSITY: Constant = {
  symbol: 'L☉',
  name: 'nominal solar luminosity',
  value: 3.828e26,
  unit: 'W',
  source: 'IAU 2015 Resolution B3',
};

/** Nominal solar effective temperature. */
export const SOLAR_TEFF: Constant = {
  symbol: 'T☉',
  name: 'nominal solar effective temperature',
  value: 5772,
  unit: 'K',
  source: 'IAU 2015 Resolution B3',
};

/** Nominal solar mass parameter GM☉. */
export const SOLAR_MASS_PARAMETER: Constant = {
  symbol: 'GM☉',
  name: 'nominal solar mass parameter',
  value: 1.3271244e20,
  unit: 'm³ s⁻²',
  source: 'IAU 2015 Resolution B3',
};

/** Zero point of the absolute bolometric magnitude scale: M_bol = 0 ↔ L = 3.0128e28 W. */
export const BOLOMETRIC_ZERO_POINT: Constant = {
  symbol: 'L₀',
  name: 'zero-point luminosity of the absolute bolometric magnitude scale',
  value: 3.0128e28,
  unit: 'W',
  source: 'IAU 2015 Resolution B2',
};

/** Neutrino-to-photon energy density per massless species: (7/8)(4/11)^(4/3). */
export const NEUTRINO_DENSITY_FACTOR: Constant = {
  symbol: '(7/8)(4/11)^(4/3)',
  name: 'relativistic neutrino energy density per species relative to photons',
  value: 0.22710731766,
  unit: '',
  source: 'standard thermal history (Fermi–Dirac vs Bose–Einstein, T_ν/T_γ = (4/11)^(1/3)); value as in astropy',
};

/** Neutrino to photon temperature ratio (4/11)^(1/3). */
export const NEUTRINO_TEMPERATURE_RATIO: Constant = {
  symbol: '(4/11)^(1/3)',
  name: 'neutrino to photon temperature ratio',
  value: 0.7137658555036082,
  unit: '',
  source: 'standard thermal history after electron–positron annihilation',
};
