/** Sunset, sunrise and the ends of civil, nautical and astronomical twilight for one night. */
import { DEG } from './angles.ts';
import { BodyPath, GRAZE_MARGIN_DEG, type Graze, type Trackable } from './body-track.ts';
import type { Ephemeris } from './ephemeris.ts';
import { clockText, grazeDegrees, skyEvent } from './events.ts';
import type { Observer } from './horizon.ts';
import { STANDARD_ALTITUDE } from './rise-set.ts';
import type { SkyEvent, SunTonight } from './types.ts';

/** The Sun as a trackable body, with its standard altitude for sunrise and sunset. */
export function sunTrack(ephemeris: Ephemeris, h0Deg: number = STANDARD_ALTITUDE.sun): Trackable {
  return {
    placeAt: (jde) => {
      const p = ephemeris.sun(jde);
      return { raDeg: p.ra / DEG, decDeg: p.dec / DEG };
    },
    h0Deg: () => h0Deg,
  };
}

/** The evening crossing of an altitude and the next morning crossing, as instants (or null), and any graze. */
interface Crossing {
  dusk: number | null;
  dawn: number | null;
  /** The graze that makes a crossing "only just", by instant. */
  grazing: Map<number, Graze>;
  /** A near miss inside the window (the Sun comes within the margin of the altitude but does not cross it). */
  miss: Graze | null;
  /** The lowest point inside the window, less the altitude. */
  lowestOffsetDeg: number;
}

function crossing(path: BodyPath, h0Deg: number): Crossing {
  const events = path.events(h0Deg);
  const dusk = events.sets[0] ?? null;
  const dawn = events.rises.find((t) => dusk === null || t > dusk) ?? null;
  const miss = events.grazes.find((g) => !g.crosses && g.ms >= path.startMs && g.ms < path.endMs) ?? null;
  return { dusk, dawn, grazing: events.grazingCrossings, miss, lowestOffsetDeg: path.range().lowest.altitudeDeg - h0Deg };
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

/** "18°" for −18, "0.83°"-free words for the horizon. */
const below = (h0: number) => `${-h0}° below the horizon`;

function darkness(
  astro: Crossing,
  nautical: Crossing,
  civil: Crossing,
  lowest: { ms: number; altitudeDeg: number },
  highestDeg: number,
  clock: (ms: number) => string,
): SunTonight['darkness'] {
  const low = lowest.altitudeDeg;
  const lowWords = `${Math.abs(low).toFixed(2)}° ${low < 0 ? 'below' : 'above'} the horizon at ${clock(lowest.ms)}`;
  // The deepest twilight altitude the Sun comes within the margin of decides whether the night "only just" is what it is.
  const near = [
    [STANDARD_ALTITUDE.astronomicalTwilight, astro],
    [STANDARD_ALTITUDE.nauticalTwilight, nautical],
    [STANDARD_ALTITUDE.civilTwilight, civil],
  ].find(([, c]) => Math.abs((c as Crossing).lowestOffsetDeg) < GRAZE_MARGIN_DEG) as [number, Crossing] | undefined;
  const grazes = near !== undefined && highestDeg >= STANDARD_ALTITUDE.astronomicalTwilight;
  const base = { grazes, lowestSunAltitudeDeg: Math.round(low * 100) / 100 };
  const onlyJust = grazes ? ` Only just: the Sun is lowest ${lowWords}, within ${GRAZE_MARGIN_DEG}° of ${below(near![0])}.` : '';
  if (highestDeg < STANDARD_ALTITUDE.astronomicalTwilight)
    return {
      kind: 'dark-all-day',
      text: 'Dark all day and night: the Sun stays more than 18° below the horizon (polar night).',
      ...base,
    };
  if (low < STANDARD_ALTITUDE.astronomicalTwilight)
    return {
      kind: 'astronomical',
      text: `Astronomical darkness tonight: the Sun goes more than 18° below the horizon.${onlyJust}`,
      ...base,
    };
  if (low < STANDARD_ALTITUDE.nauticalTwilight)
    return {
      kind: 'nautical',
      text: `No astronomical darkness tonight: the Sun stays less than 18° below the horizon, so the faintest stars stay hidden.${onlyJust}`,
      ...base,
    };
  if (low < STANDARD_ALTITUDE.civilTwilight)
    return {
      kind: 'civil',
      text: `No astronomical or nautical darkness tonight: the Sun stays less than 12° below the horizon.${onlyJust}`,
      ...base,
    };
  if (low < STANDARD_ALTITUDE.sun)
    return {
      kind: 'twilight-all-night',
      text: `Twilight all night: the Sun stays less than 6° below the horizon.${onlyJust}`,
      ...base,
    };
  return { kind: 'no-night', text: 'The Sun does not set tonight (midnight sun).', ...base };
}

/**
 * The night's Sun events with words for the ones that do not happen, and "only just" words for
 * the ones within 0.1° (GRAZE_MARGIN_DEG) of happening or not. Every crossing and the darkness come
 * from one sampled path of the Sun's altitude, so "astronomical darkness" never stands beside "no
 * astronomical dawn".
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
  const path = new BodyPath(observer, sunTrack(ephemeris), startMs, endMs);
  const sunset = crossing(path, STANDARD_ALTITUDE.sun);
  const civil = crossing(path, STANDARD_ALTITUDE.civilTwilight);
  const nautical = crossing(path, STANDARD_ALTITUDE.nauticalTwilight);
  const astro = crossing(path, STANDARD_ALTITUDE.astronomicalTwilight);
  const { lowest, highest } = path.range();
  const clock = (ms: number) => clockText(ms, timeZone, localDate);

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
  const sunAltitude = (g: Graze) => `${Math.abs(g.altitudeDeg).toFixed(2)}° ${g.altitudeDeg < 0 ? 'below' : 'above'} the horizon`;
  const ev = (c: Crossing, ms: number | null, h0: number, evening: boolean, name: string): SkyEvent => {
    const isSun = h0 === STANDARD_ALTITUDE.sun;
    if (ms !== null) {
      const graze = c.grazing.get(ms);
      if (!graze) return skyEvent(ms, timeZone, localDate, '');
      const words = isSun
        ? `only just: the Sun’s upper edge ${graze.kind === 'lowest' ? 'dips' : 'rises'} at most ${grazeDegrees(graze)} ${graze.kind === 'lowest' ? 'below' : 'above'} the horizon, at ${clock(graze.ms)}`
        : `only just: the Sun is ${graze.kind} ${sunAltitude(graze)}, at ${clock(graze.ms)}`;
      return skyEvent(ms, timeZone, localDate, '', { graze, words });
    }
    // A near miss: the Sun comes within the margin of the altitude (from either side) and turns back.
    const miss = c.miss;
    if (miss) {
      const words = isSun
        ? `No ${name}: the Sun’s upper edge comes within ${grazeDegrees(miss)} of the horizon at ${clock(miss.ms)} but does not ${miss.kind === 'lowest' ? 'set' : 'rise'}`
        : `No ${name}: the Sun is ${miss.kind} ${sunAltitude(miss)} at ${clock(miss.ms)}, within ${grazeDegrees(miss)} of ${-h0}°`;
      return skyEvent(null, timeZone, localDate, words, { graze: miss, words: '' });
    }
    return skyEvent(null, timeZone, localDate, missing(h0, evening, name));
  };

  return {
    sun: {
      sunset: ev(sunset, sunset.dusk, STANDARD_ALTITUDE.sun, true, 'sunset'),
      sunrise: ev(sunset, sunset.dawn, STANDARD_ALTITUDE.sun, false, 'sunrise'),
      civilDusk: ev(civil, civil.dusk, STANDARD_ALTITUDE.civilTwilight, true, 'end of civil twilight'),
      nauticalDusk: ev(nautical, nautical.dusk, STANDARD_ALTITUDE.nauticalTwilight, true, 'end of nautical twilight'),
      astronomicalDusk: ev(astro, astro.dusk, STANDARD_ALTITUDE.astronomicalTwilight, true, 'astronomical darkness'),
      astronomicalDawn: ev(astro, astro.dawn, STANDARD_ALTITUDE.astronomicalTwilight, false, 'astronomical dawn'),
      nauticalDawn: ev(nautical, nautical.dawn, STANDARD_ALTITUDE.nauticalTwilight, false, 'nautical dawn'),
      civilDawn: ev(civil, civil.dawn, STANDARD_ALTITUDE.civilTwilight, false, 'civil dawn'),
      darkness: darkness(astro, nautical, civil, lowest, highest.altitudeDeg, clock),
    },
    dusk: { sunset: sunset.dusk, civil: civil.dusk, nautical: nautical.dusk },
    dawn: { sunrise: sunset.dawn, civil: civil.dawn, nautical: nautical.dawn },
    lowest,
    highest,
  };
}
