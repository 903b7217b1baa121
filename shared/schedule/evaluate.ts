/**
 * Whether a scheduled slide is showing at an instant, by the venue's clock. Pure and small: the
 * kiosk player runs it against its own clock every time it picks the next slide, so the schedule
 * holds through a network outage; the server runs it for the staff screens.
 */
import type { SlideSchedule, TimeAnchor } from '../schemas/slide-schedule.ts';
import { weekdayOf } from '../schemas/slide-schedule.ts';
import { localDateOf, localToMs, nextDate } from '../sky/time-zone.ts';

/** Why a sunrise or sunset does not happen on a day. */
export type NoSunEvent = 'sun_up' | 'sun_down';

/** One local date's sunrise (morning) and sunset (evening) at the venue, as the feed carries them. */
export interface SunDay {
  /** The venue's local date, "YYYY-MM-DD". */
  date: string;
  /** ISO 8601 instant, or null when the Sun does not rise that morning. */
  sunrise: string | null;
  /** ISO 8601 instant, or null when the Sun does not set that evening. */
  sunset: string | null;
  /** Why there is no sunrise: the Sun stays up (midnight sun) or stays down (polar night). */
  no_sunrise?: NoSunEvent;
  no_sunset?: NoSunEvent;
}

const DAY_MS = 86_400_000;

const previousDate = (date: string): string => {
  const [y, m, d] = date.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d - 1)).toISOString().slice(0, 10);
};

/**
 * The day's sunrise or sunset as an instant. A date the feed does not cover (a player offline for
 * longer than the feed's days) takes the local clock time of the nearest day it does cover: the
 * times move by a few minutes a day at most latitudes.
 */
function sunEvent(
  days: readonly SunDay[],
  date: string,
  which: 'sunrise' | 'sunset',
  timeZone: string,
): { ms: number } | { none: NoSunEvent } | null {
  if (!days.length) return null;
  const exact = days.find((d) => d.date === date);
  const day = exact ?? (date < days[0].date ? days[0] : days[days.length - 1]);
  const at = day[which];
  if (at) {
    const ms = Date.parse(at);
    if (exact) return { ms };
    // Minutes after the covered day's local midnight (past 1440 for a sunset after midnight).
    const minutes = Math.round((ms - localToMs(day.date, 0, timeZone)) / 60_000);
    return { ms: localToMs(date, minutes, timeZone) };
  }
  const none = which === 'sunrise' ? day.no_sunrise : day.no_sunset;
  return none ? { none } : null;
}

/**
 * A moment of a local date as an instant; null when it does not happen that day.
 * Sunrise or sunset that does not happen (polar regions):
 * - as a start: "from sunset" when the Sun never rose (polar night) opens at the start of the day,
 *   since it is night all day; when the Sun never sets (midnight sun) the window does not open.
 *   "From sunrise" opens at the start of the day under the midnight sun, and not at all in polar night;
 * - as an end: the window runs to the end of the day when the event would come later than any
 *   time that day (no sunset under the midnight sun, no sunrise in polar night), and ends at the
 *   start of the day otherwise.
 * Offsets apply only to real sunrises and sunsets.
 */
function anchorMs(anchor: TimeAnchor, date: string, role: 'start' | 'end', timeZone: string, days: readonly SunDay[]) {
  if (anchor.at === 'clock') {
    const [h, m] = anchor.time.split(':').map(Number);
    return localToMs(date, h * 60 + m, timeZone);
  }
  const event = sunEvent(days, date, anchor.at, timeZone);
  if (!event) return null;
  if ('ms' in event) return event.ms + anchor.offsetMin * 60_000;
  const dayStart = localToMs(date, 0, timeZone);
  const dayEnd = localToMs(nextDate(date), 0, timeZone);
  // Does the event never come that day because it is "later than the whole day"?
  const late = (anchor.at === 'sunset' && event.none === 'sun_up') || (anchor.at === 'sunrise' && event.none === 'sun_down');
  if (role === 'start') return late ? null : dayStart;
  return late ? dayEnd : dayStart;
}

/** A showing window, epoch ms, end exclusive. */
export interface ShowingWindow {
  start: number;
  end: number;
}

/**
 * The window that opens on a local date, or null when none does (another weekday, outside the
 * dates, or a sunset that does not happen). Its end is the first end moment after its start, on
 * that date or the next, so a window may run past midnight but never more than a day further.
 */
export function windowOn(schedule: SlideSchedule, date: string, timeZone: string, days: readonly SunDay[]): ShowingWindow | null {
  if (!schedule.days.includes(weekdayOf(date))) return null;
  if (schedule.firstDate && date < schedule.firstDate) return null;
  if (schedule.lastDate && date > schedule.lastDate) return null;
  const start = schedule.from ? anchorMs(schedule.from, date, 'start', timeZone, days) : localToMs(date, 0, timeZone);
  if (start === null) return null;
  const endOf = (d: string) =>
    schedule.until ? anchorMs(schedule.until, d, 'end', timeZone, days) : localToMs(nextDate(d), 0, timeZone);
  const first = endOf(date);
  if (first !== null && first > start) return { start, end: first };
  const second = endOf(nextDate(date));
  if (second !== null && second > start && second - start <= 2 * DAY_MS) return { start, end: second };
  return null;
}

/**
 * Whether a slide with this schedule is showing at an instant. A null schedule always shows. The
 * window that opened the day before is checked too (it may run past midnight).
 * @param schedule the slide's schedule
 * @param ms the instant (the player uses the server's clock as it last learnt it)
 * @param timeZone the venue's IANA time zone
 * @param days sunrise and sunset for the coming days (from the feed)
 */
export function isShowingAt(
  schedule: SlideSchedule | null | undefined,
  ms: number,
  timeZone: string,
  days: readonly SunDay[],
): boolean {
  if (!schedule) return true;
  const today = localDateOf(ms, timeZone);
  for (const date of [previousDate(today), today]) {
    const w = windowOn(schedule, date, timeZone, days);
    if (w && w.start <= ms && ms < w.end) return true;
  }
  return false;
}
