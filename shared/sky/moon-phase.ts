/** The Moon's phase: illuminated fraction and phase angle (Meeus ch. 48) and the phase's name. */
import { phaseAngleEquatorial } from 'astronomia/moonillum';
import { DEG, wrap360 } from './angles.ts';
import type { ApparentPlace } from './ephemeris.ts';

/** Within this many degrees of elongation (about half a day) a principal phase is named as such. */
const PRINCIPAL_PHASE_DEG = 6;

/**
 * Illuminated fraction, phase angle and name from geocentric places of the Moon and the Sun.
 * @param moon apparent place of the Moon (distance in au)
 * @param sun apparent place of the Sun (distance in au)
 */
export function moonPhase(moon: ApparentPlace, sun: ApparentPlace) {
  const i = phaseAngleEquatorial(
    { ra: moon.ra, dec: moon.dec, range: moon.distanceAu },
    { ra: sun.ra, dec: sun.dec, range: sun.distanceAu },
  );
  const illuminatedFraction = (1 + Math.cos(i)) / 2; // (48.1)
  const elongationDeg = wrap360((moon.lon - sun.lon) / DEG);
  return {
    phaseAngleDeg: i / DEG,
    illuminatedFraction,
    elongationDeg,
    waxing: elongationDeg < 180,
    phaseName: phaseName(elongationDeg),
  };
}

/**
 * The common name of the phase for an elongation in ecliptic longitude (Moon minus Sun).
 * @param elongationDeg degrees [0, 360)
 */
export function phaseName(elongationDeg: number): string {
  const d = wrap360(elongationDeg);
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
