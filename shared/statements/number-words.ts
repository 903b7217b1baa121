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

// Trailing zeros are kept (minimum = maximum significant digits): "2.20 billion" when the rule chose
// three figures, so what the reader sees says as much precision as the working claims, no less.
// Building an Intl.NumberFormat costs far more than formatting with one, and statements are
// recomputed by the hundred thousand: keep one per locale and options (the output is the same).
const formatters = new Map<string, Intl.NumberFormat>();
function formatter(locale: StatementLocale, significantFigures: number, compact: boolean): Intl.NumberFormat {
  const key = `${locale}|${significantFigures}|${compact}`;
  let f = formatters.get(key);
  if (!f) {
    f = new Intl.NumberFormat(
      locale,
      compact
        ? {
            notation: 'compact',
            compactDisplay: 'long',
            minimumSignificantDigits: significantFigures,
            maximumSignificantDigits: significantFigures,
          }
        : { minimumSignificantDigits: significantFigures, maximumSignificantDigits: significantFigures },
    );
    formatters.set(key, f);
  }
  return f;
}

/**
 * A rounded number for the public: digits with the locale's grouping below a million, scale words
 * above ("about 3.4 trillion", "3,4 billions"). Exactly `significantFigures` digits, trailing zeros
 * included ("8.60", "2.20 billion"), except that an integer's zeros before the decimal point stay.
 * @param value the value to show
 * @param significantFigures from choosePrecision
 * @param locale the reader's locale
 * @returns the text and the value it stands for after rounding
 */
export function formatApproximate(
  value: number,
  significantFigures: number,
  locale: StatementLocale,
): { text: string; shown: number } {
  const shown = roundToSignificant(value, significantFigures);
  const abs = Math.abs(shown);
  if (abs < 1e6) {
    const text = formatter(locale, significantFigures, false).format(shown);
    return { text, shown };
  }
  if (abs < 1e15) {
    const text = formatter(locale, significantFigures, true).format(shown);
    return { text, shown };
  }
  const words = BIG_WORDS[language(locale)];
  const found = words.find(([size]) => abs >= size) ?? words[0];
  const [size, singular, plural] = found;
  const mantissa = shown / size;
  if (Math.abs(mantissa) >= 1000) {
    // Beyond every name we keep: a power of ten reads better than a string of zeros.
    const exponent = Math.floor(Math.log10(abs));
    const lead = formatter(locale, significantFigures, false).format(shown / 10 ** exponent);
    return { text: `${lead} × 10^${exponent}`, shown };
  }
  const digits = formatter(locale, significantFigures, false).format(mantissa);
  return { text: `${digits} ${Math.abs(mantissa) >= 2 ? plural : singular}`, shown };
}
