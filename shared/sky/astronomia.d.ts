/**
 * Type declarations for the parts of astronomia 4.2.0 (Meeus's algorithms, VSOP87) that
 * shared/sky uses. astronomia ships plain JavaScript; angles are radians unless noted.
 */

declare module 'astronomia/planetposition' {
  /** Heliocentric ecliptic position: longitude, latitude (radians) and radius vector (au). */
  export interface HeliocentricPosition {
    lon: number;
    lat: number;
    range: number;
  }
  /** A VSOP87 series for one body. */
  export class Planet {
    constructor(data: object);
    name: string;
    /** Heliocentric position referred to the ecliptic and equinox of date. */
    position(jde: number): HeliocentricPosition;
    /** Heliocentric position referred to the ecliptic and equinox J2000. */
    position2000(jde: number): HeliocentricPosition;
  }
  /** Meeus (32.3): from the VSOP87 dynamical frame to FK5. */
  export function toFK5(lon: number, lat: number, jde: number): { lon: number; lat: number };
}

declare module 'astronomia/data/vsop87Bmercury' {
  const data: object;
  export default data;
}
declare module 'astronomia/data/vsop87Bvenus' {
  const data: object;
  export default data;
}
declare module 'astronomia/data/vsop87Bearth' {
  const data: object;
  export default data;
}
declare module 'astronomia/data/vsop87Bmars' {
  const data: object;
  export default data;
}
declare module 'astronomia/data/vsop87Bjupiter' {
  const data: object;
  export default data;
}
declare module 'astronomia/data/vsop87Bsaturn' {
  const data: object;
  export default data;
}
declare module 'astronomia/data/vsop87Buranus' {
  const data: object;
  export default data;
}
declare module 'astronomia/data/vsop87Bneptune' {
  const data: object;
  export default data;
}

declare module 'astronomia/nutation' {
  /** Nutation in longitude and in obliquity, [Δψ, Δε] (Meeus ch. 22). */
  export function nutation(jde: number): [number, number];
  /** Mean obliquity of the ecliptic (Meeus 22.2). */
  export function meanObliquity(jde: number): number;
}

declare module 'astronomia/apparent' {
  /** Annual aberration in ecliptic coordinates, [Δλ, Δβ] (Meeus 23.2). */
  export function eclipticAberration(lon: number, lat: number, jde: number): [number, number];
}

declare module 'astronomia/sidereal' {
  /** Apparent sidereal time at Greenwich, in seconds of time [0, 86400). */
  export function apparent(jd: number): number;
  /** Apparent sidereal time at Greenwich at 0h UT of the given day, in seconds of time. */
  export function apparent0UT(jd: number): number;
  /** Mean sidereal time at Greenwich (IAU 1982), in seconds of time [0, 86400). */
  export function mean(jd: number): number;
}

declare module 'astronomia/solar' {
  /** The Sun's apparent geocentric position by VSOP87 (Meeus ch. 25): ra, dec (radians), range (au). */
  export function apparentEquatorialVSOP87(
    earth: import('astronomia/planetposition').Planet,
    jde: number,
  ): { ra: number; dec: number; range: number };
  /** The Sun's apparent ecliptic longitude and latitude by VSOP87, and range in au. */
  export function apparentVSOP87(
    earth: import('astronomia/planetposition').Planet,
    jde: number,
  ): { lon: number; lat: number; range: number };
}

declare module 'astronomia/moonposition' {
  /** The Moon's geocentric ecliptic position of date without nutation (Meeus ch. 47); range in km. */
  export function position(jde: number): { lon: number; lat: number; range: number };
  /** Equatorial horizontal parallax for a distance in km. */
  export function parallax(distanceKm: number): number;
}

declare module 'astronomia/moonillum' {
  /** Phase angle of the Moon from geocentric Moon and Sun positions (Meeus 48.2, 48.3); distances in one unit. */
  export function phaseAngleEquatorial(
    moon: { ra: number; dec: number; range: number },
    sun: { ra: number; dec: number; range: number },
  ): number;
}

declare module 'astronomia/deltat' {
  /** ΔT = TD − UT in seconds, for a decimal year. */
  export function deltaT(decimalYear: number): number;
}

declare module 'astronomia/coord' {
  export class Ecliptic {
    constructor(lon: number, lat: number);
    toEquatorial(obliquity: number): { ra: number; dec: number };
  }
}

declare module 'astronomia/globe' {
  export const Earth76: {
    /** [ρ sin φ′, ρ cos φ′] for geographic latitude (radians) and height in metres (Meeus ch. 11). */
    parallaxConstants(latitude: number, heightM: number): [number, number];
  };
}
