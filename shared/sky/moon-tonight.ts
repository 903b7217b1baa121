/** The Moon tonight: phase, illumination, place at the observation time and rise/transit/set. */
import { parallax } from 'astronomia/moonposition';
import { DEG } from './angles.ts';
import { altitudeAt, eventsInWindow, type Trackable } from './body-track.ts';
import { KM_PER_AU, type Ephemeris } from './ephemeris.ts';
import { riseTransitSetTimes } from './events.ts';
import type { Observer } from './horizon.ts';
import { moonPhase } from './moon-phase.ts';
import { nightVisit } from './night-visit.ts';
import { moonStandardAltitude } from './rise-set.ts';
import { placeFor, horizonState, type NightContext } from './sky-place.ts';
import type { MoonTonight } from './types.ts';

/** The Moon's equatorial horizontal parallax in degrees at a Julian Ephemeris Day. */
const parallaxDegAt = (ephemeris: Ephemeris, jde: number) => parallax(ephemeris.moon(jde).distanceAu * KM_PER_AU) / DEG;

/** The Moon as a trackable body: h0 = 0.7275π − 0°34′ with the parallax at each instant. */
export function moonTrack(ephemeris: Ephemeris): Trackable {
  return {
    placeAt: (jde) => {
      const p = ephemeris.moon(jde);
      return { raDeg: p.ra / DEG, decDeg: p.dec / DEG, parallaxDeg: parallaxDegAt(ephemeris, jde) };
    },
    h0Deg: (place) => moonStandardAltitude(place.parallaxDeg!),
    // The Moon moves about 13° a day: places every six hours keep the interpolation under 0.001°.
    gridDays: 0.25,
  };
}

/**
 * The Moon's night. Rise and set use h0 = 0.7275π − 0°34′ with the day's parallax; the altitude
 * shown is topocentric (the Moon's parallax lowers it by up to a degree).
 */
export function moonTonight(ephemeris: Ephemeris, observer: Observer, night: NightContext): MoonTonight {
  const track = moonTrack(ephemeris);
  const events = eventsInWindow(observer, night.startMs, night.endMs, track);
  const midH0 = moonStandardAltitude(parallaxDegAt(ephemeris, night.obsJde));
  const state = horizonState(events, altitudeAt(observer, night.midMs, track).altitudeDeg, midH0);
  const now = ephemeris.moon(night.obsJde);
  const parallaxDeg = parallaxDegAt(ephemeris, night.obsJde);
  // Topocentric altitude compared with the refraction-only part of h0 (parallax is already applied).
  const place = placeFor(now, observer, night.obs.ms, -0.5667 - 0.2725 * parallaxDeg, parallaxDeg);
  const phase = moonPhase(now, night.sunAtObs);
  return {
    ...place,
    ...phase,
    distanceKm: now.distanceAu * KM_PER_AU,
    times: riseTransitSetTimes(nightVisit(observer, night, track, events), state, night.timeZone, night.localDate),
  };
}
