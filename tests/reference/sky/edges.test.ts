/**
 * Rising, setting and twilight at the edges, against astropy's built-in ephemeris (Debian
 * python3-astropy; version recorded in the fixture, made by generate-edges-fixture.py in this
 * folder, run by hand). Every night of 2025 at 50°, 60°, 70° and 78° N; the fixture keeps every
 * night on which a body's highest or lowest point lies within 0.5° of the altitude it crosses, and
 * every 30th night whatever happens.
 *
 * Altitude tolerances (how far our altitude may differ from astropy's): the sky-on-the-sky
 * tolerances of astropy.test.ts (plan94's own errors for the planets), plus 0.005° for UT1 = UTC on
 * both sides (under 0.9 s of Earth rotation, 0.004°) and interpolation (ours under 0.001°, the
 * fixture's under 0.001°), plus for a planet its largest horizontal parallax 8.794″/Δ (Δ its least
 * distance in au, recalled from memory: Mercury 0.55, Venus 0.26, Mars 0.37, the others far): Meeus's
 * −0°34′ is for a planet's geocentric altitude, astropy's is topocentric. The Moon's altitude is
 * compared only within 2° of its standard altitude, where Meeus's 0.7275π − 0°34′ on the geocentric
 * altitude and astropy's topocentric −0°34′ − s agree (they part by π(1 − cos h), under 0.002°
 * there, but by 0.5π ≈ 0.5° at 60° up). A time may differ by the altitude tolerance over the body's
 * rate of change of altitude there, or by one minute, whichever is larger.
 */
import { describe, expect, it } from 'vitest';
import { BodyPath, GRAZE_MARGIN_DEG, type Trackable, type WindowEvents } from '../../../shared/sky/body-track.ts';
import type { PlanetId } from '../../../shared/sky/bodies.ts';
import { Ephemeris } from '../../../shared/sky/ephemeris.ts';
import { moonTrack } from '../../../shared/sky/moon-tonight.ts';
import { STANDARD_ALTITUDE } from '../../../shared/sky/rise-set.ts';
import { sunNight, sunTrack } from '../../../shared/sky/sun-tonight.ts';
import { localToMs, nextDate } from '../../../shared/sky/time.ts';
import { planetTrack } from '../../../shared/sky/tonight.ts';
import fixture from './edges-fixture.json';

type Crossing = [number, 'r' | 's'];
type FixtureExtreme = [number, 'h' | 'l', number];
type Case = [number, string, string, Crossing[], FixtureExtreme[]];

const SUN_ALTITUDES: Record<string, number> = {
  sunset: STANDARD_ALTITUDE.sun,
  civil: STANDARD_ALTITUDE.civilTwilight,
  nautical: STANDARD_ALTITUDE.nauticalTwilight,
  astronomical: STANDARD_ALTITUDE.astronomicalTwilight,
};

/** Degrees; see the file comment for where each comes from. */
const parallax = (au: number) => 8.794 / au / 3600;
const ALTITUDE_TOLERANCE: Record<string, number> = {
  sun: 1 / 3600 + 0.005,
  moon: 0.02,
  mercury: 5 / 3600 + 0.005 + parallax(0.55),
  venus: 5 / 3600 + 0.005 + parallax(0.26),
  mars: 45 / 3600 + 0.005 + parallax(0.37),
  jupiter: 75 / 3600 + 0.005 + parallax(3.9),
  saturn: 85 / 3600 + 0.005 + parallax(8),
  uranus: 90 / 3600 + 0.005 + parallax(17),
  neptune: 15 / 3600 + 0.005 + parallax(28.8),
};
/** The Moon's altitudes are compared only this close to its standard altitude (see above). */
const MOON_COMPARED_WITHIN_DEG = 2;

const EPOCH = Date.parse(fixture.minutes_from);
const MINUTE = 60_000;
const atMinute = (m: number) => EPOCH + m * MINUTE;
const cases = fixture.cases as Case[];
const ephemeris = new Ephemeris();

function trackFor(key: string): { track: Trackable; threshold: number | 'own'; tolerance: number } {
  if (key in SUN_ALTITUDES)
    return { track: sunTrack(ephemeris), threshold: SUN_ALTITUDES[key], tolerance: ALTITUDE_TOLERANCE.sun };
  if (key === 'moon') return { track: moonTrack(ephemeris), threshold: 'own', tolerance: ALTITUDE_TOLERANCE.moon };
  return { track: planetTrack(key as PlanetId, ephemeris), threshold: 'own', tolerance: ALTITUDE_TOLERANCE[key] };
}

interface Night {
  observer: { latitude: number; longitude: number; elevationM: number };
  timeZone: string;
  localDate: string;
  startMs: number;
  endMs: number;
}

function nightOf(c: Case): Night {
  const place = fixture.places[c[0]];
  const localDate = `${fixture.year}-${c[1]}`;
  return {
    observer: { latitude: place.latitude, longitude: place.longitude, elevationM: 0 },
    timeZone: place.time_zone,
    localDate,
    startMs: localToMs(localDate, 720, place.time_zone),
    endMs: localToMs(nextDate(localDate), 720, place.time_zone),
  };
}

const paths = new Map<string, BodyPath>();
function ours(c: Case): { events: WindowEvents; night: Night; tolerance: number; path: BodyPath; threshold: number | 'own' } {
  const night = nightOf(c);
  const { track, threshold, tolerance } = trackFor(c[2]);
  const body = c[2] in SUN_ALTITUDES ? 'sun' : c[2];
  const key = `${c[0]}:${c[1]}:${body}`;
  let path = paths.get(key);
  if (!path) {
    path = new BodyPath(night.observer, track, night.startMs, night.endMs);
    paths.set(key, path);
  }
  return { events: path.events(threshold), night, tolerance, path, threshold };
}

const label = (c: Case) => `${fixture.places[c[0]].latitude}° N, night of ${fixture.year}-${c[1]}, ${c[2]}`;

// About 900 nights and bodies are computed (a few seconds on a quiet machine, more on a loaded one).
describe(`astropy ${fixture.astropy_version} built-in ephemeris: rising, setting and twilight at the edges`, {
  timeout: 120_000,
}, () => {
  it('covers four latitudes, every body and altitude, and hundreds of near nights', () => {
    expect(new Set(cases.map((c) => fixture.places[c[0]].latitude))).toEqual(new Set([50, 60, 70, 78]));
    expect(new Set(cases.map((c) => c[2])).size).toBe(12);
    const near = cases.filter((c) => c[4].some((e) => Math.abs(e[2]) <= fixture.near_deg));
    expect(near.length).toBeGreaterThan(300);
  });

  it('finds the same crossings at the same times (where no extreme is within the tolerance of the altitude)', () => {
    const problems: string[] = [];
    let compared = 0;
    for (const c of cases) {
      const { events, night, tolerance, path, threshold } = ours(c);
      if (c[4].some((e) => Math.abs(e[2]) <= tolerance)) continue;
      const edge = (ms: number) => ms - night.startMs < 2 * MINUTE || night.endMs - ms < 2 * MINUTE;
      const theirs = c[3].map(([m, kind]) => ({ ms: atMinute(m), kind })).filter((x) => !edge(x.ms));
      const mine = [
        ...events.rises.map((ms) => ({ ms, kind: 'r' as const })),
        ...events.sets.map((ms) => ({ ms, kind: 's' as const })),
      ]
        .filter((x) => !edge(x.ms))
        .sort((a, b) => a.ms - b.ms);
      if (mine.map((x) => x.kind).join('') !== theirs.map((x) => x.kind).join('')) {
        problems.push(`${label(c)}: ours ${mine.map((x) => x.kind).join('')}, astropy ${theirs.map((x) => x.kind).join('')}`);
        continue;
      }
      mine.forEach((x, i) => {
        // Rate of change of the altitude at our crossing, degrees per millisecond.
        const rate = Math.abs(path.offsetAt(x.ms + 30_000, threshold) - path.offsetAt(x.ms - 30_000, threshold)) / 60_000;
        const allowed = Math.max(MINUTE, tolerance / rate);
        const off = Math.abs(x.ms - theirs[i].ms);
        compared += 1;
        if (off > allowed)
          problems.push(`${label(c)}: ${x.kind} ${(off / 1000).toFixed(0)} s apart (allowed ${(allowed / 1000).toFixed(0)} s)`);
      });
    }
    expect(problems).toEqual([]);
    expect(compared).toBeGreaterThan(1000);
  });

  it('places every highest and lowest point within the tolerance of astropy’s', () => {
    const problems: string[] = [];
    for (const c of cases) {
      const { events, night, tolerance } = ours(c);
      for (const [m, kind, offset] of c[4]) {
        const ms = atMinute(m);
        if (ms - night.startMs < 10 * MINUTE || night.endMs - ms < 10 * MINUTE) continue;
        if (c[2] === 'moon' && Math.abs(offset) > MOON_COMPARED_WITHIN_DEG) continue;
        const mine = events.extremes.find(
          (e) => e.kind === (kind === 'h' ? 'highest' : 'lowest') && Math.abs(e.ms - ms) < 60 * MINUTE,
        );
        if (!mine) problems.push(`${label(c)}: no ${kind} near minute ${m}`);
        else if (Math.abs(mine.offsetDeg - offset) > tolerance)
          problems.push(
            `${label(c)}: ${kind} ${mine.offsetDeg.toFixed(4)}° vs astropy ${offset}° (tolerance ${tolerance.toFixed(4)}°)`,
          );
      }
    }
    expect(problems).toEqual([]);
  });

  it(`says "grazes" exactly when the turning point is within ${GRAZE_MARGIN_DEG}° of the altitude (outside the tolerance band)`, () => {
    const problems: string[] = [];
    let grazes = 0;
    for (const c of cases) {
      const { events, night, tolerance } = ours(c);
      for (const [m, kind, offset] of c[4]) {
        const ms = atMinute(m);
        if (ms - night.startMs < 10 * MINUTE || night.endMs - ms < 10 * MINUTE) continue;
        const d = Math.abs(offset);
        if (Math.abs(d - GRAZE_MARGIN_DEG) <= tolerance) continue;
        const graze = events.grazes.find(
          (g) => g.kind === (kind === 'h' ? 'highest' : 'lowest') && Math.abs(g.ms - ms) < 60 * MINUTE,
        );
        const expected = d < GRAZE_MARGIN_DEG;
        if (expected) grazes += 1;
        if (Boolean(graze) !== expected)
          problems.push(`${label(c)}: ${kind} at ${offset}° ${expected ? 'not marked' : 'marked'} as grazing`);
        else if (graze && d > tolerance && graze.crosses !== (kind === 'h' ? offset > 0 : offset <= 0))
          problems.push(`${label(c)}: ${kind} at ${offset}°: crosses is ${graze.crosses}`);
      }
    }
    expect(problems).toEqual([]);
    expect(grazes).toBeGreaterThan(10);
  });

  it('never says a twilight ends without saying it begins again, and the darkness agrees with the lowest Sun', () => {
    const problems: string[] = [];
    const nights = new Map<string, Case>();
    for (const c of cases) if (c[2] in SUN_ALTITUDES) nights.set(`${c[0]}:${c[1]}`, c);
    for (const c of nights.values()) {
      const n = nightOf(c);
      const sun = sunNight(n.observer, n.startMs, n.endMs, ephemeris, n.timeZone, n.localDate);
      const pairs = [
        ['sunset', sun.sun.sunset, sun.sun.sunrise],
        ['civil', sun.sun.civilDusk, sun.sun.civilDawn],
        ['nautical', sun.sun.nauticalDusk, sun.sun.nauticalDawn],
        ['astronomical', sun.sun.astronomicalDusk, sun.sun.astronomicalDawn],
      ] as const;
      for (const [name, dusk, dawn] of pairs) {
        // Where polar day or night begins or ends, one crossing only is right; otherwise both carry one state.
        if (dusk.state !== dawn.state && (dusk.utc === null) === (dawn.utc === null))
          problems.push(`${label(c)}: ${name} dusk ${dusk.state}, dawn ${dawn.state}`);
      }
      const low = sun.sun.darkness.lowestSunAltitudeDeg;
      const kind = sun.sun.darkness.kind;
      if (kind === 'astronomical' && !(low < -18)) problems.push(`${label(c)}: astronomical darkness with the Sun at ${low}°`);
      if (kind === 'astronomical' && sun.sun.astronomicalDusk.utc === null)
        problems.push(`${label(c)}: darkness without its start`);
      if (kind === 'nautical' && !(low >= -18 && low < -12)) problems.push(`${label(c)}: nautical with the Sun at ${low}°`);
    }
    expect(problems).toEqual([]);
  });
});
