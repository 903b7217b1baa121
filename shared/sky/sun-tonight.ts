/** Sunset, sunrise and the ends of civil, nautical and astronomical twilight for one night. */
import { DEG } from './angles.ts';
import { altitudeAt, eventsInWindow, type Trackable } from './body-track.ts';
import type { Ephemeris } from './ephemeris.ts';
import { skyEvent } from './events.ts';
import type { Observer } from './horizon.ts';
import { STANDARD_ALTITUDE } from './rise-set.ts';
import type { DarknessKind, SkyEvent, SunTonight } from './types.ts';

/** The Sun as a trackable body with a chosen standard altitude. */
export function sunTrack(ephemeris: Ephemeris, h0Deg: number): Trackable {
  return {
    placeAt: (jde) => {
      const p = ephemeris.sun(jde);
      return { raDeg: p.ra / DEG, decDeg: p.dec / DEG };
    },
    h0Deg: () => h0Deg,
  };
}

/** The evening crossing of an altitude and the next morning crossing, as instants (or null). */
interface Crossing {
  dusk: number | null;
  dawn: number | null;
}

function crossing(observer: Observer, startMs: number, endMs: number, ephemeris: Ephemeris, h0Deg: number): Crossing {
  const events = eventsInWindow(observer, startMs, endMs, sunTrack(ephemeris, h0Deg));
  const dusk = events.sets[0] ?? null;
  const dawn = events.rises.find((t) => dusk === null || t > dusk) ?? null;
  return { dusk, dawn };
}

/** Sun facts the rest of the night's computation needs. */
export interface SunNight {
  sun: SunTonight;
  /** Instants (ms) of each evening crossing, for choosing the observation time. */
  dusk: { sunset: number | null; civil: number | null; nautical: number | null };
  dawn: { sunrise: number | null; civil: number | null; nautical: number | null };
  /** When the Sun is lowest in the window, and how low (degrees). */
  lowest: { ms: number; altitudeDeg: number };
  /** When the Sun is highest in the window, and how high. */
  highest: { ms: number; altitudeDeg: number };
}

const STEP_MS = 10 * 60_000;

/** Lowest and highest Sun over the window, sampled every ten minutes (only used for words and polar cases). */
function extremes(observer: Observer, startMs: number, endMs: number, ephemeris: Ephemeris) {
  const track = sunTrack(ephemeris, STANDARD_ALTITUDE.sun);
  let lowest = { ms: startMs, altitudeDeg: Infinity };
  let highest = { ms: startMs, altitudeDeg: -Infinity };
  for (let t = startMs; t < endMs; t += STEP_MS) {
    const { altitudeDeg } = altitudeAt(observer, t, track);
    if (altitudeDeg < lowest.altitudeDeg) lowest = { ms: t, altitudeDeg };
    if (altitudeDeg > highest.altitudeDeg) highest = { ms: t, altitudeDeg };
  }
  return { lowest, highest };
}

function darkness(
  astro: Crossing,
  nautical: Crossing,
  civil: Crossing,
  sunset: Crossing,
  lowestDeg: number,
  highestDeg: number,
): { kind: DarknessKind; text: string } {
  if (highestDeg < STANDARD_ALTITUDE.astronomicalTwilight)
    return { kind: 'dark-all-day', text: 'Dark all day and night: the Sun stays more than 18° below the horizon (polar night).' };
  if (astro.dusk !== null)
    return { kind: 'astronomical', text: 'Astronomical darkness tonight: the Sun goes more than 18° below the horizon.' };
  if (nautical.dusk !== null)
    return {
      kind: 'nautical',
      text: 'No astronomical darkness tonight: the Sun stays less than 18° below the horizon, so the faintest stars stay hidden.',
    };
  if (civil.dusk !== null)
    return {
      kind: 'civil',
      text: 'No astronomical or nautical darkness tonight: the Sun stays less than 12° below the horizon.',
    };
  if (sunset.dusk !== null || lowestDeg < STANDARD_ALTITUDE.sun)
    return { kind: 'twilight-all-night', text: 'Twilight all night: the Sun stays less than 6° below the horizon.' };
  return { kind: 'no-night', text: 'The Sun does not set tonight (midnight sun).' };
}

/**
 * The night's Sun events with words for the ones that do not happen.
 * @param observer where from
 * @param startMs local noon on the date
 * @param endMs local noon the next day
 */
export function sunNight(
  observer: Observer,
  startMs: number,
  endMs: number,
  ephemeris: Ephemeris,
  timeZone: string,
  localDate: string,
): SunNight {
  const sunset = crossing(observer, startMs, endMs, ephemeris, STANDARD_ALTITUDE.sun);
  const civil = crossing(observer, startMs, endMs, ephemeris, STANDARD_ALTITUDE.civilTwilight);
  const nautical = crossing(observer, startMs, endMs, ephemeris, STANDARD_ALTITUDE.nauticalTwilight);
  const astro = crossing(observer, startMs, endMs, ephemeris, STANDARD_ALTITUDE.astronomicalTwilight);
  const { lowest, highest } = extremes(observer, startMs, endMs, ephemeris);

  // Words for a crossing that does not happen: the Sun stays on one side of that altitude.
  const missing = (h0: number, evening: boolean, name: string): string => {
    const isSun = h0 === STANDARD_ALTITUDE.sun;
    if (lowest.altitudeDeg > h0) {
      if (isSun)
        return evening ? 'The Sun does not set tonight (midnight sun)' : 'No sunrise: the Sun stays up all night (midnight sun)';
      return `No ${name}: the Sun stays less than ${-h0}° below the horizon`;
    }
    if (highest.altitudeDeg < h0) {
      if (isSun) return evening ? 'No sunset: the Sun does not rise today (polar night)' : 'The Sun does not rise (polar night)';
      return `No ${name}: the Sun stays more than ${-h0}° below the horizon all day`;
    }
    return `No ${name} ${evening ? 'this evening' : 'before noon tomorrow'}`;
  };
  const ev = (ms: number | null, h0: number, evening: boolean, name: string): SkyEvent =>
    skyEvent(ms, timeZone, localDate, missing(h0, evening, name));

  return {
    sun: {
      sunset: ev(sunset.dusk, STANDARD_ALTITUDE.sun, true, 'sunset'),
      sunrise: ev(sunset.dawn, STANDARD_ALTITUDE.sun, false, 'sunrise'),
      civilDusk: ev(civil.dusk, STANDARD_ALTITUDE.civilTwilight, true, 'end of civil twilight'),
      nauticalDusk: ev(nautical.dusk, STANDARD_ALTITUDE.nauticalTwilight, true, 'end of nautical twilight'),
      astronomicalDusk: ev(astro.dusk, STANDARD_ALTITUDE.astronomicalTwilight, true, 'astronomical darkness'),
      astronomicalDawn: ev(astro.dawn, STANDARD_ALTITUDE.astronomicalTwilight, false, 'astronomical dawn'),
      nauticalDawn: ev(nautical.dawn, STANDARD_ALTITUDE.nauticalTwilight, false, 'nautical dawn'),
      civilDawn: ev(civil.dawn, STANDARD_ALTITUDE.civilTwilight, false, 'civil dawn'),
      darkness: darkness(astro, nautical, civil, sunset, lowest.altitudeDeg, highest.altitudeDeg),
    },
    dusk: { sunset: sunset.dusk, civil: civil.dusk, nautical: nautical.dusk },
    dawn: { sunrise: sunset.dawn, civil: civil.dawn, nautical: nautical.dawn },
    lowest,
    highest,
  };
}
