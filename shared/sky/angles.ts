/** Small angle helpers: degrees and radians, wrapping, and compass directions in words. */

export const DEG = Math.PI / 180;

/** Wraps degrees into [0, 360). */
export const wrap360 = (deg: number): number => ((deg % 360) + 360) % 360;

/** Wraps degrees into [−180, 180). */
export const wrap180 = (deg: number): number => wrap360(deg + 180) - 180;

const POINTS = [
  'north',
  'north-north-east',
  'north-east',
  'east-north-east',
  'east',
  'east-south-east',
  'south-east',
  'south-south-east',
  'south',
  'south-south-west',
  'south-west',
  'west-south-west',
  'west',
  'west-north-west',
  'north-west',
  'north-north-west',
] as const;

/** One of the sixteen compass points, in words. */
export type CompassPoint = (typeof POINTS)[number];

/**
 * The compass point nearest an azimuth.
 * @param azimuthDeg degrees from north through east (0 = north, 90 = east)
 * @returns e.g. "south-south-west"
 */
export function compassPoint(azimuthDeg: number): CompassPoint {
  return POINTS[Math.round(wrap360(azimuthDeg) / 22.5) % 16];
}

/** Right ascension in degrees written as "21h 04m 41s". */
export function formatRightAscension(deg: number): string {
  const totalSeconds = Math.round((wrap360(deg) / 15) * 3600) % 86_400;
  const h = Math.floor(totalSeconds / 3600);
  const m = Math.floor((totalSeconds % 3600) / 60);
  const s = totalSeconds % 60;
  return `${String(h).padStart(2, '0')}h ${String(m).padStart(2, '0')}m ${String(s).padStart(2, '0')}s`;
}

/** Declination in degrees written as "−18° 53′ 17″". */
export function formatDeclination(deg: number): string {
  const sign = deg < 0 ? '−' : '+';
  const totalSeconds = Math.round(Math.abs(deg) * 3600);
  const d = Math.floor(totalSeconds / 3600);
  const m = Math.floor((totalSeconds % 3600) / 60);
  const s = totalSeconds % 60;
  return `${sign}${d}° ${String(m).padStart(2, '0')}′ ${String(s).padStart(2, '0')}″`;
}
