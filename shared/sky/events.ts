/** Turning instants into local times and words, and a body's window events into rise/transit/set. */
import type { WindowEvents } from './body-track.ts';
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

/**
 * Rise, transit and set in words and local times.
 * @param events what the window search found
 * @param state which side of the horizon the body keeps (decided by the caller from its altitude)
 * @param timeZone venue time zone
 * @param localDate the night's date
 */
export function riseTransitSetTimes(events: WindowEvents, state: HorizonState, timeZone: string, localDate: string): RiseTransitSetTimes {
  const transitMs = events.transits[0] ?? null;
  if (state === 'always-up') {
    const words = 'Does not set: above the horizon all day and night (circumpolar)';
    const transit = skyEvent(transitMs, timeZone, localDate, `No transit ${WINDOW_WORDS}`);
    return {
      state,
      rise: skyEvent(null, timeZone, localDate, words),
      transit,
      set: skyEvent(null, timeZone, localDate, words),
      summary: `Above the horizon all day and night${transit.utc ? `; highest at ${transit.text}` : ''}.`,
    };
  }
  if (state === 'always-down') {
    const words = 'Does not rise: below the horizon all day and night';
    return {
      state,
      rise: skyEvent(null, timeZone, localDate, words),
      transit: skyEvent(null, timeZone, localDate, 'Stays below the horizon'),
      set: skyEvent(null, timeZone, localDate, words),
      summary: 'Below the horizon all day and night: it does not rise.',
    };
  }
  const rise = skyEvent(events.rises[0] ?? null, timeZone, localDate, `Does not rise ${WINDOW_WORDS}`);
  const transit = skyEvent(transitMs, timeZone, localDate, `No transit ${WINDOW_WORDS}`);
  const set = skyEvent(events.sets[0] ?? null, timeZone, localDate, `Does not set ${WINDOW_WORDS}`);
  // In the order they happen: a body already up at noon sets before it rises again.
  const happened = [
    { ms: events.rises[0], words: `rises ${rise.text}` },
    { ms: transitMs ?? undefined, words: `highest ${transit.text}` },
    { ms: events.sets[0], words: `sets ${set.text}` },
  ]
    .filter((e): e is { ms: number; words: string } => e.ms !== undefined)
    .sort((a, b) => a.ms - b.ms)
    .map((e) => e.words);
  if (!rise.utc) happened.push('does not rise again before noon tomorrow');
  if (!set.utc) happened.push('does not set before noon tomorrow');
  const sentence = happened.join(', ');
  return { state, rise, transit, set, summary: `${sentence.charAt(0).toUpperCase()}${sentence.slice(1)}.` };
}
