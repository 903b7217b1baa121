/**
 * A body's path across one local window (noon to noon): its rise, transit and set instants from
 * the ch. 15 method run on each UT day that overlaps the window, and its altitude at any moment
 * by interpolating the same daily positions.
 */
import { apparent0UT } from 'astronomia/sidereal';
import { DEG } from './angles.ts';
import { toHorizontal, type Observer } from './horizon.ts';
import { riseTransitSet, type DayEvents } from './rise-set.ts';
import { deltaTSeconds, jdFromMs, msFromJd } from './time.ts';

/** Apparent right ascension and declination in degrees. */
export interface RaDec {
  raDeg: number;
  decDeg: number;
}

/** What a body offers the window search. */
export interface Trackable {
  /** Apparent place at a Julian Ephemeris Day. */
  placeAt(jde: number): RaDec;
  /** Standard altitude h0 for the UT day starting at jd0. */
  h0Deg(jd0: number): number;
}

/** Rise, transit and set instants (ms) inside the window, and how each overlapping day went. */
export interface WindowEvents {
  rises: number[];
  transits: number[];
  sets: number[];
  dayKinds: Array<DayEvents['kind']>;
}

/** 0h UT of the UT day containing a Julian Day. */
const dayStart = (jd: number) => Math.floor(jd - 0.5) + 0.5;

/** Two events of one kind closer than this are the same event found from neighbouring days. */
const SAME_EVENT_MS = 60 * 60_000;

function collect(list: number[], ms: number, startMs: number, endMs: number) {
  if (ms < startMs || ms >= endMs) return;
  if (list.some((t) => Math.abs(t - ms) < SAME_EVENT_MS)) return;
  list.push(ms);
}

/**
 * Every rise, upper transit and set of a body between two instants.
 * @param observer where from
 * @param startMs window start (inclusive)
 * @param endMs window end (exclusive)
 * @param body the body's positions and standard altitude
 */
export function eventsInWindow(observer: Observer, startMs: number, endMs: number, body: Trackable): WindowEvents {
  const out: WindowEvents = { rises: [], transits: [], sets: [], dayKinds: [] };
  const first = dayStart(jdFromMs(startMs)) - 1;
  const last = dayStart(jdFromMs(endMs));
  for (let jd0 = first; jd0 <= last; jd0 += 1) {
    const places = [body.placeAt(jd0 - 1), body.placeAt(jd0), body.placeAt(jd0 + 1)];
    const events = riseTransitSet({
      latitude: observer.latitude,
      longitude: observer.longitude,
      theta0Deg: apparent0UT(jd0) / 240,
      deltaTSec: deltaTSeconds(jd0),
      h0Deg: body.h0Deg(jd0),
      ra: [places[0].raDeg, places[1].raDeg, places[2].raDeg],
      dec: [places[0].decDeg, places[1].decDeg, places[2].decDeg],
    });
    const toMs = (m: number) => msFromJd(jd0 + m);
    out.dayKinds.push(events.kind);
    collect(out.transits, toMs(events.transit), startMs, endMs);
    if (events.kind === 'rises-and-sets') {
      collect(out.rises, toMs(events.rise), startMs, endMs);
      collect(out.sets, toMs(events.set), startMs, endMs);
    }
  }
  // At or very near a geographic pole ch. 15 cannot place a crossing (the hour angle of rising is
  // undefined) and a body's upper transit means nothing; a crossing is found by its altitude instead.
  if (Math.abs(observer.latitude) > POLAR_LATITUDE) {
    out.transits = [];
    if (!out.rises.length && !out.sets.length) Object.assign(out, crossingsBySampling(observer, startMs, endMs, body));
  }
  for (const list of [out.rises, out.transits, out.sets]) list.sort((a, b) => a - b);
  return out;
}

/** Latitudes beyond this are treated as the pole itself. */
const POLAR_LATITUDE = 89.99;
const SAMPLE_MS = 20 * 60_000;

/** Rises and sets found where altitude − h0 changes sign, refined by bisection to a second. */
function crossingsBySampling(
  observer: Observer,
  startMs: number,
  endMs: number,
  body: Trackable,
): { rises: number[]; sets: number[] } {
  const above = (ms: number) => altitudeAt(observer, ms, body).altitudeDeg - body.h0Deg(Math.floor(jdFromMs(ms) - 0.5) + 0.5);
  const rises: number[] = [];
  const sets: number[] = [];
  let t0 = startMs;
  let v0 = above(t0);
  for (let t1 = startMs + SAMPLE_MS; t0 < endMs; t1 += SAMPLE_MS) {
    const end = Math.min(t1, endMs);
    const v1 = above(end);
    if (v0 <= 0 !== v1 <= 0) {
      let [lo, hi] = [t0, end];
      while (hi - lo > 1000) {
        const mid = (lo + hi) / 2;
        if (above(mid) <= 0 === v0 <= 0) lo = mid;
        else hi = mid;
      }
      (v0 <= 0 ? rises : sets).push(Math.round((lo + hi) / 2));
    }
    [t0, v0] = [end, v1];
  }
  return { rises, sets };
}

/**
 * Geometric altitude (degrees) of a body at an instant, interpolated from its 0h TD places on
 * neighbouring days (accurate to well under a minute of arc for the planets and the Sun).
 */
export function altitudeAt(observer: Observer, ms: number, body: Trackable): { altitudeDeg: number; azimuthDeg: number } {
  const jd = jdFromMs(ms);
  const jd0 = dayStart(jd);
  const n = jd - jd0 + deltaTSeconds(jd) / 86_400;
  const p = [body.placeAt(jd0 - 1), body.placeAt(jd0), body.placeAt(jd0 + 1)];
  const interp = (y0: number, y1: number, y2: number) => {
    const a = y1 - y0;
    const b = y2 - y1;
    return y1 + (n / 2) * (a + b + n * (b - a));
  };
  const unwrap = (ref: number, v: number) => ref + ((((v - ref + 180) % 360) + 360) % 360) - 180;
  const r1 = p[1].raDeg;
  const ra = interp(unwrap(r1, p[0].raDeg), r1, unwrap(r1, p[2].raDeg));
  const dec = interp(p[0].decDeg, p[1].decDeg, p[2].decDeg);
  return toHorizontal(ra * DEG, dec * DEG, observer, jd);
}
