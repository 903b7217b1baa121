/**
 * Which stay above the horizon a body's rise, transit and set describe for one night, so that
 * times from two different stays are never shown side by side (a planet up at noon sets in the
 * afternoon, before the rise that matters tonight).
 */
import { eventsInWindow, type Graze, type Trackable, type WindowEvents } from './body-track.ts';
import type { Observer } from './horizon.ts';

/** One stay above the horizon, as instants (ms), plus the end of a stay that was already under way. */
export interface NightVisit {
  /** The first rise in the window, or null when the body does not rise in it. */
  rise: number | null;
  /** The upper transit of the stay shown, or null when it is not known or came before noon. */
  transit: number | null;
  /** The first set after the rise, looked for past the window; without a rise, the set of the stay under way at noon. */
  set: number | null;
  /** When the body is up at noon and sets before the rise shown: that set. */
  earlierSet: number | null;
  /** When the stay shown is the one under way at noon: the next rise in the window, if any. */
  laterRise: number | null;
  /** Whether transits can be placed at all (not at a geographic pole). */
  transitsKnown: boolean;
  /** How far the set was looked for (local noon the day after the window ends). */
  searchedToMs: number;
  /** Crossings (ms) that only just happen, and the graze that makes them so. */
  grazing?: Map<number, Graze>;
  /** Near misses inside the window: comes within the margin of rising (highest) or setting (lowest) without doing so. */
  misses?: Graze[];
}

/** The stretch searched: the night's noon-to-noon window, and how far beyond it a stay is followed. */
export interface VisitSearch {
  startMs: number;
  endMs: number;
  followingEndMs: number;
  /** Tonight's sunset, or null when the Sun does not set. */
  sunsetMs: number | null;
}

/**
 * The stay that matters for the night. A body up at noon that is still up at sunset (an evening
 * planet) keeps that stay, whose set is tonight's. Otherwise it is the stay that begins with the
 * first rise in the window and ends at the first set after it, even when that is after noon
 * tomorrow; a body up at noon that sets in daylight has that set told apart (earlierSet). A body
 * that does not rise in the window keeps the stay it is in at noon.
 * @param observer where from
 * @param search the window and how far past it to follow a stay
 * @param body the body's positions and standard altitude
 * @param events what eventsInWindow found in the window
 */
export function nightVisit(observer: Observer, search: VisitSearch, body: Trackable, events: WindowEvents): NightVisit {
  const known = {
    transitsKnown: events.transits.length > 0,
    searchedToMs: search.followingEndMs,
    grazing: new Map(events.grazingCrossings),
    misses: events.grazes.filter((g) => !g.crosses && g.ms >= search.startMs && g.ms < search.endMs),
  };
  const rise = events.rises[0] ?? null;
  const firstSet = events.sets[0] ?? null;
  const upAtNoonTillDark =
    rise !== null && firstSet !== null && firstSet < rise && search.sunsetMs !== null && firstSet > search.sunsetMs;
  if (rise === null || upAtNoonTillDark) {
    const transit = events.transits.find((t) => firstSet === null || t < firstSet) ?? null;
    return { ...known, rise: null, transit, set: firstSet, earlierSet: null, laterRise: upAtNoonTillDark ? rise : null };
  }
  let { sets, transits } = events;
  // Only a stay that outlasts the window needs the next day's events.
  if (!sets.some((t) => t > rise)) {
    const later = eventsInWindow(observer, search.endMs, search.followingEndMs, body);
    for (const [ms, graze] of later.grazingCrossings) known.grazing.set(ms, graze);
    sets = [...sets, ...later.sets];
    transits = [...transits, ...later.transits];
  }
  const set = sets.find((t) => t > rise) ?? null;
  const transit = transits.find((t) => t > rise && (set === null || t < set)) ?? null;
  return { ...known, rise, transit, set, earlierSet: firstSet !== null && firstSet < rise ? firstSet : null, laterRise: null };
}
