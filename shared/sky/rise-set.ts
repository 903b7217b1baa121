/**
 * Rising, transit and setting for one Universal Time day (Meeus, Astronomical Algorithms, 2nd ed.,
 * ch. 15), from the body's apparent right ascension and declination at 0h TD on the day before,
 * the day itself and the day after. Unlike the book's single correction, the corrections are
 * repeated until they settle (a correction that has not settled after MAX_PASSES is an error, never
 * a result); right ascension is unwrapped across 0h/24h before interpolating.
 *
 * The book's method decides from the declination at 0h whether the body crosses at all, which is
 * wrong for a body that only just crosses or misses: the sky tonight finds its crossings from the
 * altitude itself (body-track.ts). This function stays as the book gives it, for its worked example.
 */
import { DEG, wrap180 } from './angles.ts';

/** Standard altitudes h0 in degrees (Meeus ch. 15): refraction 34′, and the Sun's semidiameter 16′. */
export const STANDARD_ALTITUDE = {
  /** Stars and planets: −0°34′. */
  planet: -0.5667,
  /** The Sun's upper limb: −0°50′. */
  sun: -0.8333,
  civilTwilight: -6,
  nauticalTwilight: -12,
  astronomicalTwilight: -18,
} as const;

/**
 * The Moon's standard altitude, h0 = 0.7275 π − 0°34′ (Meeus ch. 15).
 * @param parallaxDeg the Moon's equatorial horizontal parallax
 */
export const moonStandardAltitude = (parallaxDeg: number): number => 0.7275 * parallaxDeg - 0.5667;

/** What ch. 15 needs for one UT day. */
export interface DayInput {
  /** Geographic latitude, degrees. */
  latitude: number;
  /** Longitude, degrees east positive (Meeus counts west positive; converted here). */
  longitude: number;
  /** Apparent sidereal time at Greenwich at 0h UT of the day, degrees. */
  theta0Deg: number;
  /** ΔT in seconds. */
  deltaTSec: number;
  /** Standard altitude h0 in degrees. */
  h0Deg: number;
  /** Right ascensions at 0h TD of day −1, 0, +1, degrees. */
  ra: [number, number, number];
  /** Declinations at 0h TD of day −1, 0, +1, degrees. */
  dec: [number, number, number];
}

/** Results as fractions of the UT day (may fall slightly outside [0, 1) after correction). */
export type DayEvents =
  | { kind: 'rises-and-sets'; rise: number; transit: number; set: number }
  | { kind: 'always-up'; transit: number }
  | { kind: 'always-down'; transit: number };

/** Meeus (3.3): interpolation from three tabular values at n ∈ [−1, 1]. */
function interpolate(y: [number, number, number], n: number): number {
  const a = y[1] - y[0];
  const b = y[2] - y[1];
  return y[1] + (n / 2) * (a + b + n * (b - a));
}

/** Right ascensions made continuous across 360° → 0°. */
function unwrapRa(ra: [number, number, number]): [number, number, number] {
  const r1 = ra[0];
  const r2 = r1 + wrap180(ra[1] - r1);
  const r3 = r2 + wrap180(ra[2] - ra[1]);
  return [r1, r2, r3];
}

const MAX_PASSES = 12;
const SETTLED = 1e-7; // of a day: under 0.01 s

/**
 * Rise, transit and set for one UT day, or which side of the horizon the body stays on.
 * @param input the day's positions and the observer
 * @returns fractions of the day from 0h UT
 */
export function riseTransitSet(input: DayInput): DayEvents {
  const ra = unwrapRa(input.ra);
  const lat = input.latitude * DEG;
  const h0 = input.h0Deg * DEG;
  const dt = input.deltaTSec / 86_400;
  const m0 = ((((ra[1] - input.longitude - input.theta0Deg) / 360) % 1) + 1) % 1;

  const at = (m: number) => {
    const n = m + dt;
    const alpha = interpolate(ra, n);
    const delta = interpolate(input.dec, n) * DEG;
    const theta = input.theta0Deg + 360.985647 * m;
    const hourAngle = wrap180(theta + input.longitude - alpha);
    return { delta, hourAngle };
  };

  let transit = m0;
  for (let pass = 0; ; pass += 1) {
    if (pass === MAX_PASSES) throw new Error('Meeus ch. 15: the transit correction did not settle');
    const dm = -at(transit).hourAngle / 360;
    transit += dm;
    if (Math.abs(dm) < SETTLED) break;
  }

  const dec0 = input.dec[1] * DEG;
  const cosH0 = (Math.sin(h0) - Math.sin(lat) * Math.sin(dec0)) / (Math.cos(lat) * Math.cos(dec0));
  if (cosH0 < -1) return { kind: 'always-up', transit };
  if (cosH0 > 1) return { kind: 'always-down', transit };
  const H0 = Math.acos(cosH0) / DEG;

  const refine = (start: number) => {
    let m = start;
    for (let pass = 0; ; pass += 1) {
      if (pass === MAX_PASSES) throw new Error('Meeus ch. 15: the rising or setting correction did not settle');
      const { delta, hourAngle } = at(m);
      const H = hourAngle * DEG;
      const h = Math.asin(Math.sin(lat) * Math.sin(delta) + Math.cos(lat) * Math.cos(delta) * Math.cos(H));
      const dm = (h - h0) / DEG / (360 * Math.cos(delta) * Math.cos(lat) * Math.sin(H));
      // Near a pole of the sky the correction can run away; a bounded step keeps it in its day.
      m += Math.max(-0.1, Math.min(0.1, dm));
      if (Math.abs(dm) < SETTLED) break;
    }
    return m;
  };
  const frac = (x: number) => ((x % 1) + 1) % 1;
  return { kind: 'rises-and-sets', rise: refine(frac(m0 - H0 / 360)), transit, set: refine(frac(m0 + H0 / 360)) };
}
