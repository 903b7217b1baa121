/**
 * Local clock times in IANA time zones through Intl.DateTimeFormat (no time zone database of our
 * own, no packages). Free of astronomy code so the client can use it for forms.
 */

const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(timeZone: string): Intl.DateTimeFormat {
  let f = formatters.get(timeZone);
  if (!f) {
    f = new Intl.DateTimeFormat('en-US', {
      timeZone,
      hourCycle: 'h23',
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      second: '2-digit',
    });
    formatters.set(timeZone, f);
  }
  return f;
}

/**
 * The canonical name of an IANA time zone, or null when the runtime does not know it.
 * @param name a name such as "Europe/London" (any letter case)
 * @returns the name the runtime uses, e.g. "Europe/London"
 */
export function canonicalTimeZone(name: string): string | null {
  if (typeof name !== 'string' || !name.trim() || name.length > 64) return null;
  try {
    return new Intl.DateTimeFormat('en-US', { timeZone: name.trim() }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

/** The wall clock in a time zone at an instant, as numbers. */
export interface WallClock {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
}

/**
 * The local wall clock at an instant.
 * @param ms the instant, milliseconds since the Unix epoch
 * @param timeZone an IANA time zone the runtime knows
 */
export function wallClock(ms: number, timeZone: string): WallClock {
  const parts: Record<string, number> = {};
  for (const p of formatterFor(timeZone).formatToParts(new Date(ms))) {
    if (p.type !== 'literal') parts[p.type] = Number(p.value);
  }
  return {
    year: parts.year,
    month: parts.month,
    day: parts.day,
    hour: parts.hour % 24,
    minute: parts.minute,
    second: parts.second,
  };
}

/** Offset of local time from UTC at an instant, in milliseconds (east positive). */
export function zoneOffsetMs(ms: number, timeZone: string): number {
  const w = wallClock(ms, timeZone);
  const asUtc = Date.UTC(w.year, w.month - 1, w.day, w.hour, w.minute, w.second);
  return asUtc - Math.floor(ms / 1000) * 1000;
}

/**
 * The instant at which a local clock in a time zone shows a date and time. In the hour skipped
 * when clocks go forward the result is the same clock time on the earlier offset (one hour later
 * on the new clock); in the repeated hour it is the earlier of the two.
 * @param localDate "YYYY-MM-DD"
 * @param minutes minutes after local midnight (may exceed 1440 for the next day)
 * @param timeZone an IANA time zone
 */
export function localToMs(localDate: string, minutes: number, timeZone: string): number {
  const [y, m, d] = localDate.split('-').map(Number);
  const guess = Date.UTC(y, m - 1, d) + minutes * 60_000;
  // The offsets in force half a day either side cover any single change of offset.
  const before = guess - zoneOffsetMs(guess - 43_200_000, timeZone);
  const after = guess - zoneOffsetMs(guess + 43_200_000, timeZone);
  const shows = (t: number) => t + zoneOffsetMs(t, timeZone) === guess;
  const valid = [before, after].filter(shows);
  return valid.length ? Math.min(...valid) : before;
}

const pad = (n: number) => String(n).padStart(2, '0');

/** "YYYY-MM-DD" of an instant in a time zone. */
export function localDateOf(ms: number, timeZone: string): string {
  const w = wallClock(ms, timeZone);
  return `${w.year}-${pad(w.month)}-${pad(w.day)}`;
}

/** "HH:MM" of an instant in a time zone, rounded to the nearest minute. */
export function localTimeOf(ms: number, timeZone: string): string {
  const w = wallClock(Math.round(ms / 60_000) * 60_000, timeZone);
  return `${pad(w.hour)}:${pad(w.minute)}`;
}

/** The calendar date after "YYYY-MM-DD". */
export function nextDate(localDate: string): string {
  const [y, m, d] = localDate.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d + 1)).toISOString().slice(0, 10);
}

/** True for a real calendar date written "YYYY-MM-DD" between years 1800 and 2200. */
export function isLocalDate(value: string): boolean {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(value)) return false;
  const [y, m, d] = value.split('-').map(Number);
  const back = new Date(Date.UTC(y, m - 1, d));
  return y >= 1800 && y <= 2200 && back.getUTCMonth() === m - 1 && back.getUTCDate() === d;
}

/** Before this local hour the night in progress is the previous evening's. */
const NIGHT_ROLLOVER_HOUR = 6;

/**
 * The date of the night in progress or coming at an instant: from 06:00 local time it is today's
 * evening; before 06:00 it is the night that began the previous evening.
 * @param ms the instant
 * @param timeZone the venue's time zone
 */
export function nightDateAt(ms: number, timeZone: string): string {
  const w = wallClock(ms, timeZone);
  const today = `${w.year}-${String(w.month).padStart(2, '0')}-${String(w.day).padStart(2, '0')}`;
  if (w.hour >= NIGHT_ROLLOVER_HOUR) return today;
  const [y, m, d] = today.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d - 1)).toISOString().slice(0, 10);
}
