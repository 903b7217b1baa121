/**
 * Photometric bands. The engine's solar-magnitude bands come first (statements can compare with the
 * Sun only in those); other bands are allowed as long as they are short plain identifiers.
 */
import { SOLAR_MAGNITUDES } from '../engine/solar-magnitudes.ts';

/** Bands for which the engine knows the Sun's magnitude, with their labels. */
export const KNOWN_BANDS: ReadonlyArray<{ id: string; label: string }> = Object.values(SOLAR_MAGNITUDES).map((b) => ({
  id: b.band,
  label: `${b.label} (${b.system})`,
}));

/** A band id: letters, digits and _ . : - up to 16 characters, e.g. V, Ks_2MASS, G_Gaia. */
export const BAND_PATTERN = /^[A-Za-z0-9][A-Za-z0-9_.:-]{0,15}$/;

/** @returns true when the engine can relate magnitudes in this band to the Sun's */
export const isSolarBand = (band: string): boolean => band in SOLAR_MAGNITUDES;
