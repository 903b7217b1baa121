/**
 * Rise, transit and set come from one stay above the horizon: a planet already up at noon that
 * sets in the afternoon is not shown as "rises 22:48, sets 13:44". Checked at the demo venue
 * (Corrie Vale, 54.62° N 2.95° W) against the body's own altitude, not against remembered times.
 */
import { describe, expect, it } from 'vitest';
import { DEG } from '../../../shared/sky/angles.ts';
import { altitudeAt, type Trackable } from '../../../shared/sky/body-track.ts';
import type { PlanetId } from '../../../shared/sky/bodies.ts';
import { Ephemeris } from '../../../shared/sky/ephemeris.ts';
import { riseTransitSetTimes } from '../../../shared/sky/events.ts';
import { STANDARD_ALTITUDE } from '../../../shared/sky/rise-set.ts';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';
import type { RiseTransitSetTimes } from '../../../shared/sky/types.ts';

const venue = { latitude: 54.62, longitude: -2.95, elevationM: 160, timeZone: 'Europe/London', now: 0 };
const observer = { latitude: venue.latitude, longitude: venue.longitude, elevationM: venue.elevationM };
const ephemeris = new Ephemeris();
const track = (id: PlanetId): Trackable => ({
  placeAt: (jde) => {
    const p = ephemeris.planet(id, jde);
    return { raDeg: p.ra / DEG, decDeg: p.dec / DEG };
  },
  h0Deg: () => STANDARD_ALTITUDE.planet,
});
const ms = (iso: string | null) => Date.parse(iso!);
const MINUTE = 60_000;
const up = (id: PlanetId, t: number) => altitudeAt(observer, t, track(id)).altitudeDeg > STANDARD_ALTITUDE.planet;

/** True when the planet is up (or down) at every ten minutes strictly inside (from, to). */
function staysThroughout(id: PlanetId, from: number, to: number, wantUp: boolean): boolean {
  for (let t = from + 5 * MINUTE; t < to - 5 * MINUTE; t += 10 * MINUTE) if (up(id, t) !== wantUp) return false;
  return true;
}

function expectOneStay(times: RiseTransitSetTimes) {
  const [rise, transit, set] = [ms(times.rise.utc), ms(times.transit.utc), ms(times.set.utc)];
  expect(rise).toBeLessThan(transit);
  expect(transit).toBeLessThan(set);
  expect(set - rise).toBeLessThan(24 * 60 * MINUTE);
}

describe('the night of 2026-11-20 at the demo venue', () => {
  const sky = computeSkyTonight({ ...venue, localDate: '2026-11-20' });
  const mars = sky.planets.find((p) => p.id === 'mars')!;

  it('Mars is up at noon and sets in the afternoon, then rises late in the evening', () => {
    const earlier = ms(mars.times.earlierSet!.utc);
    const rise = ms(mars.times.rise.utc);
    expect(up('mars', ms(sky.window.startUtc))).toBe(true);
    expect(earlier).toBeGreaterThan(ms(sky.window.startUtc));
    expect(mars.times.earlierSet!.localDate).toBe('2026-11-20');
    expect(Number(mars.times.earlierSet!.localTime!.slice(0, 2))).toBeGreaterThanOrEqual(12);
    expect(Number(mars.times.earlierSet!.localTime!.slice(0, 2))).toBeLessThan(18);
    expect(staysThroughout('mars', earlier, rise, false)).toBe(true);
  });

  it('its set shown is the first after the rise shown, after noon tomorrow, with its own transit between', () => {
    expectOneStay(mars.times);
    const [rise, set] = [ms(mars.times.rise.utc), ms(mars.times.set.utc)];
    expect(set).toBeGreaterThan(ms(sky.window.endUtc));
    expect(mars.times.set.text).toMatch(/^\d\d:\d\d tomorrow$/);
    expect(staysThroughout('mars', rise, set, true)).toBe(true);
    expect(up('mars', rise - 10 * MINUTE)).toBe(false);
    expect(up('mars', set + 10 * MINUTE)).toBe(false);
    const transit = ms(mars.times.transit.utc);
    const altitude = (t: number) => altitudeAt(observer, t, track('mars')).altitudeDeg;
    expect(altitude(transit)).toBeGreaterThan(altitude(transit - 30 * MINUTE));
    expect(altitude(transit)).toBeGreaterThan(altitude(transit + 30 * MINUTE));
  });

  it('the sentence tells the afternoon set apart instead of pairing it with the rise', () => {
    const t = mars.times;
    expect(t.summary).toBe(
      `Above the horizon at noon and sets ${t.earlierSet!.text}; rises again ${t.rise.text}, highest ${t.transit.text}, sets ${t.set.text}.`,
    );
  });

  it('every planet and the Moon: rise before transit before set, and a set before the rise only as earlierSet', () => {
    for (const body of [...sky.planets, { id: 'moon', times: sky.moon.times }]) {
      expect(body.times.state, body.id).toBe('rises-and-sets');
      expectOneStay(body.times);
      if (body.times.earlierSet) expect(ms(body.times.earlierSet.utc), body.id).toBeLessThan(ms(body.times.rise.utc));
      else expect(body.times.summary, body.id).toMatch(/^Rises /);
    }
  });

  it('a planet down at noon (Saturn rises in the afternoon) has no earlier set and the plain sentence', () => {
    const saturn = sky.planets.find((p) => p.id === 'saturn')!;
    expect(up('saturn', ms(sky.window.startUtc))).toBe(false);
    expect(saturn.times.earlierSet).toBeNull();
    expect(saturn.times.summary).toBe(
      `Rises ${saturn.times.rise.text}, highest ${saturn.times.transit.text}, sets ${saturn.times.set.text}.`,
    );
  });
});

describe('other nights at the demo venue', () => {
  it('an evening planet (Saturn on 2027-01-10), up at noon and still up at sunset, shows tonight’s set, not tomorrow’s stay', () => {
    const sky = computeSkyTonight({ ...venue, localDate: '2027-01-10' });
    const saturn = sky.planets.find((p) => p.id === 'saturn')!;
    const set = ms(saturn.times.set.utc);
    expect(saturn.times.earlierSet).toBeNull();
    expect(saturn.times.rise).toMatchObject({ utc: null, text: 'Up at noon' });
    expect(set).toBeGreaterThan(ms(sky.sun.nauticalDusk.utc));
    expect(saturn.times.set.localDate).toBe('2027-01-10');
    expect(staysThroughout('saturn', ms(sky.window.startUtc), set, true)).toBe(true);
    // The next rise is told apart, after the set and not paired with it.
    const later = ms(saturn.times.laterRise!.utc);
    expect(later).toBeGreaterThan(ms(sky.sun.sunrise.utc));
    expect(staysThroughout('saturn', set, later, false)).toBe(true);
    expect(saturn.times.summary).toMatch(
      new RegExp(`^Above the horizon at noon.*, sets ${saturn.times.set.text}; rises again ${saturn.times.laterRise!.text}\\.$`),
    );
    expect(saturn.upAfterDusk).toBe(true);
    expect(saturn.visibility).toMatch(
      new RegExp(`^\\d+° up in the [a-z-]+ at ${sky.observation.localTime}; sets ${saturn.times.set.text}\\.$`),
    );
  });

  it('the visibility words name a set only when it comes before dawn (2026-11-20: Saturn yes, Uranus no)', () => {
    const sky = computeSkyTonight({ ...venue, localDate: '2026-11-20' });
    const [saturn, uranus] = ['saturn', 'uranus'].map((id) => sky.planets.find((p) => p.id === id)!);
    expect(ms(saturn.times.set.utc)).toBeLessThan(ms(sky.sun.nauticalDawn.utc));
    expect(saturn.visibility).toMatch(new RegExp(`; sets ${saturn.times.set.text}\\.$`));
    expect(ms(uranus.times.set.utc)).toBeGreaterThan(ms(sky.sun.nauticalDawn.utc));
    expect(uranus.aboveHorizon).toBe(true);
    expect(uranus.visibility).not.toMatch(/sets/);
  });

  it('a Moon that does not rise in the window keeps the stay it is in at noon (2026-11-12)', () => {
    const { moon, window } = computeSkyTonight({ ...venue, localDate: '2026-11-12' });
    expect(moon.times.rise.utc).toBeNull();
    expect(moon.times.earlierSet).toBeNull();
    expect(ms(moon.times.transit.utc)).toBeGreaterThan(ms(window.startUtc));
    expect(ms(moon.times.transit.utc)).toBeLessThan(ms(moon.times.set.utc));
    expect(moon.times.summary).toBe(
      `Above the horizon at noon, highest ${moon.times.transit.text}, sets ${moon.times.set.text}; does not rise again before noon tomorrow.`,
    );
  });
});

describe('words for a stay that cannot be given in full', () => {
  const start = Date.UTC(2026, 10, 20, 12);
  const words = (visit: Parameters<typeof riseTransitSetTimes>[0]) =>
    riseTransitSetTimes(visit, 'rises-and-sets', 'Europe/London', '2026-11-20');
  const base = {
    rise: null,
    transit: null,
    set: null,
    earlierSet: null,
    laterRise: null,
    transitsKnown: true,
    searchedToMs: start + 48 * 60 * MINUTE,
  };

  it('up at noon and past its highest: "Highest before noon", not a time from another stay', () => {
    const t = words({ ...base, set: start + 3 * 60 * MINUTE });
    expect(t.transit).toMatchObject({ utc: null, text: 'Highest before noon' });
    expect(t.summary).toBe('Above the horizon at noon, sets 15:00; does not rise again before noon tomorrow.');
  });

  it('rises but is not seen to set: says how far it was followed', () => {
    const t = words({ ...base, rise: start + 6 * 60 * MINUTE, transit: start + 14 * 60 * MINUTE });
    expect(t.set).toMatchObject({ utc: null, text: 'Does not set before noon on 2026-11-22' });
    expect(t.summary).toBe('Rises 18:00, highest 02:00 tomorrow; does not set before noon on 2026-11-22.');
  });

  it('where transits cannot be placed (a geographic pole) the old words stay', () => {
    const t = words({ ...base, rise: start + 60 * MINUTE, set: start + 5 * 60 * MINUTE, transitsKnown: false });
    expect(t.transit.text).toBe('No transit between noon today and noon tomorrow');
    expect(t.summary).toBe('Rises 13:00, sets 17:00.');
  });
});
