import { describe, expect, it } from 'vitest';
import { isShowingAt, type SunDay, windowOn } from '@shared/schedule/evaluate.ts';
import { describeSchedule, SlideScheduleSchema } from '@shared/schemas/slide-schedule.ts';
import { sunDays } from '@shared/sky/sun-days.ts';

const London = 'Europe/London';
const parse = (v: unknown) => SlideScheduleSchema.parse(v);
const at = (iso: string) => Date.parse(iso);
const messages = (v: unknown) => {
  const r = SlideScheduleSchema.safeParse(v);
  return r.success ? [] : r.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
};
// Greenwich (the Royal Observatory's position, recalled from memory); any mid-latitude place would do.
const greenwich = { latitude: 51.4769, longitude: -0.0005, elevationM: 0 };
// Tromsø, 69.65° N (recalled from memory): polar night around the December solstice, midnight sun in June.
const tromso = { latitude: 69.65, longitude: 18.96, elevationM: 0 };

describe('slide schedule schema: hostile input', () => {
  it('refuses an end date before the start date', () => {
    expect(messages({ firstDate: '2027-03-10', lastDate: '2027-03-01' })).toEqual([
      'lastDate: The last day must be on or after the first day',
    ]);
  });
  it('refuses an unknown weekday, a repeated one and none at all', () => {
    expect(messages({ days: ['mon', 'funday'] })[0]).toBe('days.1: Days are mon, tue, wed, thu, fri, sat or sun');
    expect(messages({ days: ['mon', 'mon'] })[0]).toBe('days: A day of the week is listed twice');
    expect(messages({ days: [] })[0]).toBe('days: Choose at least one day of the week, or the slide would never show');
  });
  it('refuses offsets beyond six hours and times that are not on a 24-hour clock', () => {
    expect(messages({ from: { at: 'sunset', offsetMin: -361 } })[0]).toMatch(/at most 6 hours \(360 minutes\) either way/);
    expect(messages({ from: { at: 'sunrise', offsetMin: 12.5 } })[0]).toMatch(/whole number of minutes/);
    expect(messages({ until: { at: 'clock', time: '24:00' } })[0]).toMatch(/HH:MM on a 24-hour clock/);
    expect(messages({ until: { at: 'moonrise', offsetMin: 0 } })[0]).toMatch(/clock time, or an offset from sunset or sunrise/);
  });
  it('refuses a range with no possible showing', () => {
    // 2027-03-01 is a Monday (calendar), so Mon 1 – Tue 2 March holds no Saturday or Sunday.
    expect(messages({ days: ['sat', 'sun'], firstDate: '2027-03-01', lastDate: '2027-03-02' })).toEqual([
      'days: Between 2027-03-01 and 2027-03-02 there is no Sat, Sun: the slide would never show',
    ]);
    expect(messages({ from: { at: 'clock', time: '18:00' }, until: { at: 'clock', time: '18:00' } })[0]).toMatch(
      /would last no time/,
    );
    expect(messages({ from: { at: 'sunset', offsetMin: -60 }, until: { at: 'sunset', offsetMin: -60 } })[0]).toMatch(
      /would last no time/,
    );
    expect(messages({ firstDate: '2027-02-30' })[0]).toMatch(/real date/);
  });
  it('fills in every day and describes itself in words', () => {
    const s = parse({ from: { at: 'sunset', offsetMin: -60 }, until: { at: 'clock', time: '23:00' } });
    expect(s.days).toHaveLength(7);
    expect(describeSchedule(s)).toBe('every day, from 1 h before sunset until 23:00');
    expect(describeSchedule(parse({ days: ['mon', 'tue', 'wed', 'sat', 'sun'], lastDate: '2027-01-31' }))).toBe(
      'Mon–Wed, Sat, Sun, to 2027-01-31',
    );
    expect(describeSchedule(null)).toBe('Always');
  });
});

describe('slide schedule evaluation', () => {
  it('runs past midnight and counts the night from the day it opened', () => {
    // 2027-03-05 is a Friday; London is on GMT (UTC+0) then.
    const s = parse({ days: ['fri'], from: { at: 'clock', time: '20:00' }, until: { at: 'clock', time: '01:00' } });
    expect(isShowingAt(s, at('2027-03-05T19:59:00Z'), London, [])).toBe(false);
    expect(isShowingAt(s, at('2027-03-05T23:00:00Z'), London, [])).toBe(true);
    expect(isShowingAt(s, at('2027-03-06T00:30:00Z'), London, [])).toBe(true); // Saturday 00:30, Friday's night
    expect(isShowingAt(s, at('2027-03-06T01:00:00Z'), London, [])).toBe(false); // end is exclusive
    expect(isShowingAt(s, at('2027-03-05T00:30:00Z'), London, [])).toBe(false); // Thursday's night is not scheduled
  });

  it('keeps local clock times across the spring and autumn changes (DST)', () => {
    const s = parse({ from: { at: 'clock', time: '18:00' }, until: { at: 'clock', time: '22:00' } });
    // 2027-03-28: UK clocks go forward at 01:00 GMT (common practice: last Sunday in March).
    expect(windowOn(s, '2027-03-27', London, [])).toEqual({ start: at('2027-03-27T18:00:00Z'), end: at('2027-03-27T22:00:00Z') });
    expect(windowOn(s, '2027-03-28', London, [])).toEqual({ start: at('2027-03-28T17:00:00Z'), end: at('2027-03-28T21:00:00Z') });
    // A window across the change: 00:30 → 03:00 local lasts 1.5 h of real time that night.
    const night = parse({ from: { at: 'clock', time: '00:30' }, until: { at: 'clock', time: '03:00' } });
    expect(windowOn(night, '2027-03-28', London, [])).toEqual({
      start: at('2027-03-28T00:30:00Z'),
      end: at('2027-03-28T02:00:00Z'),
    });
    // 2027-10-31: clocks go back at 02:00 BST; 01:00–01:59 happens twice. The window opens at the first 01:00.
    const twice = parse({ from: { at: 'clock', time: '01:00' }, until: { at: 'clock', time: '01:30' } });
    expect(windowOn(twice, '2027-10-31', London, [])).toEqual({
      start: at('2027-10-31T00:00:00Z'),
      end: at('2027-10-31T00:30:00Z'),
    });
  });

  it('follows the venue’s sunset, an hour before it, day by day (and across DST)', () => {
    const days = sunDays(greenwich, London, '2027-03-26', 4);
    const s = parse({ from: { at: 'sunset', offsetMin: -60 }, until: { at: 'clock', time: '23:00' } });
    for (const day of days) {
      const w = windowOn(s, day.date, London, days)!;
      expect(w.start).toBe(Date.parse(day.sunset!) - 3_600_000);
      expect(isShowingAt(s, w.start - 60_000, London, days)).toBe(false);
      expect(isShowingAt(s, w.start + 60_000, London, days)).toBe(true);
    }
    // Sunset in London in late March is about 18:20 GMT / 19:20 BST (recalled from memory): the clock jumps, the Sun does not.
    const before = new Date(days[0].sunset!).getUTCHours();
    const after = new Date(days[3].sunset!).getUTCHours();
    expect([before, after]).toEqual([18, 18]);
  });

  it('a polar venue: in polar night "from sunset" shows from the start of the day; under the midnight sun it never opens', () => {
    const s = parse({ from: { at: 'sunset', offsetMin: -60 }, until: { at: 'clock', time: '23:00' } });
    const december = sunDays(tromso, 'Europe/Oslo', '2026-12-20', 2);
    expect(december[0]).toMatchObject({ sunset: null, no_sunset: 'sun_down' });
    expect(isShowingAt(s, at('2026-12-20T08:00:00Z'), 'Europe/Oslo', december)).toBe(true); // 09:00 local, dark all day
    expect(isShowingAt(s, at('2026-12-20T22:30:00Z'), 'Europe/Oslo', december)).toBe(false); // after 23:00 local
    const june = sunDays(tromso, 'Europe/Oslo', '2027-06-20', 2);
    expect(june[0]).toMatchObject({ sunset: null, no_sunset: 'sun_up' });
    expect(windowOn(s, '2027-06-20', 'Europe/Oslo', june)).toBeNull();
    for (let h = 0; h < 24; h += 1)
      expect(isShowingAt(s, at(`2027-06-20T${String(h).padStart(2, '0')}:10:00Z`), 'Europe/Oslo', june)).toBe(false);
    // "until sunrise" in polar night runs to the end of the day it opened (there is no sunrise to wait for).
    const toSunrise = parse({ from: { at: 'clock', time: '20:00' }, until: { at: 'sunrise', offsetMin: 0 } });
    expect(windowOn(toSunrise, '2026-12-20', 'Europe/Oslo', december)).toEqual({
      start: at('2026-12-20T19:00:00Z'),
      end: at('2026-12-20T23:00:00Z'), // local midnight
    });
  });

  it('beyond the days the feed carries (a long outage) keeps the last known local sunset time', () => {
    const days: SunDay[] = [{ date: '2027-01-10', sunrise: '2027-01-10T08:00:00Z', sunset: '2027-01-10T16:10:00Z' }];
    const s = parse({ from: { at: 'sunset', offsetMin: 0 }, until: { at: 'clock', time: '22:00' } });
    expect(windowOn(s, '2027-01-20', London, days)?.start).toBe(at('2027-01-20T16:10:00Z'));
  });

  it('honours the date range for a temporary exhibition, in local dates', () => {
    const s = parse({ firstDate: '2027-01-01', lastDate: '2027-01-31' });
    // 2026-12-31 23:30 in New York is already 2027-01-01 in UTC, but not at the venue.
    expect(isShowingAt(s, at('2027-01-01T04:30:00Z'), 'America/New_York', [])).toBe(false);
    expect(isShowingAt(s, at('2027-01-01T05:30:00Z'), 'America/New_York', [])).toBe(true);
    expect(isShowingAt(s, at('2027-02-01T04:59:00Z'), 'America/New_York', [])).toBe(true);
    expect(isShowingAt(s, at('2027-02-01T05:00:00Z'), 'America/New_York', [])).toBe(false);
    expect(isShowingAt(null, 0, London, [])).toBe(true);
  });
});
