/** The Moon's phase: illuminated fraction and phase angle (Meeus ch. 48) and the phase's name. */
import { phaseAngleEquatorial } from 'astronomia/moonillum';
import { DEG, wrap360 } from './angles.ts';
import type { ApparentPlace } from './ephemeris.ts';
import { angularSeparationDeg } from './sky-place.ts';

/** Within this many degrees of longitude from the Sun (about half a day) a principal phase is named as such. */
const PRINCIPAL_PHASE_DEG = 6;

/**
 * Illuminated fraction, phase angle and name from geocentric places of the Moon and the Sun.
 * The elongation is the angle between the Moon and the Sun on the sky (Meeus 48.2: cos ψ from the
 * two positions), 0–180°; the phase is named from the difference in ecliptic longitude, 0–360°
 * (Meeus ch. 49), which is a different quantity: 299.9° of longitude is an elongation of about 60°.
 * @param moon apparent place of the Moon (distance in au)
 * @param sun apparent place of the Sun (distance in au)
 */
export function moonPhase(moon: ApparentPlace, sun: ApparentPlace) {
  const i = phaseAngleEquatorial(
    { ra: moon.ra, dec: moon.dec, range: moon.distanceAu },
    { ra: sun.ra, dec: sun.dec, range: sun.distanceAu },
  );
  const illuminatedFraction = (1 + Math.cos(i)) / 2; // (48.1)
  const longitudeFromSunDeg = wrap360((moon.lon - sun.lon) / DEG);
  return {
    phaseAngleDeg: i / DEG,
    illuminatedFraction,
    elongationDeg: angularSeparationDeg(moon, sun),
    longitudeFromSunDeg,
    waxing: longitudeFromSunDeg < 180,
    phaseName: phaseName(longitudeFromSunDeg),
  };
}

/**
 * The common name of the phase for the Moon's ecliptic longitude minus the Sun's.
 * @param longitudeFromSunDeg degrees [0, 360)
 */
export function phaseName(longitudeFromSunDeg: number): string {
  const d = wrap360(longitudeFromSunDeg);
  const near = (target: number) => Math.abs(((d - target + 540) % 360) - 180) <= PRINCIPAL_PHASE_DEG;
  if (near(0)) return 'New moon';
  if (near(90)) return 'First quarter';
  if (near(180)) return 'Full moon';
  if (near(270)) return 'Last quarter';
  if (d < 90) return 'Waxing crescent';
  if (d < 180) return 'Waxing gibbous';
  if (d < 270) return 'Waning gibbous';
  return 'Waning crescent';
}
