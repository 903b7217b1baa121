/**
 * Worked examples from Meeus, Astronomical Algorithms (2nd ed., Willmann-Bell 1998). The expected
 * numbers are recalled from memory of the book, not read from it now; tolerances allow for the book
 * using truncated VSOP87 series (Appendix III) where we use the full ones.
 */
import { describe, expect, it } from 'vitest';
import { vsop87 } from '../../../shared/sky/bodies.ts';
import { Ephemeris } from '../../../shared/sky/ephemeris.ts';
import { toHorizontal } from '../../../shared/sky/horizon.ts';
import { moonPhase } from '../../../shared/sky/moon-phase.ts';
import { riseTransitSet } from '../../../shared/sky/rise-set.ts';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';

const D = 180 / Math.PI;
const hms = (h: number, m: number, s: number) => (h + m / 60 + s / 3600) * 15;
const dms = (sign: 1 | -1, d: number, m: number, s: number) => sign * (d + m / 60 + s / 3600);
const ARCSEC = 1 / 3600;

describe('Meeus worked examples (recalled from memory)', () => {
  it('Example 32.a: heliocentric Venus, 1992 December 20 0h TD', () => {
    // recalled from memory: L = 26.11428°, B = −2.62070°, R = 0.724603 au (truncated series).
    const p = vsop87('venus').position(2_448_976.5);
    expect(Math.abs(p.lon * D - 26.11428)).toBeLessThan(0.0003);
    expect(Math.abs(p.lat * D - -2.6207)).toBeLessThan(0.0002);
    expect(Math.abs(p.range - 0.724603)).toBeLessThan(2e-6);
  });

  it('Example 33.a: apparent Venus, 1992 December 20 0h TD', () => {
    // recalled from memory: α = 21h04m41.454s, δ = −18°53′16.84″, Δ = 0.910947 au, τ = 0.0052612 d.
    const v = new Ephemeris().planet('venus', 2_448_976.5);
    expect(Math.abs(v.ra * D - hms(21, 4, 41.454))).toBeLessThan(1 * ARCSEC * 15);
    expect(Math.abs(v.dec * D - dms(-1, 18, 53, 16.84))).toBeLessThan(1 * ARCSEC);
    expect(Math.abs(v.distanceAu - 0.910947)).toBeLessThan(3e-6);
    expect(Math.abs(v.lightTimeDays - 0.0052612)).toBeLessThan(2e-7);
  });

  it('Example 25.b: apparent Sun by VSOP87, 1992 October 13 0h TD', () => {
    // recalled from memory: α = 13h13m30.749s, δ = −7°47′01.74″, R = 0.99760775 au.
    const s = new Ephemeris().sun(2_448_908.5);
    expect(Math.abs(s.ra * D - hms(13, 13, 30.749))).toBeLessThan(0.1 * ARCSEC * 15);
    expect(Math.abs(s.dec * D - dms(-1, 7, 47, 1.74))).toBeLessThan(0.5 * ARCSEC);
    expect(Math.abs(s.distanceAu - 0.99760775)).toBeLessThan(2e-6);
  });

  it('Example 25.a: the Sun by the low-accuracy method agrees within its stated 0.01°', () => {
    // recalled from memory: apparent α = 198.38083°, δ = −7.78507° (low accuracy, 1992 October 13 0h TD).
    const s = new Ephemeris().sun(2_448_908.5);
    expect(Math.abs(s.ra * D - 198.38083)).toBeLessThan(0.01);
    expect(Math.abs(s.dec * D - -7.78507)).toBeLessThan(0.01);
  });

  it('Example 13.b: altitude and azimuth of Venus from Washington, 1987 April 10 19:21 UT', () => {
    // recalled from memory: A = 68.0337° (from the south), h = 15.1249°.
    const ra = hms(23, 9, 16.641) / D;
    const dec = dms(-1, 6, 43, 11.61) / D;
    const observer = { latitude: dms(1, 38, 55, 17), longitude: -dms(1, 77, 3, 56), elevationM: 0 };
    const h = toHorizontal(ra, dec, observer, 2_446_896.30625);
    expect(h.altitudeDeg).toBeCloseTo(15.1249, 3);
    expect(h.azimuthDeg).toBeCloseTo(68.0337 + 180, 3);
  });

  it('Example 15.a: rise, transit and set of Venus at Boston, 1988 March 20 (the book’s inputs)', () => {
    // recalled from memory: inputs as printed; results m1 = 0.51766, m0 = 0.81980, m2 = 0.12130,
    // i.e. rising 12h25m UT, transit 19h41m UT, setting 2h55m UT.
    const r = riseTransitSet({
      latitude: 42.3333,
      longitude: -71.0833,
      theta0Deg: 177.74208,
      deltaTSec: 56,
      h0Deg: -0.5667,
      ra: [40.68021, 41.73129, 42.78204],
      dec: [18.04761, 18.44092, 18.82742],
    });
    if (r.kind !== 'rises-and-sets') throw new Error(r.kind);
    expect(r.rise).toBeCloseTo(0.51766, 4);
    expect(r.transit).toBeCloseTo(0.8198, 4);
    expect(r.set).toBeCloseTo(0.1213, 4);
  });

  it('Example 15.a end to end: our own Venus positions give the same times within a minute', () => {
    // Boston keeps EST (UTC−5) in March 1988: rise 12h25m UT = 07:25, transit 19h41m UT = 14:41.
    // Venus was an evening star: up at noon on the 19th and still up after sunset, so the night's
    // stay is the one under way, and the book's rise (07:25 on the 20th) is the next rise after it.
    const sky = computeSkyTonight({
      latitude: 42.3333,
      longitude: -71.0833,
      elevationM: 0,
      timeZone: 'America/New_York',
      localDate: '1988-03-19',
      now: 0,
    });
    const venus = sky.planets.find((p) => p.id === 'venus')!;
    const minutesOff = (utc: string | null, hh: number, mm: number, day: number) =>
      Math.abs((Date.parse(utc!) - Date.UTC(1988, 2, day, hh, mm)) / 60_000);
    expect(minutesOff(venus.times.laterRise!.utc, 12, 25, 20)).toBeLessThanOrEqual(1.5);
    expect(venus.times.laterRise!.text).toBe('07:25 tomorrow');
    expect(venus.times.rise.text).toBe('Up at noon');
  });

  it('Example 48.a: the Moon’s illuminated fraction, 1992 April 12 0h TD', () => {
    // recalled from memory: i = 69.0756°, k = 0.6786; Moon α = 134.6885°, δ = 13.7684°, Δ = 368410 km.
    const e = new Ephemeris();
    const moon = e.moon(2_448_724.5);
    const phase = moonPhase(moon, e.sun(2_448_724.5));
    expect(phase.phaseAngleDeg).toBeCloseTo(69.0756, 2);
    // Meeus Example 48.a, geocentric elongation ψ = 110.7929° (recalled from memory): an angle on the sky.
    expect(phase.elongationDeg).toBeCloseTo(110.7929, 2);
    expect(phase.illuminatedFraction).toBeCloseTo(0.6786, 3);
    expect(phase.waxing).toBe(true);
    expect(moon.ra * D).toBeCloseTo(134.6885, 3);
    expect(moon.dec * D).toBeCloseTo(13.7684, 3);
    expect(moon.distanceAu * 149_597_870.7).toBeCloseTo(368_410, -1);
  });
});
