/** Turning instants into local times and words, and a body's stay above the horizon into rise/transit/set. */
import { GRAZE_MARGIN_DEG, type Graze } from './body-track.ts';
import type { NightVisit } from './night-visit.ts';
import { localDateOf, localTimeOf, nextDate, wallClock, zoneOffsetMs } from './time.ts';
import type { GrazeNote, HorizonState, RiseTransitSetTimes, SkyEvent } from './types.ts';

const pad = (n: number) => String(n).padStart(2, '0');

/**
 * An instant on a venue's clock as ISO 8601 with the UTC offset in force, to the second.
 * @param ms the instant
 * @param timeZone an IANA time zone
 * @returns e.g. "2026-06-21T23:14:05+01:00"
 */
export function localIso(ms: number, timeZone: string): string {
  const t = Math.round(ms / 1000) * 1000;
  const w = wallClock(t, timeZone);
  const offset = Math.round(zoneOffsetMs(t, timeZone) / 60_000);
  const sign = offset < 0 ? '-' : '+';
  const zone = `${sign}${pad(Math.floor(Math.abs(offset) / 60))}:${pad(Math.abs(offset) % 60)}`;
  return `${w.year}-${pad(w.month)}-${pad(w.day)}T${pad(w.hour)}:${pad(w.minute)}:${pad(w.second)}${zone}`;
}

/** "21:14", "04:52 tomorrow" or "04:52 on 2026-06-23" for the night of localDate. */
export function clockText(ms: number, timeZone: string, localDate: string): string {
  const date = localDateOf(ms, timeZone);
  const time = localTimeOf(ms, timeZone);
  return date === localDate ? time : date === nextDate(localDate) ? `${time} tomorrow` : `${time} on ${date}`;
}

/** "0.04°": how far past (or short of) the altitude a grazing body gets, never "0.00°". */
export const grazeDegrees = (graze: Graze): string => `${Math.max(0.01, Math.abs(graze.offsetDeg)).toFixed(2)}°`;

/**
 * A moment at the venue, or the words for why there is none.
 * @param ms the instant, or null
 * @param timeZone the venue's time zone
 * @param localDate the night's date "YYYY-MM-DD" (times on the next date say "tomorrow")
 * @param missing the words to use when there is no instant
 * @param graze when the body comes within the margin of the altitude: how close, and the words that say so
 *   (after the time when it crosses, e.g. "only just: …"; when it does not, they are the missing words)
 */
export function skyEvent(
  ms: number | null,
  timeZone: string,
  localDate: string,
  missing: string,
  graze: { graze: Graze; words: string } | null = null,
): SkyEvent {
  const note: GrazeNote | null = graze && {
    crosses: graze.graze.crosses,
    closestUtc: new Date(graze.graze.ms).toISOString(),
    closestLocalTime: localTimeOf(graze.graze.ms, timeZone),
    pastDeg: Math.round((graze.graze.kind === 'highest' ? graze.graze.offsetDeg : -graze.graze.offsetDeg) * 100) / 100,
    marginDeg: GRAZE_MARGIN_DEG,
  };
  const state = note ? 'grazes' : ms === null ? 'none' : 'occurs';
  if (ms === null) return { state, utc: null, local: null, localDate: null, localTime: null, text: missing, graze: note };
  const time = clockText(ms, timeZone, localDate);
  return {
    state,
    utc: new Date(ms).toISOString(),
    local: localIso(ms, timeZone),
    localDate: localDateOf(ms, timeZone),
    localTime: localTimeOf(ms, timeZone),
    text: graze ? `${time} (${graze.words})` : time,
    graze: note,
  };
}

const WINDOW_WORDS = 'between noon today and noon tomorrow';

const lowerFirst = (s: string) => `${s.charAt(0).toLowerCase()}${s.slice(1)}`;
const sentence = (s: string) => `${s.charAt(0).toUpperCase()}${s.slice(1)}.`;

/** Words after a time that only just happens: how close to the horizon the body's turning point is. */
function onlyJust(graze: Graze, timeZone: string, localDate: string): string {
  const side = graze.kind === 'highest' ? 'above' : 'below';
  return `only just: at most ${grazeDegrees(graze)} ${side} the horizon, at ${clockText(graze.ms, timeZone, localDate)}`;
}

/** Words for a near miss: the body comes within the margin of rising (or setting) but does not. */
function missWords(graze: Graze, timeZone: string, localDate: string): string {
  const verb = graze.kind === 'highest' ? 'rise' : 'set';
  return `Does not ${verb}: comes within ${grazeDegrees(graze)} of the horizon at ${clockText(graze.ms, timeZone, localDate)}`;
}

/**
 * Rise, transit and set in words and local times, all three from the same stay above the horizon.
 * A rise or set that only just happens (the body's turning point within 0.1° of the horizon) says
 * so after its time; a near miss replaces the "does not rise/set" words when nothing else is shown.
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
  const when = (ms: number | null, missing: string) => {
    const graze = ms === null ? undefined : visit.grazing?.get(ms);
    return skyEvent(ms, timeZone, localDate, missing, graze ? { graze, words: onlyJust(graze, timeZone, localDate) } : null);
  };
  const missed = (kind: Graze['kind'], missing: string) => {
    const graze = visit.misses?.find((g) => g.kind === kind);
    return graze
      ? skyEvent(null, timeZone, localDate, missWords(graze, timeZone, localDate), { graze, words: '' })
      : skyEvent(null, timeZone, localDate, missing);
  };
  const missNote = (kind: Graze['kind']) => {
    const graze = visit.misses?.find((g) => g.kind === kind);
    return graze
      ? ` It ${lowerFirst(missWords(graze, timeZone, localDate)).replace(/^does not (rise|set): /, '')} without ${kind === 'highest' ? 'rising' : 'setting'}.`
      : '';
  };
  if (state === 'always-up') {
    const words = 'Does not set: above the horizon all day and night (circumpolar)';
    const transit = when(visit.transit, `No transit ${WINDOW_WORDS}`);
    return {
      state,
      rise: when(null, words),
      transit,
      set: missed('lowest', words),
      earlierSet: null,
      laterRise: null,
      summary: `Above the horizon all day and night${transit.utc ? `; highest at ${transit.text}` : ''}.${missNote('lowest')}`,
    };
  }
  if (state === 'always-down') {
    const words = 'Does not rise: below the horizon all day and night';
    return {
      state,
      rise: missed('highest', words),
      transit: when(null, 'Stays below the horizon'),
      set: when(null, words),
      earlierSet: null,
      laterRise: null,
      summary: `Below the horizon all day and night: it does not rise.${missNote('highest')}`,
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
