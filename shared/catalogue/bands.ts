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

/** A band's light in plain words, for public sentences: the adjective form and the "in … light" phrase. */
export interface BandLight {
  /** "visible light", "lumière visible": what a luminosity counts ("as much visible light as"). */
  light: string;
  /** "in visible light", "en lumière visible": what a brightness comparison is made in. */
  inLight: string;
}

// Plain words a visitor knows, chosen by where each band's response peaks: Johnson V is the
// visual band (peak near 550 nm, yellow-green, where the eye is most sensitive), B blue (≈ 440 nm),
// U near ultraviolet (≈ 365 nm), Cousins R red (≈ 650 nm), Cousins I and SDSS i, z the near
// infrared (≈ 800–900 nm), 2MASS J, H, Ks the infrared beyond (1.2–2.2 µm); SDSS u ultraviolet,
// g blue-green (≈ 470 nm), r red (≈ 620 nm). Central wavelengths recalled from memory of
// Bessell (2005), ARA&A 43, 293, and Fukugita et al. (1996), AJ 111, 1748.
// The exact band stays in the footnote; the sentence only has to say which light it counts.
const EN: Record<string, string> = {
  U: 'ultraviolet',
  B: 'blue',
  V: 'visible',
  R_C: 'red',
  I_C: 'near-infrared',
  J_2MASS: 'infrared',
  H_2MASS: 'infrared',
  Ks_2MASS: 'infrared',
  u_SDSS: 'ultraviolet',
  g_SDSS: 'blue-green',
  r_SDSS: 'red',
  i_SDSS: 'near-infrared',
  z_SDSS: 'near-infrared',
};
const FR: Record<string, string> = {
  U: 'ultraviolette',
  B: 'bleue',
  V: 'visible',
  R_C: 'rouge',
  I_C: 'du proche infrarouge',
  J_2MASS: 'infrarouge',
  H_2MASS: 'infrarouge',
  Ks_2MASS: 'infrarouge',
  u_SDSS: 'ultraviolette',
  g_SDSS: 'bleu-vert',
  r_SDSS: 'rouge',
  i_SDSS: 'du proche infrarouge',
  z_SDSS: 'du proche infrarouge',
};
/** Infrared bands share one colour word, so the sentence names the band as well ("infrared light (J band)"). */
const SHARED_WORD = new Set(['J_2MASS', 'H_2MASS', 'Ks_2MASS', 'I_C', 'i_SDSS', 'z_SDSS']);

/**
 * Which light a one-band statement counts, in the reader's language.
 * @param band a band id
 * @param language 'en' or 'fr'
 * @returns the plain words; for a band without words, the band itself ("light in the X band")
 */
export function bandLight(band: string, language: 'en' | 'fr'): BandLight {
  const short = band.split('_')[0];
  const word = language === 'fr' ? FR[band] : EN[band];
  if (!word) {
    return language === 'fr'
      ? { light: `lumière dans la bande ${band}`, inLight: `dans la bande ${band}` }
      : { light: `light in the ${band} band`, inLight: `in the ${band} band` };
  }
  const tag = SHARED_WORD.has(band) ? (language === 'fr' ? ` (bande ${short})` : ` (${short} band)`) : '';
  return language === 'fr'
    ? { light: `lumière ${word}${tag}`, inLight: `en lumière ${word}${tag}` }
    : { light: `${word} light${tag}`, inLight: `in ${word} light${tag}` };
}
