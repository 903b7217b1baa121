/**
 * Apparent geocentric positions of the planets, the Sun and the Moon (Meeus ch. 25, 33, 47),
 * with an optional cache: positions at a given instant do not depend on the observer, so one
 * Ephemeris may be shared by many venues computed for the same dates.
 */
import { eclipticAberration } from 'astronomia/apparent';
import { Ecliptic } from 'astronomia/coord';
import { position as moonPosition } from 'astronomia/moonposition';
import { meanObliquity, nutation } from 'astronomia/nutation';
import { toFK5, type HeliocentricPosition } from 'astronomia/planetposition';
import { apparentVSOP87 } from 'astronomia/solar';
import { ASTRONOMICAL_UNIT, SPEED_OF_LIGHT } from '../engine/constants.ts';
import { vsop87, type PlanetId } from './bodies.ts';

/** Light-travel time across one astronomical unit, in days (IAU 2012 B2 au over the defined c). */
export const LIGHT_DAYS_PER_AU = ASTRONOMICAL_UNIT.value / 1000 / SPEED_OF_LIGHT.value / 86_400;
/** Kilometres in one astronomical unit (IAU 2012 Resolution B2, exact). */
export const KM_PER_AU = ASTRONOMICAL_UNIT.value / 1000;

/** An apparent geocentric place: right ascension and declination of date (radians) and distance. */
export interface ApparentPlace {
  ra: number;
  dec: number;
  /** Apparent ecliptic longitude of date (radians). */
  lon: number;
  /** Distance from the Earth's centre in au (for the Moon too, for uniformity). */
  distanceAu: number;
  /** Light-travel time from the body, in days (zero for the Moon and Sun where not needed). */
  lightTimeDays: number;
}

function apparentFromEcliptic(lon: number, lat: number, jde: number, applyNutationInLon = true) {
  const [dPsi, dEps] = nutation(jde);
  const lambda = applyNutationInLon ? lon + dPsi : lon;
  const eq = new Ecliptic(lambda, lat).toEquatorial(meanObliquity(jde) + dEps);
  return { ra: eq.ra, dec: eq.dec, lon: lambda };
}

/** Positions with memoisation by body and instant. */
export class Ephemeris {
  private readonly earthCache = new Map<number, HeliocentricPosition>();
  private readonly placeCache = new Map<string, ApparentPlace>();

  private earth(jde: number): HeliocentricPosition {
    let e = this.earthCache.get(jde);
    if (!e) {
      e = vsop87('earth').position(jde);
      this.earthCache.set(jde, e);
    }
    return e;
  }

  private memo(key: string, compute: () => ApparentPlace): ApparentPlace {
    let p = this.placeCache.get(key);
    if (!p) {
      p = compute();
      this.placeCache.set(key, p);
    }
    return p;
  }

  /**
   * A planet's apparent place (Meeus ch. 33): the planet's heliocentric position at the time the
   * light left it, minus the Earth's at the time it arrives, then aberration, the FK5 correction
   * and nutation. The distance is the light-time-corrected one (the light's path length).
   * @param id the planet
   * @param jde Julian Ephemeris Day (TT)
   */
  planet(id: PlanetId, jde: number): ApparentPlace {
    return this.memo(`${id}:${jde}`, () => {
      const e = this.earth(jde);
      const ex = e.range * Math.cos(e.lat) * Math.cos(e.lon);
      const ey = e.range * Math.cos(e.lat) * Math.sin(e.lon);
      const ez = e.range * Math.sin(e.lat);
      let tau = 0;
      let x = 0;
      let y = 0;
      let z = 0;
      let distance = 0;
      // Two passes, as Meeus does: the second light time is right to well under a second.
      for (let pass = 0; pass < 2; pass += 1) {
        const p = vsop87(id).position(jde - tau);
        x = p.range * Math.cos(p.lat) * Math.cos(p.lon) - ex;
        y = p.range * Math.cos(p.lat) * Math.sin(p.lon) - ey;
        z = p.range * Math.sin(p.lat) - ez;
        distance = Math.hypot(x, y, z);
        tau = distance * LIGHT_DAYS_PER_AU;
      }
      const lon = Math.atan2(y, x);
      const lat = Math.atan2(z, Math.hypot(x, y));
      const [dLon, dLat] = eclipticAberration(lon, lat, jde);
      const fk5 = toFK5(lon + dLon, lat + dLat, jde);
      const place = apparentFromEcliptic(fk5.lon, fk5.lat, jde);
      return { ...place, distanceAu: distance, lightTimeDays: tau };
    });
  }

  /** Every body and instant computed so far, e.g. for timing a peer on the same positions. */
  placesComputed(): Array<{ body: string; jde: number }> {
    return [...this.placeCache.keys()].map((key) => {
      const [body, jde] = key.split(':');
      return { body, jde: Number(jde) };
    });
  }

  /** The Sun's apparent place by VSOP87 (Meeus ch. 25, "higher accuracy"). */
  sun(jde: number): ApparentPlace {
    return this.memo(`sun:${jde}`, () => {
      // apparentVSOP87 includes the FK5 correction, nutation in longitude and aberration.
      const s = apparentVSOP87(vsop87('earth'), jde);
      const [, dEps] = nutation(jde);
      const eq = new Ecliptic(s.lon, s.lat).toEquatorial(meanObliquity(jde) + dEps);
      return { ra: eq.ra, dec: eq.dec, lon: s.lon, distanceAu: s.range, lightTimeDays: s.range * LIGHT_DAYS_PER_AU };
    });
  }

  /** The Moon's apparent geocentric place (Meeus ch. 47; nutation added to the longitude). */
  moon(jde: number): ApparentPlace {
    return this.memo(`moon:${jde}`, () => {
      const m = moonPosition(jde);
      const place = apparentFromEcliptic(m.lon, m.lat, jde);
      const distanceAu = m.range / KM_PER_AU;
      return { ...place, distanceAu, lightTimeDays: distanceAu * LIGHT_DAYS_PER_AU };
    });
  }
}
