/** Bad input and the polar cases: errors in words, and words instead of missing or wrong times. */
import { describe, expect, it } from 'vitest';
import { SkyInputError } from '../../../shared/sky/errors.ts';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';

const base = { latitude: 51.48, longitude: 0, elevationM: 0, timeZone: 'Europe/London', localDate: '2026-01-15', now: 0 };

function refusal(change: Record<string, unknown>): SkyInputError {
  try {
    computeSkyTonight({ ...base, ...change } as never);
  } catch (err) {
    if (err instanceof SkyInputError) return err;
    throw err;
  }
  throw new Error('expected a refusal');
}

/** Every number in the result is finite: no NaN or Infinity leaks into JSON. */
function assertFinite(value: unknown, path = 'sky'): void {
  if (typeof value === 'number') expect(Number.isFinite(value), path).toBe(true);
  else if (Array.isArray(value))
    value.forEach((v, i) => {
      assertFinite(v, `${path}[${i}]`);
    });
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) assertFinite(v, `${path}.${k}`);
}

describe('refuses bad input in words', () => {
  it.each([
    [{ latitude: 91 }, 'latitude', /−90/],
    [{ latitude: Number.NaN }, 'latitude', /−90/],
    [{ longitude: -180.01 }, 'longitude', /−180 to 180/],
    [{ elevationM: 20_000 }, 'elevationM', /metres/],
    [{ timeZone: 'Europe/Atlantis' }, 'timeZone', /not a time zone/],
    [{ timeZone: '' }, 'timeZone', /not a time zone/],
    [{ localDate: '2026-02-29' }, 'localDate', /real calendar date/],
    [{ localDate: '15/01/2026' }, 'localDate', /YYYY-MM-DD/],
    [{ observeAt: '9pm' }, 'observeAt', /HH:MM/],
    [{ now: Number.NaN }, 'now', /current time/],
  ])('%j → %s', (change, field, message) => {
    const err = refusal(change);
    expect(err.field).toBe(field);
    expect(err.message).toMatch(message);
  });
});

describe('polar cases are said in words', () => {
  it('north pole at midsummer: every planet circumpolar or never rising, the Sun does not set', () => {
    const sky = computeSkyTonight({ ...base, latitude: 90, timeZone: 'UTC', localDate: '2026-06-21' });
    assertFinite(sky);
    expect(sky.sun.sunset).toEqual({
      state: 'none',
      utc: null,
      local: null,
      localDate: null,
      localTime: null,
      text: 'The Sun does not set tonight (midnight sun)',
      graze: null,
    });
    expect(sky.sun.darkness.kind).toBe('no-night');
    expect(sky.observation.basis).toBe('sun-lowest');
    for (const p of sky.planets) {
      // At the pole altitude equals declination: up when above the −0.5667° standard altitude.
      expect(p.times.state).toBe(p.declinationDeg > -0.5667 ? 'always-up' : 'always-down');
      expect(p.times.summary).toMatch(/all day and night/);
      expect(p.direction).toBe('south');
      expect(p.visibility).toBe('The sky does not get dark tonight.');
    }
  });

  it('south pole at midsummer in the north (polar night there): dark all day, no sunrise, in words', () => {
    const sky = computeSkyTonight({ ...base, latitude: -90, timeZone: 'Antarctica/McMurdo', localDate: '2026-06-21' });
    assertFinite(sky);
    expect(sky.sun.darkness.kind).toBe('dark-all-day');
    expect(sky.sun.sunrise.text).toMatch(/does not rise/);
    expect(sky.sun.astronomicalDusk.text).toMatch(/more than 18° below/);
    for (const p of sky.planets) expect(p.times.state).toBe(-p.declinationDeg > -0.5667 ? 'always-up' : 'always-down');
  });

  it('far north in summer: no astronomical darkness is reported as such, never as a time', () => {
    // At 53.5° N the midsummer Sun gets only about 13° below the horizon.
    const sky = computeSkyTonight({ ...base, latitude: 53.5, longitude: -2.2, localDate: '2026-06-21' });
    expect(sky.sun.sunset.utc).not.toBeNull();
    expect(sky.sun.astronomicalDusk.utc).toBeNull();
    expect(sky.sun.astronomicalDusk.text).toMatch(/No astronomical darkness: the Sun stays less than 18° below the horizon/);
    expect(sky.sun.darkness.kind).toBe('nautical');
    expect(sky.observation.basis).toBe('nautical-dusk');
  });

  it('at 78° N in midsummer a planet far south of the equator never rises, one far north never sets', () => {
    const sky = computeSkyTonight({
      ...base,
      latitude: 78.22,
      longitude: 15.65,
      timeZone: 'Arctic/Longyearbyen',
      localDate: '2026-06-21',
    });
    for (const p of sky.planets) {
      // Rises and sets only when |δ| < 90° − φ (allowing for the −0.57° standard altitude).
      if (p.declinationDeg > 90 - 78.22 + 0.6) expect(p.times.state).toBe('always-up');
      if (p.declinationDeg < -(90 - 78.22) - 0.6) expect(p.times.state).toBe('always-down');
      if (p.times.state !== 'rises-and-sets') {
        expect(p.times.rise.utc).toBeNull();
        expect(p.times.rise.text.length).toBeGreaterThan(10);
      }
    }
  });

  it('the same input gives the same output (nothing reads the clock)', () => {
    const a = computeSkyTonight({ ...base, now: Date.UTC(2026, 0, 1) });
    const b = computeSkyTonight({ ...base, now: Date.UTC(2026, 0, 1) });
    expect(JSON.stringify(a)).toBe(JSON.stringify(b));
    expect(a.computedAt).toBe('2026-01-01T00:00:00.000Z');
  });
});
