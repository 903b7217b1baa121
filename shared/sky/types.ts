/**
 * The sky tonight for one venue and date, as stored in a snapshot and sent to the staff screens:
 * plain JSON, numbers with their units in the field names, and words for every case a time
 * cannot describe (a body that never sets, a night that never gets dark).
 */
import type { CompassPoint } from './angles.ts';
import type { PlanetId } from './bodies.ts';

/**
 * Whether an event happens: "occurs" (a clear crossing), "none", or "grazes": the body's highest or
 * lowest point comes within GRAZE_MARGIN_DEG (0.1°) of the altitude, so it crosses only just (the
 * time is given) or misses only just (no time). Refraction at the horizon changes by more than that
 * from night to night, so a grazing event is never promised as a plain time.
 */
export type EventState = 'occurs' | 'grazes' | 'none';

/** How close a grazing body comes: its highest or lowest point near the altitude. */
export interface GrazeNote {
  /** Whether it gets past the altitude at all (then by less than the margin). */
  crosses: boolean;
  /** The body's highest or lowest point near the altitude: when (UTC and venue clock). */
  closestUtc: string;
  closestLocalTime: string;
  /** Degrees past the altitude there (positive) or short of it (negative), to 0.01°. */
  pastDeg: number;
  /** The margin that counts as grazing, degrees. */
  marginDeg: number;
}

/** A moment in the night, or the words for why there is none. */
export interface SkyEvent {
  /** "occurs", "grazes" (within 0.1°: crossed or missed only just) or "none". */
  state: EventState;
  /** ISO 8601 instant in UTC, or null when it does not happen in the window. */
  utc: string | null;
  /** The same instant on the venue's clock as ISO 8601 with its UTC offset, to the second, or null. */
  local: string | null;
  /** Local date "YYYY-MM-DD" at the venue, or null. */
  localDate: string | null;
  /** Local clock time "HH:MM" at the venue, or null. */
  localTime: string | null;
  /** For a person: "21:14", "04:52 tomorrow", or why there is no time. */
  text: string;
  /** For a grazing event: how close the body comes; otherwise null. */
  graze: GrazeNote | null;
}

/** Which side of the horizon a body keeps during the window. */
export type HorizonState = 'rises-and-sets' | 'always-up' | 'always-down';

/**
 * The first rise between noon on the date and noon the next day, and the transit and set of that
 * same stay above the horizon (the set may fall after noon tomorrow).
 */
export interface RiseTransitSetTimes {
  state: HorizonState;
  rise: SkyEvent;
  transit: SkyEvent;
  set: SkyEvent;
  /** When the body is already up at noon and sets before the rise shown: that set; otherwise null. */
  earlierSet: SkyEvent | null;
  /** When the stay shown is the one under way at noon (an evening object): its next rise; otherwise null. */
  laterRise: SkyEvent | null;
  /** One sentence, e.g. "Rises 19:02, highest 00:41 tomorrow, sets 06:20 tomorrow". */
  summary: string;
}

/** Where a body is at the observation time. */
export interface SkyPlace {
  rightAscensionDeg: number;
  declinationDeg: number;
  /** "21h 04m 41s" */
  rightAscensionText: string;
  /** "−18° 53′ 17″" */
  declinationText: string;
  /** Geometric altitude of the centre, degrees (no refraction; topocentric for the Moon). */
  altitudeDeg: number;
  /** Degrees from north through east. */
  azimuthDeg: number;
  direction: CompassPoint;
  /** Above the standard altitude used for rising and setting. */
  aboveHorizon: boolean;
}

/** One planet tonight. */
export interface PlanetTonight extends SkyPlace {
  id: PlanetId;
  name: string;
  /** Above the horizon at some time between dusk and dawn. */
  upAfterDusk: boolean;
  /** Plain words on whether and when to look. */
  visibility: string;
  /** Angle from the Sun, degrees. */
  elongationDeg: number;
  /** Distance from the Earth's centre along the light's path, in astronomical units. */
  distanceAu: number;
  /** The same distance in kilometres. */
  distanceKm: number;
  /** How long its light takes to reach us, in seconds. */
  lightTimeSeconds: number;
  times: RiseTransitSetTimes;
}

/** The Moon tonight. */
export interface MoonTonight extends SkyPlace {
  /** "Waxing gibbous" and so on. */
  phaseName: string;
  /** Illuminated fraction of the disc, 0–1 (Meeus 48.1). */
  illuminatedFraction: number;
  /** Phase angle Sun–Moon–Earth, degrees (Meeus 48.2/48.3). */
  phaseAngleDeg: number;
  /** Elongation: the Moon's angle from the Sun on the sky (geocentric), degrees [0, 180]. */
  elongationDeg: number;
  /** The Moon's ecliptic longitude minus the Sun's, degrees [0, 360): under 180 waxing; names the phase. */
  longitudeFromSunDeg: number;
  waxing: boolean;
  distanceKm: number;
  times: RiseTransitSetTimes;
}

/** How dark the night gets. */
export type DarknessKind = 'astronomical' | 'nautical' | 'civil' | 'twilight-all-night' | 'no-night' | 'dark-all-day';

/** Sunset, sunrise and the three twilights. */
export interface SunTonight {
  sunset: SkyEvent;
  sunrise: SkyEvent;
  civilDusk: SkyEvent;
  nauticalDusk: SkyEvent;
  astronomicalDusk: SkyEvent;
  astronomicalDawn: SkyEvent;
  nauticalDawn: SkyEvent;
  civilDawn: SkyEvent;
  /** How dark the night gets; `grazes` when the Sun's lowest point is within 0.1° of a twilight's altitude. */
  darkness: { kind: DarknessKind; text: string; grazes: boolean; lowestSunAltitudeDeg: number };
}

/** The moment the positions are given for. */
export interface Observation extends SkyEvent {
  basis: 'chosen' | 'nautical-dusk' | 'civil-dusk' | 'sunset' | 'sun-lowest';
  /** Whether the Sun is below −6° then (planets can be seen). */
  skyDark: boolean;
}

/**
 * Version 2: rise, transit and set come from one stay above the horizon (earlierSet added); visibility
 * names a set before dawn. Version 3: a body up at noon and still up at sunset keeps tonight's stay.
 * Version 4: crossings found from the altitude itself; events carry a state ("occurs", "grazes",
 * "none"), a local ISO time and how close a grazing body comes.
 * Version 5: the Moon's elongationDeg is its angle from the Sun (it was the longitude difference, now
 * longitudeFromSunDeg).
 */
export const SKY_VERSION = 5;

/** Everything the sky-tonight panel and slide show. */
export interface SkyTonight {
  /** The shape and rules the snapshot was made with; a stored snapshot of another version is recomputed. */
  version: typeof SKY_VERSION;
  localDate: string;
  timeZone: string;
  observer: { latitude: number; longitude: number; elevationM: number };
  /** When this was computed (the caller's clock). */
  computedAt: string;
  /** Noon on the date to noon the next day, local time. */
  window: { startUtc: string; endUtc: string };
  observation: Observation;
  sun: SunTonight;
  moon: MoonTonight;
  planets: PlanetTonight[];
  method: { ephemeris: string; algorithms: string[]; notes: string[] };
}
