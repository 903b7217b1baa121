import { z } from 'zod';
import { isLocalDate } from '../sky/time-zone.ts';

/** Days of the week, Monday first (ISO 8601 order). */
export const WEEKDAYS = ['mon', 'tue', 'wed', 'thu', 'fri', 'sat', 'sun'] as const;
export type Weekday = (typeof WEEKDAYS)[number];

export const WEEKDAY_LABELS: Record<Weekday, string> = {
  mon: 'Mon',
  tue: 'Tue',
  wed: 'Wed',
  thu: 'Thu',
  fri: 'Fri',
  sat: 'Sat',
  sun: 'Sun',
};

/** An offset from sunset or sunrise is at most this many minutes either way. */
export const SUN_OFFSET_MAX_MIN = 360;

const clockTime = z
  .string({ message: 'Give the time as HH:MM on a 24-hour clock, e.g. 18:30' })
  .regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'Give the time as HH:MM on a 24-hour clock, e.g. 18:30');

const offsetMin = z
  .number({ message: 'The offset is a whole number of minutes' })
  .int('The offset is a whole number of minutes')
  .min(
    -SUN_OFFSET_MAX_MIN,
    `An offset from sunset or sunrise is at most ${SUN_OFFSET_MAX_MIN / 60} hours (${SUN_OFFSET_MAX_MIN} minutes) either way`,
  )
  .max(
    SUN_OFFSET_MAX_MIN,
    `An offset from sunset or sunrise is at most ${SUN_OFFSET_MAX_MIN / 60} hours (${SUN_OFFSET_MAX_MIN} minutes) either way`,
  );

/** A moment of the venue's day: a clock time, or minutes before (negative) or after sunset or sunrise. */
export const TimeAnchorSchema = z.discriminatedUnion(
  'at',
  [
    z.object({ at: z.literal('clock'), time: clockTime }),
    z.object({ at: z.literal('sunset'), offsetMin }),
    z.object({ at: z.literal('sunrise'), offsetMin }),
  ],
  { message: 'A time is a clock time, or an offset from sunset or sunrise' },
);
export type TimeAnchor = z.infer<typeof TimeAnchorSchema>;

const localDate = z
  .string({ message: 'Give the date as YYYY-MM-DD' })
  .refine(isLocalDate, 'Give a real date as YYYY-MM-DD, e.g. 2027-03-14')
  .nullable();

const sameAnchor = (a: TimeAnchor, b: TimeAnchor) =>
  a.at === b.at && (a.at === 'clock' ? a.time === (b as typeof a).time : a.offsetMin === (b as typeof a).offsetMin);

/** The weekday of a "YYYY-MM-DD" date (the calendar's, not any time zone's). */
export function weekdayOf(date: string): Weekday {
  const [y, m, d] = date.split('-').map(Number);
  return WEEKDAYS[(new Date(Date.UTC(y, m - 1, d)).getUTCDay() + 6) % 7];
}

/** The weekdays met between two dates, inclusive (all seven once the range spans a week). */
function weekdaysBetween(first: string, last: string): Set<Weekday> {
  const out = new Set<Weekday>();
  const [y, m, d] = first.split('-').map(Number);
  for (let i = 0; i < 7; i += 1) {
    const date = new Date(Date.UTC(y, m - 1, d + i)).toISOString().slice(0, 10);
    if (date > last) break;
    out.add(weekdayOf(date));
  }
  return out;
}

/**
 * When a slide shows, in the venue's own time: on these days of the week, between these dates
 * (inclusive, venue-local), from one moment of the day to another. A window whose end comes before
 * its start on the clock runs past midnight (20:00 → 01:00 ends the next morning); a window tied to
 * sunrise or sunset moves with the Sun every day. Null `from` is the start of the day, null `until`
 * its end.
 */
export const SlideScheduleSchema = z
  .object({
    days: z
      .array(z.enum(WEEKDAYS, { message: 'Days are mon, tue, wed, thu, fri, sat or sun' }))
      .min(1, 'Choose at least one day of the week, or the slide would never show')
      .max(7)
      .refine((d) => new Set(d).size === d.length, 'A day of the week is listed twice')
      .default([...WEEKDAYS]),
    from: TimeAnchorSchema.nullable().default(null),
    until: TimeAnchorSchema.nullable().default(null),
    firstDate: localDate.default(null),
    lastDate: localDate.default(null),
  })
  .superRefine((s, ctx) => {
    if (s.firstDate && s.lastDate && s.lastDate < s.firstDate) {
      ctx.addIssue({ code: 'custom', path: ['lastDate'], message: 'The last day must be on or after the first day' });
      return;
    }
    if (s.from && s.until && sameAnchor(s.from, s.until)) {
      ctx.addIssue({
        code: 'custom',
        path: ['until'],
        message: 'The showing would last no time: the start and the end are the same moment',
      });
    }
    if (s.firstDate && s.lastDate) {
      const met = weekdaysBetween(s.firstDate, s.lastDate);
      if (!s.days.some((d) => met.has(d))) {
        ctx.addIssue({
          code: 'custom',
          path: ['days'],
          message: `Between ${s.firstDate} and ${s.lastDate} there is no ${s.days.map((d) => WEEKDAY_LABELS[d]).join(', ')}: the slide would never show`,
        });
      }
    }
  });
export type SlideSchedule = z.output<typeof SlideScheduleSchema>;
export type SlideScheduleInput = z.input<typeof SlideScheduleSchema>;

function anchorWords(a: TimeAnchor): string {
  if (a.at === 'clock') return a.time;
  if (a.offsetMin === 0) return a.at;
  const abs = Math.abs(a.offsetMin);
  const span = abs % 60 === 0 ? `${abs / 60} h` : abs > 60 ? `${Math.floor(abs / 60)} h ${abs % 60} min` : `${abs} min`;
  return `${span} ${a.offsetMin < 0 ? 'before' : 'after'} ${a.at}`;
}

/** Consecutive runs of weekdays: "Mon–Fri", "Sat, Sun", "every day". */
function daysWords(days: readonly Weekday[]): string {
  if (days.length === 7) return 'every day';
  const idx = [...new Set(days)].map((d) => WEEKDAYS.indexOf(d)).sort((a, b) => a - b);
  const runs: Array<[number, number]> = [];
  for (const i of idx) {
    const last = runs.at(-1);
    if (last && last[1] === i - 1) last[1] = i;
    else runs.push([i, i]);
  }
  return runs
    .map(([a, b]) =>
      a === b
        ? WEEKDAY_LABELS[WEEKDAYS[a]]
        : b === a + 1
          ? `${WEEKDAY_LABELS[WEEKDAYS[a]]}, ${WEEKDAY_LABELS[WEEKDAYS[b]]}`
          : `${WEEKDAY_LABELS[WEEKDAYS[a]]}–${WEEKDAY_LABELS[WEEKDAYS[b]]}`,
    )
    .join(', ');
}

/** The schedule in a few words for staff: "Mon–Fri, from 1 h before sunset until 23:00, 1 Jan–31 Mar 2027". */
export function describeSchedule(s: SlideSchedule | null): string {
  if (!s) return 'Always';
  const parts = [daysWords(s.days)];
  if (s.from || s.until)
    parts.push(
      `from ${s.from ? anchorWords(s.from) : 'the start of the day'} until ${s.until ? anchorWords(s.until) : 'midnight'}`,
    );
  if (s.firstDate || s.lastDate)
    parts.push(
      `${s.firstDate ? `from ${s.firstDate}` : ''}${s.firstDate && s.lastDate ? ' ' : ''}${s.lastDate ? `to ${s.lastDate}` : ''}`,
    );
  return parts.join(', ');
}
