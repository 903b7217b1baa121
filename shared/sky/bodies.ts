/**
 * The VSOP87 series for the eight planets (astronomia's VSOP87B data sets: heliocentric, ecliptic
 * and equinox J2000, precessed to date by astronomia). Built once on first use.
 */
import { Planet } from 'astronomia/planetposition';
import earthData from 'astronomia/data/vsop87Bearth';
import jupiterData from 'astronomia/data/vsop87Bjupiter';
import marsData from 'astronomia/data/vsop87Bmars';
import mercuryData from 'astronomia/data/vsop87Bmercury';
import neptuneData from 'astronomia/data/vsop87Bneptune';
import saturnData from 'astronomia/data/vsop87Bsaturn';
import uranusData from 'astronomia/data/vsop87Buranus';
import venusData from 'astronomia/data/vsop87Bvenus';

/** The planets shown in the sky tonight, in order from the Sun. */
export const PLANET_IDS = ['mercury', 'venus', 'mars', 'jupiter', 'saturn', 'uranus', 'neptune'] as const;
export type PlanetId = (typeof PLANET_IDS)[number];

/** Display names. */
export const PLANET_NAMES: Record<PlanetId, string> = {
  mercury: 'Mercury',
  venus: 'Venus',
  mars: 'Mars',
  jupiter: 'Jupiter',
  saturn: 'Saturn',
  uranus: 'Uranus',
  neptune: 'Neptune',
};

const DATA: Record<PlanetId | 'earth', object> = {
  mercury: mercuryData,
  venus: venusData,
  earth: earthData,
  mars: marsData,
  jupiter: jupiterData,
  saturn: saturnData,
  uranus: uranusData,
  neptune: neptuneData,
};

const built = new Map<string, Planet>();

/** The VSOP87 series of a planet or the Earth. */
export function vsop87(id: PlanetId | 'earth'): Planet {
  let p = built.get(id);
  if (!p) {
    p = new Planet(DATA[id]);
    built.set(id, p);
  }
  return p;
}
