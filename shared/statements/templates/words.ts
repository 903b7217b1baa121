import { SOLAR_MAGNITUDES } from '../../engine/solar-magnitudes.ts';
import { language, type StatementLocale } from '../locales.ts';

/** Whether a locale's words are French (from the locale registry: fr-FR, and any French locale added there). */
export const isFrench = (locale: StatementLocale) => language(locale) === 'fr';
export const isAmerican = (locale: StatementLocale) => locale === 'en-US';

/**
 * A number followed by a noun in French: after a scale noun ("3 milliards") French needs "de"
 * ("3 milliards de kilomètres", "2 millions d’années"); after digits it does not.
 */
export function frenchCount(numberText: string, noun: string): string {
  if (!/\p{L}$/u.test(numberText)) return `${numberText} ${noun}`;
  return /^[aeiouyéèêàâh]/i.test(noun) ? `${numberText} d’${noun}` : `${numberText} de ${noun}`;
}

/** "12 billion years" / "12 milliards d'années" / "640 ans", from a number already in words. */
export function yearsPhrase(locale: StatementLocale, numberText: string, years: number): string {
  if (isFrench(locale))
    return /\p{L}$/u.test(numberText) ? frenchCount(numberText, 'années') : `${numberText} ${years >= 2 ? 'ans' : 'an'}`;
  return `${numberText} years`;
}

/** Which band a brightness comparison was made in, as small print. */
export function bandFootnote(locale: StatementLocale, band: string): string {
  const label = SOLAR_MAGNITUDES[band]?.label ?? band;
  return isFrench(locale) ? `Comparaison dans la bande ${label}.` : `Compared in the ${label} band.`;
}

/** Metric units spelled out, in the reader's spelling. */
export function unitWord(locale: StatementLocale, unit: 'kilometre' | 'metre' | 'centimetre' | 'light-year'): string {
  if (isFrench(locale))
    return { kilometre: 'kilomètres', metre: 'mètres', centimetre: 'centimètre', 'light-year': 'années-lumière' }[unit];
  const plural = { kilometre: 'kilometres', metre: 'metres', centimetre: 'centimetre', 'light-year': 'light-years' }[unit];
  return isAmerican(locale) ? plural.replace('metre', 'meter') : plural;
}
