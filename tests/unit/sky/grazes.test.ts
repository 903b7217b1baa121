/**
 * Nights on which a body only just crosses, or only just misses, an altitude: the sky says "grazes"
 * and both ends of the night agree. The nights and the astropy altitudes quoted come from the edges
 * fixture (tests/reference/sky/edges-fixture.json, astropy 5.2.1 built-in ephemeris).
 */
import { describe, expect, it } from 'vitest';
import { darkFrom } from '../../../server/services/publishing/feed-sky.ts';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';

const at50 = { latitude: 50, longitude: 14.4, elevationM: 0, timeZone: 'Europe/Prague', now: 0 };
const at70 = { latitude: 70, longitude: 23.7, elevationM: 0, timeZone: 'Europe/Oslo', now: 0 };

describe('the Sun at the edge of astronomical darkness, 50° N', () => {
  it('2025-05-31: lowest 0.05° short of −18° (astropy: −17.948°): no darkness, said as a near miss at both ends', () => {
    const { sun } = computeSkyTonight({ ...at50, localDate: '2025-05-31' });
    for (const e of [sun.astronomicalDusk, sun.astronomicalDawn]) {
      expect(e).toMatchObject({ state: 'grazes', utc: null, local: null });
      expect(e.graze).toMatchObject({ crosses: false, marginDeg: 0.1 });
      expect(e.graze!.pastDeg).toBeCloseTo(-0.05, 1);
      expect(e.text).toMatch(
        /^No astronomical (darkness|dawn): the Sun is lowest 17\.9\d° below the horizon at 01:\d\d tomorrow, within 0\.0\d° of 18°$/,
      );
    }
    expect(sun.darkness).toMatchObject({ kind: 'nautical', grazes: true });
    expect(sun.darkness.text).toMatch(
      /^No astronomical darkness tonight: .* Only just: the Sun is lowest 17\.9\d° below the horizon/,
    );
    expect(sun.nauticalDusk.state).toBe('occurs');
  });

  it('2025-07-11: 0.04° past −18° (astropy: −18.037°): darkness only just, dusk and dawn both timed and both "grazes"', () => {
    const sky = computeSkyTonight({ ...at50, localDate: '2025-07-11' });
    const { sun } = sky;
    for (const e of [sun.astronomicalDusk, sun.astronomicalDawn]) {
      expect(e.state).toBe('grazes');
      expect(e.utc).not.toBeNull();
      expect(e.graze!.crosses).toBe(true);
      expect(e.text).toMatch(
        /^0\d:\d\d tomorrow \(only just: the Sun is lowest 18\.0\d° below the horizon, at 01:\d\d tomorrow\)$/,
      );
    }
    expect(Date.parse(sun.astronomicalDawn.utc!) - Date.parse(sun.astronomicalDusk.utc!)).toBeLessThan(90 * 60_000);
    expect(sun.darkness).toMatchObject({ kind: 'astronomical', grazes: true });
    expect(darkFrom(sky)).toMatch(/^fully dark only just, from 0\d:\d\d tomorrow$/);
  });
});

describe('at 70° N', () => {
  it('2025-12-23: the Moon clears its rising altitude by under 0.01° (astropy: 0.008°): it rises and sets, only just', () => {
    const { moon } = computeSkyTonight({ ...at70, localDate: '2025-12-23' });
    expect(moon.times.state).toBe('rises-and-sets');
    const [rise, set] = [moon.times.rise, moon.times.set];
    for (const e of [rise, set]) {
      expect(e.state).toBe('grazes');
      expect(e.text).toMatch(/\(only just: at most 0\.0\d° above the horizon, at \d\d:\d\d( tomorrow)?\)$/);
    }
    expect(Date.parse(set.utc!) - Date.parse(rise.utc!)).toBeLessThan(3 * 60 * 60_000);
  });

  it('2025-11-24: the Sun’s upper edge comes within 0.003° of the horizon at noon (astropy: −0.0024°): whichever side, it grazes', () => {
    const { sun } = computeSkyTonight({ ...at70, localDate: '2025-11-24' });
    const grazing = [sun.sunset, sun.sunrise].filter((e) => e.state === 'grazes');
    expect(grazing.length).toBeGreaterThan(0);
    for (const e of grazing) expect(Math.abs(e.graze!.pastDeg)).toBeLessThan(0.02);
  });

  it('2025-05-29: Uranus stays 0.07° above its setting altitude (astropy: 0.0714°): circumpolar, with the near miss in words', () => {
    const { planets } = computeSkyTonight({ ...at70, localDate: '2025-05-29' });
    const uranus = planets.find((p) => p.id === 'uranus')!;
    expect(uranus.times.state).toBe('always-up');
    expect(uranus.times.set).toMatchObject({ state: 'grazes', utc: null });
    expect(uranus.times.set.text).toMatch(/^Does not set: comes within 0\.0\d° of the horizon at \d\d:\d\d( tomorrow)?$/);
    expect(uranus.times.summary).toMatch(/It comes within 0\.0\d° of the horizon at .* without setting\.$/);
  });
});
