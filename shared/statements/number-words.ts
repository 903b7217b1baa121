import { language, type StatementLocale } from './locales.ts';
import { roundToSignificant } from './precision.ts';

/**
 * Scale words past a trillion, where Intl's compact notation stops naming them ("3400 trillion").
 * English uses the short scale; French and German use the long scale (billiard = 10^15).
 */
const BIG_WORDS: Record<'en' | 'fr', Array<[number, string, string]>> = {
  en: [
    [1e24, 'septillion', 'septillion'],
    [1e21, 'sextillion', 'sextillion'],
    [1e18, 'quintillion', 'quintillion'],
    [1e15, 'quadrillion', 'quadrillion'],
  ],
  fr: [
    [1e24, 'quadrillion', 'quadrillions'],
    [1e21, 'trilliard', 'trilliards'],
    [1e18, 'trillion', 'trillions'],
    [1e15, 'billiard', 'billiards'],
  ],
};

/**
 * A rounded number for the public: digits with the locale's grouping below a million, scale words
 * above ("about 3.4 trillion", "3,4 billions"). Never more digits than `significantFigures`.
 * @param value the value to show
 * @param significantFigures from choosePrecision
 * @param locale the reader's locale
 * @returns the text and the value it stands for after rounding
 */
export function formatApproximate(value: number, significantFigures: number, locale: StatementLocale): { text: string; shown: number } {
  const shown = roundToSignificant(value, significantFigures);
  const abs = Math.abs(shown);
  if (abs < 1e6) {
    const text = new Intl.NumberFormat(locale, { maximumSignificantDigits: significantFigures }).format(shown);
    return { text, shown };
  }
  if (abs < 1e15) {
    const text = new Intl.NumberFormat(locale, { notation: 'compact', compactDisplay: 'long', maximumSignificantDigits: significantFigures }).format(shown);
    return { text, shown };
  }
  const words = BIG_WORDS[language(locale)];
  const found = words.find(([size]) => abs >= size) ?? words[0];
  const [size, singular, plural] = found;
  const mantissa = shown / size;
  if (Math.abs(mantissa) >= 1000) {
    // Beyond every name we keep: a power of ten reads better than a string of zeros.
    const exponent = Math.floor(Math.log10(abs));
    const lead = new Intl.NumberFormat(locale, { maximumSignificantDigits: significantFigures }).format(shown / 10 ** exponent);
    return { text: `${lead} × 10^${exponent}`, shown };
  }
  const digits = new Intl.NumberFormat(locale, { maximumSignificantDigits: significantFigures }).format(mantissa);
  return { text: `${digits} ${Math.abs(mantissa) >= 2 ? plural : singular}`, shown };
}

/** "about" in the locale; used whenever a number is rounded for the public. */
export function about(locale: StatementLocale): string {
  return language(locale) === 'fr' ? 'environ' : 'about';
}
