import type { LocalisedText } from './locales.ts';

/**
 * How an entry of Earth's timeline relates to the moment the light set out:
 * - `around`: "around the time …": the light set out at about the entry's date;
 * - `before`: "before …": the light set out before the entry's date (e.g. before the Sun formed).
 */
export type TimelineRelation = 'around' | 'before';

/** One entry of the timeline visitors know, as a statement reads it (the server passes it in). */
export interface TimelineEntry {
  id: string;
  /** A short name for staff ("Base of the Cambrian"). */
  label: string;
  /** The date, in years before the present (positive). */
  yearsAgo: number;
  /** The date's uncertainty (±, years), as the source gives it. */
  uncertaintyYears: number;
  relation: TimelineRelation;
  /** What follows the time in the sentence, per locale: "around the time the first …", "avant que …". */
  phrases: LocalisedText;
  /** The published source of the date. */
  source: { citation: string; url: string | null };
}

/**
 * "Around the time" claims the light's date and the event's are the same to within the figure's
 * own spread: the light-travel interval may be at most this fraction of the event's age wide, so a
 * date known only to ±50 % is never tied to one event (our rule).
 */
export const AROUND_MAX_RELATIVE_WIDTH = 0.2;

/** Why an entry was or was not chosen, for the working. */
export interface TimelineChoice {
  entry: TimelineEntry | null;
  /** The light-travel interval the rule compared (years). */
  light: { low: number; high: number };
  /** The entries that passed the rule, before the narrowest (or the nearest "before") was taken. */
  compatible: TimelineEntry[];
}

/** The interval an entry's date covers: date ± uncertainty. */
const entryInterval = (e: TimelineEntry) => ({
  low: e.yearsAgo - e.uncertaintyYears,
  high: e.yearsAgo + e.uncertaintyYears,
});

/**
 * Whether the light-travel interval and an entry's date are compatible (DEVELOPERS.md, "When the light
 * set out"):
 * - `around`: the two intervals overlap, and the light's interval is at most
 *   AROUND_MAX_RELATIVE_WIDTH of the entry's age wide;
 * - `before`: the whole light interval lies before the entry: its low end is older than the entry's
 *   date plus its uncertainty.
 * @param light the 68 % interval of the light-travel time, in years ago
 * @param entry the timeline entry
 */
export function isCompatible(light: { low: number; high: number }, entry: TimelineEntry): boolean {
  const e = entryInterval(entry);
  if (entry.relation === 'before') return light.low > e.high;
  const overlap = light.low <= e.high && e.low <= light.high;
  return overlap && light.high - light.low <= AROUND_MAX_RELATIVE_WIDTH * entry.yearsAgo;
}

/**
 * Chooses the timeline entry a light-travel time can be compared with, or none.
 * Among compatible `around` entries the narrowest (smallest uncertainty) wins, ties going to the one
 * whose date is nearest the light's; failing those, the `before` entry with the latest date the light
 * still predates (the closest true "before"); otherwise none.
 * @param years the light-travel time (years)
 * @param interval its 68 % interval, or null when unknown (the value alone is then compared)
 * @param entries the timeline
 */
export function chooseTimelineEntry(
  years: number,
  interval: { low: number; high: number } | null,
  entries: readonly TimelineEntry[],
): TimelineChoice {
  const light = interval ?? { low: years, high: years };
  const compatible = entries.filter((e) => Number.isFinite(e.yearsAgo) && e.yearsAgo > 0 && isCompatible(light, e));
  const around = compatible
    .filter((e) => e.relation === 'around')
    .sort((a, b) => a.uncertaintyYears - b.uncertaintyYears || Math.abs(a.yearsAgo - years) - Math.abs(b.yearsAgo - years));
  if (around.length) return { entry: around[0], light, compatible };
  const before = compatible.filter((e) => e.relation === 'before').sort((a, b) => b.yearsAgo - a.yearsAgo);
  return { entry: before[0] ?? null, light, compatible };
}
