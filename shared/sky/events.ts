/** Turning instants into local times and words, and a body's stay above the horizon into rise/transit/set. */
import type { NightVisit } from './night-visit.ts';
import { localDateOf, localTimeOf, nextDate } from './time.ts';
import type { HorizonState, RiseTransitSetTimes, SkyEvent } from './types.ts';

/**
 * A moment at the venue, or the words for why there is none.
 * @param ms the instant, or null
 * @param timeZone the venue's time zone
 * @param localDate the night's date "YYYY-MM-DD" (times on the next date say "tomorrow")
 * @param missing the words to use when there is no instant
 */
export function skyEvent(ms: number | null, timeZone: string, localDate: string, missing: string): SkyEvent {
  if (ms === null) return { utc: null, localDate: null, localTime: null, text: missing };
  const date = localDateOf(ms, timeZone);
  const time = localTimeOf(ms, timeZone);
  const text = date === localDate ? time : date === nextDate(localDate) ? `${time} tomorrow` : `${time} on ${date}`;
  return { utc: new Date(ms).toISOString(), localDate: date, localTime: time, text };
}

const WINDOW_WORDS = 'between noon today and noon tomorrow';

const lowerFirst = (s: string) => `${s.charAt(0).toLowerCase()}${s.slice(1)}`;
const sentence = (s: string) => `${s.charAt(0).toUpperCase()}${s.slice(1)}.`;

/**
 * Rise, transit and set in words and local times, all three from the same stay above the horizon.
 * @param visit the stay that matters for the night (nightVisit)
 * @param state which side of the horizon the body keeps (decided by the caller from its altitude)
 * @param timeZone venue time zone
 * @param localDate the night's date
 */
export function riseTransitSetTimes(
  visit: NightVisit,
  state: HorizonState,
  timeZone: string,
  localDate: string,
): RiseTransitSetTimes {
  const when = (ms: number | null, missing: string) => skyEvent(ms, timeZone, localDate, missing);
  if (state === 'always-up') {
    const words = 'Does not set: above the horizon all day and night (circumpolar)';
    const transit = when(visit.transit, `No transit ${WINDOW_WORDS}`);
    return {
      state,
      rise: when(null, words),
      transit,
      set: when(null, words),
      earlierSet: null,
      laterRise: null,
      summary: `Above the horizon all day and night${transit.utc ? `; highest at ${transit.text}` : ''}.`,
    };
  }
  if (state === 'always-down') {
    const words = 'Does not rise: below the horizon all day and night';
    return {
      state,
      rise: when(null, words),
      transit: when(null, 'Stays below the horizon'),
      set: when(null, words),
      earlierSet: null,
      laterRise: null,
      summary: 'Below the horizon all day and night: it does not rise.',
    };
  }
  const rise = when(visit.rise, visit.laterRise !== null ? 'Up at noon' : `Does not rise ${WINDOW_WORDS}`);
  const noTransit = !visit.transitsKnown
    ? `No transit ${WINDOW_WORDS}`
    : visit.rise === null
      ? 'Highest before noon'
      : 'No transit before it sets';
  const transit = when(visit.transit, noTransit);
  const followed = visit.rise === null ? WINDOW_WORDS : `before noon on ${localDateOf(visit.searchedToMs, timeZone)}`;
  const set = when(visit.set, `Does not set ${followed}`);
  const earlierSet = visit.earlierSet === null ? null : when(visit.earlierSet, '');
  const highest = transit.utc ? `, highest ${transit.text}` : '';
  const setting = set.utc ? `, sets ${set.text}` : `; ${lowerFirst(set.text)}`;
  const laterRise = visit.laterRise === null ? null : when(visit.laterRise, '');
  if (!rise.utc) {
    const again = laterRise ? `rises again ${laterRise.text}` : 'does not rise again before noon tomorrow';
    return {
      state,
      rise,
      transit,
      set,
      earlierSet,
      laterRise,
      summary: sentence(`above the horizon at noon${highest}${setting}; ${again}`),
    };
  }
  // A stay under way at noon that ends before the rise is told apart, never paired with it.
  const start = earlierSet
    ? `above the horizon at noon and sets ${earlierSet.text}; rises again ${rise.text}`
    : `rises ${rise.text}`;
  return { state, rise, transit, set, earlierSet, laterRise, summary: sentence(`${start}${highest}${setting}`) };
}
