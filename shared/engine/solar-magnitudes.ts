/**
 * The Sun's absolute and apparent magnitudes per band, from Willmer (2018),
 * ApJS 236, 47, Table 3 (Vega system for Johnson–Cousins and 2MASS bands, AB for SDSS).
 *
 * The absolute magnitudes were written from memory of that table and cross-checked
 * against its apparent-magnitude column as transcribed in public code: every
 * M☉ here equals m☉ + 31.57 (the distance modulus of 1 au) to within the 0.01 mag
 * rounding of the table.
 */

/** A band for which the Sun's magnitudes are known. */
export interface SolarBand {
  band: string;
  label: string;
  system: 'Vega' | 'AB';
  absolute: number;
  apparent: number;
  source: string;
}

const SRC = 'Willmer (2018), ApJS 236, 47, Table 3';

function band(band: string, label: string, system: 'Vega' | 'AB', absolute: number, apparent: number): SolarBand {
  return { band, label, system, absolute, apparent, source: `${SRC}, ${label} (${system})` };
}

/** Solar magnitudes by band key. */
export const SOLAR_MAGNITUDES: Readonly<Record<string, SolarBand>> = Object.freeze({
  U: band('U', 'Johnson U', 'Vega', 5.61, -25.97),
  B: band('B', 'Johnson B', 'Vega', 5.44, -26.13),
  V: band('V', 'Johnson V', 'Vega', 4.81, -26.76),
  R_C: band('R_C', 'Cousins R', 'Vega', 4.43, -27.15),
  I_C: band('I_C', 'Cousins I', 'Vega', 4.1, -27.47),
  J_2MASS: band('J_2MASS', '2MASS J', 'Vega', 3.67, -27.9),
  H_2MASS: band('H_2MASS', '2MASS H', 'Vega', 3.32, -28.25),
  Ks_2MASS: band('Ks_2MASS', '2MASS Ks', 'Vega', 3.27, -28.3),
  u_SDSS: band('u_SDSS', 'SDSS u', 'AB', 6.39, -25.18),
  g_SDSS: band('g_SDSS', 'SDSS g', 'AB', 5.11, -26.47),
  r_SDSS: band('r_SDSS', 'SDSS r', 'AB', 4.65, -26.93),
  i_SDSS: band('i_SDSS', 'SDSS i', 'AB', 4.53, -27.05),
  z_SDSS: band('z_SDSS', 'SDSS z', 'AB', 4.5, -27.07),
});

/** Band keys accepted in requests, for user interfaces. */
export const SOLAR_BANDS: readonly string[] = Object.keys(SOLAR_MAGNITUDES);
