/** From apparent right ascension and declination to altitude and azimuth for an observer (Meeus ch. 12–13). */
import { apparent as apparentSidereal } from 'astronomia/sidereal';
import { DEG, wrap180, wrap360 } from './angles.ts';

/** Where the sky is seen from: degrees (east longitude positive) and metres above sea level. */
export interface Observer {
  latitude: number;
  longitude: number;
  elevationM: number;
}

/** Apparent sidereal time at Greenwich in degrees, for a Julian Day (UT). */
export const greenwichSiderealDeg = (jd: number): number => apparentSidereal(jd) / 240;

/** Altitude above the horizon and azimuth from north through east, in degrees. */
export interface HorizontalPlace {
  altitudeDeg: number;
  azimuthDeg: number;
}

/**
 * Geometric altitude and azimuth (no refraction) of an apparent place.
 * @param raRad apparent right ascension of date
 * @param decRad apparent declination of date
 * @param observer where from
 * @param jd Julian Day (UT) of the moment
 */
export function toHorizontal(raRad: number, decRad: number, observer: Observer, jd: number): HorizontalPlace {
  const hourAngle = wrap180(greenwichSiderealDeg(jd) + observer.longitude - raRad / DEG) * DEG;
  const lat = observer.latitude * DEG;
  const altitude = Math.asin(Math.sin(lat) * Math.sin(decRad) + Math.cos(lat) * Math.cos(decRad) * Math.cos(hourAngle));
  // (13.5) measures azimuth from the south; adding 180° gives the compass bearing from the north.
  const azimuthFromSouth = Math.atan2(
    Math.sin(hourAngle),
    Math.cos(hourAngle) * Math.sin(lat) - Math.tan(decRad) * Math.cos(lat),
  );
  return { altitudeDeg: altitude / DEG, azimuthDeg: wrap360(azimuthFromSouth / DEG + 180) };
}

/**
 * Lowers a geocentric altitude to the topocentric one for a body with a noticeable horizontal
 * parallax (the Moon: up to about 1°). The approximation p = π cos h is good to a few arcseconds.
 * @param altitudeDeg geocentric altitude
 * @param parallaxDeg equatorial horizontal parallax
 */
export const topocentricAltitude = (altitudeDeg: number, parallaxDeg: number): number =>
  altitudeDeg - parallaxDeg * Math.cos(altitudeDeg * DEG);
