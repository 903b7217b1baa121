/**
 * How a ratio between two lights is worded (the house style, written down in DEVELOPERS.md):
 * - it rounds to one                → "about as bright as" (never "about 1 times");
 * - above one                       → "about N times as bright as": multiplicative, never "N times
 *   brighter than", which some readers take as N + 1 times;
 * - from 1 % up to one              → a percentage, "about 40 per cent as bright as": "2.5 times
 *   fainter" is read both as 1/2.5 and as 1 − 2.5, a percentage only one way;
 * - below 1 %                       → "about N times fainter than": for factors of 100 or more the two
 *   readings of "times fainter" differ by under 1 %, less than any rounding we show.
 */
import { mapInterval } from './compose.ts';

export type RatioForm = 'times' | 'percent' | 'fainter';

/** A ratio as the sentence states it: which form, the number the words round, and its interval. */
export interface RatioReading {
  form: RatioForm;
  value: number;
  unit: string;
  interval: { low: number; high: number } | null;
}

/** Below this a ratio is worded as "N times fainter" (see the module comment). */
export const PERCENT_FLOOR = 0.01;

/**
 * Chooses the wording form for a ratio and maps its interval into it.
 * @param ratio the ratio (> 0)
 * @param interval its 68 % interval, if known
 */
export function readRatio(ratio: number, interval: { low: number; high: number } | null | undefined): RatioReading {
  if (ratio >= 1) return { form: 'times', value: ratio, unit: '×', interval: interval ?? null };
  if (ratio >= PERCENT_FLOOR)
    return { form: 'percent', value: ratio * 100, unit: '%', interval: mapInterval(interval ?? undefined, (x) => x * 100) };
  return { form: 'fainter', value: 1 / ratio, unit: '× fainter', interval: mapInterval(interval ?? undefined, (x) => 1 / x) };
}

/** True when the rounded number says the two are about equal (1×, or 100 %). */
export function aboutEqual(reading: RatioReading, shown: number): boolean {
  return (reading.form === 'times' && shown === 1) || (reading.form === 'percent' && shown === 100);
}
