/** `sky_tonight` on the calculation contract: the venue's sky by script, and hostile inputs refused in words. */
import { describe, expect, it } from 'vitest';
import { answer, answerLine } from '../../../shared/contract/calculate.ts';
import { ContractResultSchema, SkyTonightSuccessSchema } from '../../../shared/schemas/calc.ts';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';

const NOW = Date.UTC(2026, 11, 3, 9);
const demo = { latitude: 54.62, longitude: -2.95, elevation_m: 160, time_zone: 'Europe/London', night: '2026-11-20' };
const ask = (inputs: Record<string, unknown>, extra: Record<string, unknown> = {}) =>
  answer({ quantity: 'sky_tonight', inputs, ...extra }, NOW);

function failure(inputs: Record<string, unknown>, extra: Record<string, unknown> = {}) {
  const r = ask(inputs, extra);
  if (!('error' in r)) throw new Error('expected an error');
  expect(ContractResultSchema.safeParse(r).success).toBe(true);
  return r.error;
}

describe('sky_tonight', () => {
  it('returns exactly what a venue at that place gets for that night, and echoes the id', () => {
    const r = SkyTonightSuccessSchema.parse(answer({ id: 'corrie', quantity: 'sky_tonight', inputs: demo }, NOW));
    expect(r.id).toBe('corrie');
    const venue = computeSkyTonight({
      latitude: demo.latitude,
      longitude: demo.longitude,
      elevationM: demo.elevation_m,
      timeZone: demo.time_zone,
      localDate: demo.night,
      now: NOW,
    });
    expect(r.sky).toEqual(JSON.parse(JSON.stringify(venue)));
  });

  it('gives every event its state and its UTC and local ISO times for the same instant', () => {
    const { sky } = SkyTonightSuccessSchema.parse(ask(demo));
    const events = [...Object.values(sky.sun).filter((e) => 'state' in e), sky.moon.times.rise, sky.moon.times.set];
    for (const p of sky.planets) events.push(p.times.rise, p.times.transit, p.times.set);
    for (const e of events) {
      if (!('state' in e) || !('utc' in e)) continue;
      if (e.utc === null) {
        expect(e.state).not.toBe('occurs');
        expect(e.local).toBeNull();
        continue;
      }
      // November in London: GMT, offset +00:00 (tz database).
      expect(e.local).toMatch(/^2026-11-2[01]T\d\d:\d\d:\d\d\+00:00$/);
      expect(Math.abs(Date.parse(e.local!) - Date.parse(e.utc))).toBeLessThanOrEqual(500);
    }
    for (const p of sky.planets) {
      expect(p.distanceKm / p.distanceAu).toBeCloseTo(149_597_870.7, 3);
      expect(p.lightTimeSeconds).toBeCloseTo(p.distanceKm / 299_792.458, 6);
    }
  });

  it('takes elevation as 0 m when it is left out', () => {
    const { elevation_m: _, ...rest } = demo;
    const r = SkyTonightSuccessSchema.parse(ask(rest));
    expect(r.sky.observer.elevationM).toBe(0);
  });

  it('answers on the command line too, one line per request', () => {
    const r = answerLine(JSON.stringify({ id: 7, quantity: 'sky_tonight', inputs: demo }));
    expect(SkyTonightSuccessSchema.parse(r).id).toBe(7);
  });
});

describe('sky_tonight refuses hostile input in words', () => {
  it('a time zone nobody knows', () => {
    expect(failure({ ...demo, time_zone: 'Mars/Olympus_Mons' })).toEqual({
      code: 'invalid_input',
      message: 'time_zone: "Mars/Olympus_Mons" is not a time zone this system knows; use an IANA name such as Europe/London.',
    });
  });

  it('latitude 91°', () => {
    expect(failure({ ...demo, latitude: 91 })).toEqual({
      code: 'out_of_range',
      message: 'latitude: Latitude must be a number of degrees from −90 (south pole) to 90 (north pole). (got 91)',
    });
  });

  it.each([
    ['2026-02-30', /night: The date must be a real calendar date written YYYY-MM-DD/],
    ['30/11/2026', /real calendar date written YYYY-MM-DD/],
    ['1700-01-01', /between 1800 and 2200/],
  ])('a date that is no date: %s', (night, message) => {
    const err = failure({ ...demo, night });
    expect(err.code).toBe('invalid_input');
    expect(err.message).toMatch(message);
  });

  it.each([
    [{ ...demo, latitude: '54.6' }, 'invalid_input', /latitude must be a finite number \(got "54.6"\)/],
    [{ ...demo, longitude: 181 }, 'out_of_range', /longitude: Longitude must be .* −180 to 180/],
    [{ ...demo, elevation_m: 20_000 }, 'out_of_range', /elevation_m: Elevation must be/],
    [{ latitude: 50, longitude: 0, time_zone: 'UTC' }, 'missing_input', /night is required for sky_tonight/],
    [{ ...demo, z: 1 }, 'invalid_input', /"z" is not a known field of the inputs of sky_tonight/],
    [{ ...demo, night: 20261120 }, 'invalid_input', /night must be the evening’s local date written YYYY-MM-DD/],
  ])('%j → %s', (inputs, code, message) => {
    const err = failure(inputs);
    expect(err.code).toBe(code);
    expect(err.message).toMatch(message);
  });

  it('no inputs, or a cosmology model it has no use for', () => {
    expect(answer({ quantity: 'sky_tonight' }, NOW)).toMatchObject({ error: { code: 'missing_input' } });
    expect(failure(demo, { model: { preset: 'planck18' } }).message).toMatch(
      /"model" is not a known field of a sky_tonight request/,
    );
  });

  it('polar night at 78° N: a right answer, in words, not an error', () => {
    const { sky } = SkyTonightSuccessSchema.parse(
      ask({ latitude: 78.22, longitude: 15.65, time_zone: 'Arctic/Longyearbyen', night: '2026-12-21' }),
    );
    // At 78.2° N on the December solstice (δ = −23.4°) the Sun culminates at 90° − φ + δ ≈ −11.6° and is
    // lowest at φ + δ − 90° ≈ −35.2° (the culmination formulas, common practice).
    expect(sky.sun.darkness.kind).toBe('astronomical');
    expect(sky.sun.darkness.lowestSunAltitudeDeg).toBeCloseTo(-35.2, 0);
    expect(sky.sun.sunrise).toMatchObject({ state: 'none', utc: null, local: null, text: 'The Sun does not rise (polar night)' });
    expect(sky.sun.civilDawn.text).toBe('No civil dawn: the Sun stays more than 6° below the horizon all day');
    expect(sky.sun.nauticalDawn.state).toBe('occurs');
    // The Sun climbs above −12° around noon only: the positions are given as nautical twilight ends, early in the afternoon.
    expect(sky.observation.basis).toBe('nautical-dusk');
  });
});
