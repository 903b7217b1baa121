/**
 * The sky tonight for a venue: planets Mercury–Neptune, the Moon and the Sun between local noon on
 * the date and local noon the next day. Pure: no clock, no I/O; the same in Node and the browser.
 */
import { DEG } from './angles.ts';
import { altitudeAt, eventsInWindow, type Trackable } from './body-track.ts';
import { PLANET_IDS, PLANET_NAMES, type PlanetId } from './bodies.ts';
import { Ephemeris, KM_PER_AU, LIGHT_DAYS_PER_AU } from './ephemeris.ts';
import { riseTransitSetTimes, skyEvent } from './events.ts';
import { toHorizontal, type Observer } from './horizon.ts';
import { moonTonight } from './moon-tonight.ts';
import { nightVisit } from './night-visit.ts';
import { STANDARD_ALTITUDE } from './rise-set.ts';
import { sunNight, type SunNight } from './sun-tonight.ts';
import { jdeFromJd, jdFromMs, localToMs, nextDate } from './time.ts';
import { angularSeparationDeg, describeVisibility, horizonState, placeFor, type NightContext } from './sky-place.ts';
import { SKY_VERSION, type Observation, type PlanetTonight, type SkyTonight } from './types.ts';
import { checkSkyRequest, type SkyRequest } from './validate-input.ts';

export type { SkyRequest } from './validate-input.ts';

/** Options for many venues at once. */
export interface SkyOptions {
  /** Share one Ephemeris across venues computed for the same dates (positions do not depend on the place). */
  ephemeris?: Ephemeris;
}

const NOON = 12 * 60;

/** The observation instant and the stretch of dark sky it belongs to. */
function chooseObservation(request: SkyRequest, sun: SunNight, startMs: number, endMs: number, timeZone: string) {
  const pairs: Array<[number | null, number | null]> = [
    [sun.dusk.nautical, sun.dawn.nautical],
    [sun.dusk.civil, sun.dawn.civil],
    [sun.dusk.sunset, sun.dawn.sunrise],
  ];
  const pair = pairs.find(([dusk]) => dusk !== null);
  let dark: { from: number; to: number } | null = pair ? { from: pair[0]!, to: pair[1] ?? endMs } : null;
  if (!dark && sun.highest.altitudeDeg < STANDARD_ALTITUDE.sun) dark = { from: startMs, to: endMs };

  let ms: number;
  let basis: Observation['basis'];
  if (request.observeAt) {
    const [h, m] = request.observeAt.split(':').map(Number);
    const minutes = h * 60 + m;
    ms = localToMs(minutes < NOON ? nextDate(request.localDate) : request.localDate, minutes, timeZone);
    basis = 'chosen';
  } else if (sun.dusk.nautical !== null) {
    [ms, basis] = [sun.dusk.nautical, 'nautical-dusk'];
  } else if (sun.dusk.civil !== null) {
    [ms, basis] = [sun.dusk.civil, 'civil-dusk'];
  } else if (sun.dusk.sunset !== null) {
    [ms, basis] = [sun.dusk.sunset, 'sunset'];
  } else {
    [ms, basis] = [sun.lowest.ms, 'sun-lowest'];
  }
  return { ms, basis, dark };
}

const BASIS_WORDS: Record<Observation['basis'], string> = {
  chosen: 'at the chosen time',
  'nautical-dusk': 'at the end of nautical twilight',
  'civil-dusk': 'at the end of civil twilight (the sky gets no darker tonight)',
  sunset: 'at sunset (twilight lasts all night)',
  'sun-lowest': 'when the Sun is lowest (it does not set tonight, or never rises)',
};

/**
 * Computes the sky tonight for one venue and date.
 * @param request venue position, time zone, date, optional time, and the caller's clock
 * @param options a shared Ephemeris when computing many venues
 * @returns JSON-ready description with raw numbers, local times and words
 * @throws SkyInputError for a latitude, longitude, elevation, time zone, date or time out of range
 */
export function computeSkyTonight(request: SkyRequest, options: SkyOptions = {}): SkyTonight {
  const checked = checkSkyRequest(request);
  const { timeZone, localDate } = checked;
  const observer: Observer = { latitude: checked.latitude, longitude: checked.longitude, elevationM: checked.elevationM };
  const ephemeris = options.ephemeris ?? new Ephemeris();
  const startMs = localToMs(localDate, NOON, timeZone);
  const endMs = localToMs(nextDate(localDate), NOON, timeZone);
  const followingEndMs = localToMs(nextDate(nextDate(localDate)), NOON, timeZone);
  const midMs = (startMs + endMs) / 2;

  const sun = sunNight(observer, startMs, endMs, ephemeris, timeZone, localDate);
  const obs = chooseObservation(checked, sun, startMs, endMs, timeZone);
  const obsJde = jdeFromJd(jdFromMs(obs.ms));
  const sunAtObs = ephemeris.sun(obsJde);
  const sunAltitude = toHorizontal(sunAtObs.ra, sunAtObs.dec, observer, jdFromMs(obs.ms)).altitudeDeg;
  const observation: Observation = {
    ...skyEvent(obs.ms, timeZone, localDate, ''),
    basis: obs.basis,
    skyDark: sunAltitude < STANDARD_ALTITUDE.civilTwilight,
  };
  observation.text = `${observation.text}, ${BASIS_WORDS[obs.basis]}`;

  const night: NightContext = {
    startMs,
    endMs,
    followingEndMs,
    sunsetMs: sun.dusk.sunset,
    midMs,
    obs,
    obsLocalTime: observation.localTime ?? '',
    obsJde,
    sunAtObs,
    timeZone,
    localDate,
  };
  const planets = PLANET_IDS.map((id) => planetTonight(id, ephemeris, observer, night));
  const moon = moonTonight(ephemeris, observer, night);

  return {
    version: SKY_VERSION,
    localDate,
    timeZone,
    observer,
    computedAt: new Date(checked.now).toISOString(),
    window: { startUtc: new Date(startMs).toISOString(), endUtc: new Date(endMs).toISOString() },
    observation,
    sun: sun.sun,
    moon,
    planets,
    method: {
      ephemeris:
        'VSOP87 (Bretagnon & Francou 1988) for the planets and the Sun; Meeus ch. 47 (ELP-2000/82 terms) for the Moon; via astronomia 4.2.0',
      algorithms: [
        'Apparent places: light time, aberration, FK5 correction and nutation (Meeus ch. 22, 23, 32, 33)',
        'Rising, setting and twilight: the altitude itself, sampled every 10 minutes, highest and lowest points placed between samples, each crossing refined by bisection to under 1 s; standard altitudes (Meeus ch. 15) −0°34′ (planets), −0°50′ (Sun), 0.7275π − 0°34′ (Moon), and −6°, −12°, −18° for the twilights',
        'Grazing: a body whose highest or lowest point comes within 0.1° of the altitude crosses or misses it only just, and is marked "grazes" with how close it comes',
        'Transit: the hour angle passing through zero, refined the same way',
        'Moon illumination and phase angle: Meeus ch. 48',
        'Distances in kilometres with the IAU 2012 astronomical unit; light time with the defined speed of light',
      ],
      notes: [
        'Times are for a level horizon at sea level; hills and buildings delay rising and hasten setting.',
        'Altitudes are geometric (no refraction), for the centre of the body.',
        'Elevation is used for the Moon’s parallax only; the dip of a sea horizon is not applied.',
      ],
    },
  };
}

/** A planet as a trackable body, with the standard altitude −0°34′. */
export function planetTrack(id: PlanetId, ephemeris: Ephemeris): Trackable {
  return {
    placeAt: (jde) => {
      const p = ephemeris.planet(id, jde);
      return { raDeg: p.ra / DEG, decDeg: p.dec / DEG };
    },
    h0Deg: () => STANDARD_ALTITUDE.planet,
  };
}

function planetTonight(id: PlanetId, ephemeris: Ephemeris, observer: Observer, night: NightContext): PlanetTonight {
  const h0 = STANDARD_ALTITUDE.planet;
  const track = planetTrack(id, ephemeris);
  const events = eventsInWindow(observer, night.startMs, night.endMs, track);
  const state = horizonState(events, altitudeAt(observer, night.midMs, track).altitudeDeg, h0);
  const now = ephemeris.planet(id, night.obsJde);
  const place = placeFor(now, observer, night.obs.ms, h0);
  const elongationDeg = angularSeparationDeg(now, night.sunAtObs);
  const { upAfterDusk, visibility } = describeVisibility({
    observer,
    night,
    track,
    events,
    state,
    place,
    h0,
    elongationDeg,
    minElongationDeg: 10,
  });
  return {
    id,
    name: PLANET_NAMES[id],
    ...place,
    upAfterDusk,
    visibility,
    elongationDeg,
    distanceAu: now.distanceAu,
    distanceKm: now.distanceAu * KM_PER_AU,
    lightTimeSeconds: now.distanceAu * LIGHT_DAYS_PER_AU * 86_400,
    times: riseTransitSetTimes(nightVisit(observer, night, track, events), state, night.timeZone, night.localDate),
  };
}
