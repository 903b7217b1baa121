import { PLANET_IDS, PLANET_NAMES, type PlanetId } from '../sky/bodies.ts';
import type { SkyTonight } from '../sky/types.ts';
import { missing } from './inputs.ts';
import type { StatementNight, StatementVenue, TemplateContext } from './types.ts';

/**
 * What statements about a venue's night share: which planet an object is, the venue and night a
 * template must be given, and the night as the sky computation stored it.
 */

const KNOWN = PLANET_IDS.map((id) => PLANET_NAMES[id]).join(', ');

/**
 * The planet the sky engine computes for a catalogue object: an object of kind "planet" whose name
 * or one of whose designations is a planet's name (any case).
 * @param object the statement's object
 * @returns the planet, or undefined
 */
export function planetOf(object: TemplateContext['object']): PlanetId | undefined {
  if (object.kind !== 'planet') return undefined;
  const names = [object.name, ...(object.designations ?? [])].map((n) => n.trim().toLowerCase());
  return PLANET_IDS.find((id) => names.includes(PLANET_NAMES[id].toLowerCase()));
}

/** The object's planet, or a missing-input refusal that says which objects qualify. */
export function requirePlanet(ctx: TemplateContext): PlanetId {
  const planet = planetOf(ctx.object);
  if (planet) return planet;
  const what = ctx.object.kind === 'planet' ? 'is not one of them' : `is catalogued as a ${ctx.object.kind}, not a planet`;
  throw missing(['planet'], `Needs one of the planets the sky engine computes (${KNOWN}); “${ctx.object.name}” ${what}.`);
}

/** The venue and its night, or a missing-input refusal that says why they are needed. */
export function requireVenueNight(
  ctx: TemplateContext,
  planet: PlanetId,
): { venue: StatementVenue; night: StatementNight; distanceAu: number } {
  if (!ctx.venue)
    throw missing(
      ['venue'],
      'Needs a venue: the distance is worked out for one place and night. Choose the venue the statement is for.',
    );
  const night = ctx.night;
  const distanceAu = night?.planets.find((p) => p.id === planet)?.distanceAu;
  if (!night || distanceAu === undefined || !Number.isFinite(distanceAu) || distanceAu <= 0) {
    throw missing(
      ['sky'],
      `Needs the sky tonight for ${ctx.venue.name}, with ${PLANET_NAMES[planet]}’s distance; it could not be computed.`,
    );
  }
  return { venue: ctx.venue, night, distanceAu };
}

/**
 * A stored sky snapshot as a template reads it: the night, the observation instant and each
 * planet's distance (nothing else of the sky is needed, and workers get less to copy).
 * @param sky the sky tonight for a venue
 */
export function nightFromSky(sky: SkyTonight): StatementNight {
  return {
    localDate: sky.localDate,
    observation: { utc: sky.observation.utc ?? '', localTime: sky.observation.localTime, basis: sky.observation.basis },
    planets: sky.planets.map((p) => ({ id: p.id, distanceAu: p.distanceAu })),
    ephemeris: sky.method.ephemeris,
    skyVersion: sky.version,
  };
}

/**
 * The relative uncertainty we give each planet's distance: the tolerance to which
 * tests/reference/sky/astropy.test.ts holds our VSOP87 distances against astropy 5.2.1's built-in
 * ephemeris. Measured differences there are smaller (at most 1.7 × 10⁻⁴, Mars and Uranus), and most
 * of them are the reference's own error (its planets come from the shorter plan94 series).
 */
export const DISTANCE_RELATIVE_UNCERTAINTY: Record<PlanetId, number> = {
  mercury: 2e-5,
  venus: 3e-5,
  mars: 3e-4,
  jupiter: 3e-4,
  saturn: 3e-4,
  uranus: 3e-4,
  neptune: 1e-4,
};

/** Largest relative difference from astropy measured in that reference test, every planet and date. */
export const LARGEST_MEASURED_DIFFERENCE = 1.7e-4;

/**
 * Largest relative change of a planet's distance within ±6 hours of an instant: under 1 % (Mercury,
 * 0.80 %; our ephemeris sampled daily over 2020–2039, and checked in the statement tests).
 */
export const NIGHT_DRIFT_BOUND = 0.01;

/** Half the window the wording must hold for: the evening, ±6 hours around the observation time. */
export const WORDING_WINDOW_HOURS = 6;

/**
 * Per planet, a bound on the relative change of its distance within ±6 hours of any instant: the
 * largest change found with our ephemeris sampling 2020–2039 every 2.3 days (Mercury 0.800 %, Venus
 * 0.417 %, Mars 0.285 %, Jupiter 0.0841 %, Saturn 0.0467 %, Uranus 0.0232 %, Neptune 0.0146 %), plus
 * 15 % and rounded up. The statement tests check each bound on an independent sampling.
 */
export const WINDOW_DRIFT: Record<PlanetId, number> = {
  mercury: 0.0092,
  venus: 0.0048,
  mars: 0.0033,
  jupiter: 0.00097,
  saturn: 0.00054,
  uranus: 0.00027,
  neptune: 0.00017,
};
