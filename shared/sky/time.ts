/**
 * Time scales for the sky computations: Julian Days from JavaScript instants and ΔT. UTC is used
 * for UT1 (they differ by under 0.9 s, far below the minute the times are shown to).
 */
import { deltaT } from 'astronomia/deltat';

const MS_PER_DAY = 86_400_000;
/** Julian Day of the Unix epoch, 1970-01-01T00:00Z. */
const JD_UNIX_EPOCH = 2_440_587.5;

/** Julian Day (UT) of an instant given in milliseconds since the Unix epoch. */
export const jdFromMs = (ms: number): number => ms / MS_PER_DAY + JD_UNIX_EPOCH;

/** ΔT = TT − UT in seconds at a Julian Day, from astronomia's table and polynomials. */
export function deltaTSeconds(jd: number): number {
  return deltaT(2000 + (jd - 2_451_545) / 365.25);
}

/** Julian Ephemeris Day (TT) for a Julian Day (UT). */
export const jdeFromJd = (jd: number): number => jd + deltaTSeconds(jd) / 86_400;

export {
  canonicalTimeZone,
  isLocalDate,
  localDateOf,
  localTimeOf,
  localToMs,
  nextDate,
  wallClock,
  zoneOffsetMs,
} from './time-zone.ts';
