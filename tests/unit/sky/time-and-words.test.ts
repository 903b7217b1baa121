/** Time zones through Intl, compass words, phase names and the shape of an ordinary night. */
import { describe, expect, it } from 'vitest';
import { compassPoint, formatDeclination, formatRightAscension } from '../../../shared/sky/angles.ts';
import { Ephemeris } from '../../../shared/sky/ephemeris.ts';
import { moonPhase, phaseName } from '../../../shared/sky/moon-phase.ts';
import { canonicalTimeZone, localDateOf, localTimeOf, localToMs, nightDateAt } from '../../../shared/sky/time-zone.ts';
import { computeSkyTonight } from '../../../shared/sky/tonight.ts';

describe('time zones', () => {
  it('converts local clock times to instants across offsets (common practice: tz database offsets)', () => {
    expect(new Date(localToMs('2026-07-01', 21 * 60, 'Europe/London')).toISOString()).toBe('2026-07-01T20:00:00.000Z');
    expect(new Date(localToMs('2026-01-01', 21 * 60, 'Europe/London')).toISOString()).toBe('2026-01-01T21:00:00.000Z');
    expect(new Date(localToMs('2026-01-01', 12 * 60, 'Asia/Kolkata')).toISOString()).toBe('2026-01-01T06:30:00.000Z');
    expect(new Date(localToMs('2026-01-01', 12 * 60, 'Pacific/Chatham')).toISOString()).toBe('2025-12-31T22:15:00.000Z');
  });

  it('handles the skipped and the repeated hour of a clock change', () => {
    // 2026-03-29 01:30 does not exist in London; 2026-10-25 01:30 happens twice.
    const skipped = localToMs('2026-03-29', 90, 'Europe/London');
    expect(localTimeOf(skipped, 'Europe/London')).toBe('02:30');
    const repeated = localToMs('2026-10-25', 90, 'Europe/London');
    expect(new Date(repeated).toISOString()).toBe('2026-10-25T00:30:00.000Z');
  });

  it('names the night in progress: before 06:00 it is the previous evening’s', () => {
    expect(nightDateAt(Date.UTC(2026, 4, 10, 2), 'Europe/London')).toBe('2026-05-09');
    expect(nightDateAt(Date.UTC(2026, 4, 10, 9), 'Europe/London')).toBe('2026-05-10');
    expect(localDateOf(Date.UTC(2026, 4, 10, 23), 'Pacific/Auckland')).toBe('2026-05-11');
  });

  it('knows real zone names and no others', () => {
    expect(canonicalTimeZone('america/new_york')).toBe('America/New_York');
    expect(canonicalTimeZone('Nowhere/Special')).toBeNull();
    expect(canonicalTimeZone('x'.repeat(100))).toBeNull();
  });
});

describe('words', () => {
  it('compass points by sixteenths', () => {
    expect(compassPoint(0)).toBe('north');
    expect(compassPoint(359)).toBe('north');
    expect(compassPoint(202.5)).toBe('south-south-west');
    expect(compassPoint(-90)).toBe('west');
  });

  it('sexagesimal writing', () => {
    expect(formatRightAscension(316.172725)).toBe('21h 04m 41s');
    expect(formatDeclination(-18.888011)).toBe('−18° 53′ 17″');
  });

  it('phase names by elongation, with the principal phases within about half a day', () => {
    expect(phaseName(2)).toBe('New moon');
    expect(phaseName(358)).toBe('New moon');
    expect(phaseName(45)).toBe('Waxing crescent');
    expect(phaseName(92)).toBe('First quarter');
    expect(phaseName(135)).toBe('Waxing gibbous');
    expect(phaseName(180)).toBe('Full moon');
    expect(phaseName(225)).toBe('Waning gibbous');
    expect(phaseName(270)).toBe('Last quarter');
    expect(phaseName(300)).toBe('Waning crescent');
  });
});

describe('an ordinary night at the demo venue', () => {
  const sky = computeSkyTonight({
    latitude: 54.62,
    longitude: -2.95,
    elevationM: 160,
    timeZone: 'Europe/London',
    localDate: '2026-11-20',
    now: 0,
  });

  it('puts the twilights in order between sunset and sunrise', () => {
    const s = sky.sun;
    const order = [
      s.sunset,
      s.civilDusk,
      s.nauticalDusk,
      s.astronomicalDusk,
      s.astronomicalDawn,
      s.nauticalDawn,
      s.civilDawn,
      s.sunrise,
    ].map((e) => Date.parse(e.utc!));
    expect(order.every((t, i) => i === 0 || t > order[i - 1])).toBe(true);
    expect(s.darkness.kind).toBe('astronomical');
  });

  it('gives each planet distance in au and km with the light time, and rise before set when both are tonight', () => {
    for (const p of sky.planets) {
      expect(p.distanceKm / p.distanceAu).toBeCloseTo(149_597_870.7, 3);
      expect(p.lightTimeSeconds).toBeCloseTo(p.distanceKm / 299_792.458, 6);
      expect(p.times.state).toBe('rises-and-sets');
      expect(p.aboveHorizon).toBe(p.altitudeDeg > -0.5667);
    }
  });

  it('describes the Moon with a phase name consistent with its illumination', () => {
    const m = sky.moon;
    expect(m.illuminatedFraction).toBeCloseTo((1 + Math.cos((m.phaseAngleDeg * Math.PI) / 180)) / 2, 10);
    expect(m.phaseName).toMatch(/moon|crescent|gibbous|quarter/i);
    expect(m.distanceKm).toBeGreaterThan(356_000);
    expect(m.distanceKm).toBeLessThan(407_000);
  });

  it('gives the Moon’s elongation as its angle from the Sun, not the longitude difference', () => {
    const e = new Ephemeris();
    // 2026-12-03 00h TT onwards, a lunar month day by day.
    for (let day = 0; day < 30; day++) {
      const jde = 2_461_377.5 + day;
      const p = moonPhase(e.moon(jde), e.sun(jde));
      expect(p.elongationDeg).toBeGreaterThanOrEqual(0);
      expect(p.elongationDeg).toBeLessThanOrEqual(180);
      // The Moon is within 5.3° of the ecliptic (inclination 5.145°, recalled from memory), so the
      // angle from the Sun differs from the folded longitude difference by less than that.
      const folded = Math.min(p.longitudeFromSunDeg, 360 - p.longitudeFromSunDeg);
      expect(Math.abs(p.elongationDeg - folded)).toBeLessThan(5.3);
      expect(p.waxing).toBe(p.longitudeFromSunDeg < 180);
    }
    // A waning crescent 299.9° east of the Sun in longitude is about 60° from it, never 299.9°.
    expect(sky.moon.elongationDeg).toBeLessThanOrEqual(180);
  });
});
