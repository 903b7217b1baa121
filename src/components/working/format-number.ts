/**
 * Number formatting for computed values: enough significant digits for a
 * reviewer to recompute a step, set as a reader expects (a proper minus sign,
 * powers of ten instead of "e+16"), and never more digits than were asked for.
 */

const SUPERSCRIPT: Record<string, string> = {
  '-': '⁻',
  '0': '⁰',
  '1': '¹',
  '2': '²',
  '3': '³',
  '4': '⁴',
  '5': '⁵',
  '6': '⁶',
  '7': '⁷',
  '8': '⁸',
  '9': '⁹',
};

// Outside this range plain decimals get long enough to misread, so powers of ten are used.
const PLAIN_MIN = 1e-3;
const PLAIN_MAX = 1e7;

/** Drops trailing zeros after a decimal point ("1.500" → "1.5", "2.000" → "2"). */
function trimZeros(digits: string): string {
  return digits.includes('.') ? digits.replace(/\.?0+$/, '') : digits;
}

function withMinus(text: string): string {
  return text.replace(/^-/, '−');
}

/**
 * Formats a number to a given number of significant digits.
 * @param value the number
 * @param digits significant digits (6 by default: enough to recompute a step)
 * @returns e.g. "9.51804", "−26.76", "3.08568 × 10¹⁶", "5.40202 × 10⁻⁵"
 */
export function formatSig(value: number, digits = 6): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return '0';
  const abs = Math.abs(value);
  // toPrecision itself writes "2.49510e+6" once the integer part has more digits than asked for.
  if (abs >= PLAIN_MIN && abs < PLAIN_MAX) return withMinus(String(Number(value.toPrecision(digits))));
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  const power = String(Number(exponent))
    .split('')
    .map((c) => SUPERSCRIPT[c] ?? c)
    .join('');
  return `${withMinus(trimZeros(mantissa))} × 10${power}`;
}

/**
 * The same number as a calculator accepts it, for copying and for screen readers' titles.
 * @param value the number
 * @returns full precision, e.g. "3.085677581491367e+16"
 */
export function formatFull(value: number): string {
  return Number.isFinite(value) ? String(value) : '—';
}

/**
 * Formats a large count in words with a few significant digits, short scale
 * ("4.19 billion"), for conversions to light-years and years.
 * @param value the number
 * @param digits significant digits
 * @returns e.g. "4.19054 billion", "950 thousand", "12.3"
 */
export function formatInWords(value: number, digits = 6): string {
  const abs = Math.abs(value);
  const scales: Array<[number, string]> = [
    [1e12, 'trillion'],
    [1e9, 'billion'],
    [1e6, 'million'],
  ];
  for (const [size, word] of scales) {
    if (abs >= size && abs < size * 1000) return `${formatSig(value / size, digits)} ${word}`;
  }
  return formatSig(value, digits);
}
