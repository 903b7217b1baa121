/** Shared pieces of each body's night: its place at the observation time and whether it can be seen. */
import { compassPoint, DEG, formatDeclination, formatRightAscension } from './angles.ts';
import { altitudeAt, type Trackable, type WindowEvents } from './body-track.ts';
import type { ApparentPlace } from './ephemeris.ts';
import { skyEvent } from './events.ts';
import { toHorizontal, topocentricAltitude, type Observer } from './horizon.ts';
import { jdFromMs } from './time.ts';
import type { HorizonState, SkyPlace } from './types.ts';

/**
 * A place on the sky as seen by the observer at an instant.
 * @param h0Deg the standard altitude that counts as above the horizon
 * @param parallaxDeg horizontal parallax for a topocentric altitude (the Moon); 0 for the planets
 */
export function placeFor(place: ApparentPlace, observer: Observer, ms: number, h0Deg: number, parallaxDeg = 0): SkyPlace {
  const horizontal = toHorizontal(place.ra, place.dec, observer, jdFromMs(ms));
  const altitudeDeg = parallaxDeg ? topocentricAltitude(horizontal.altitudeDeg, parallaxDeg) : horizontal.altitudeDeg;
  // At a geographic pole every direction is south (north pole) or north (south pole).
  const atPole = Math.abs(observer.latitude) > 89.9999;
  const azimuthDeg = atPole ? (observer.latitude > 0 ? 180 : 0) : horizontal.azimuthDeg;
  return {
    rightAscensionDeg: place.ra / DEG,
    declinationDeg: place.dec / DEG,
    rightAscensionText: formatRightAscension(place.ra / DEG),
    declinationText: formatDeclination(place.dec / DEG),
    altitudeDeg,
    azimuthDeg,
    direction: compassPoint(azimuthDeg),
    aboveHorizon: altitudeDeg > h0Deg,
  };
}

/** Which side of the horizon a body keeps, from the events found and its altitude mid-window. */
export function horizonState(events: WindowEvents, altitudeMidDeg: number, h0Deg: number): HorizonState {
  if (events.rises.length || events.sets.length) return 'rises-and-sets';
  return altitudeMidDeg > h0Deg ? 'always-up' : 'always-down';
}

/** What every body's computation shares for the night. */
export interface NightContext {
  startMs: number;
  endMs: number;
  /** Local noon the day after the window ends: how far a stay that begins in the window is followed. */
  followingEndMs: number;
  /** Sunset at the venue tonight (null in polar day or night): a stay that lasts past it is tonight's. */
  sunsetMs: number | null;
  midMs: number;
  obs: { ms: number; dark: { from: number; to: number } | null };
  /** "HH:MM" of the observation, for words. */
  obsLocalTime: string;
  obsJde: number;
  sunAtObs: ApparentPlace;
  timeZone: string;
  localDate: string;
}

/** Angle between two places on the sky, degrees. */
export function angularSeparationDeg(a: ApparentPlace, b: ApparentPlace): number {
  const c = Math.sin(a.dec) * Math.sin(b.dec) + Math.cos(a.dec) * Math.cos(b.dec) * Math.cos(a.ra - b.ra);
  return Math.acos(Math.max(-1, Math.min(1, c))) / DEG;
}

/** What describeVisibility looks at. */
export interface VisibilityInput {
  observer: Observer;
  night: NightContext;
  track: Trackable;
  events: WindowEvents;
  state: HorizonState;
  place: SkyPlace;
  h0: number;
  elongationDeg: number;
  /** Closer to the Sun than this, a body is lost in twilight glare (common practice: about 10°). */
  minElongationDeg: number;
}

/**
 * Whether a body is above the horizon at some time between dusk and dawn, and words on when to look.
 * @returns upAfterDusk and a sentence for the visibility column
 */
export function describeVisibility(v: VisibilityInput): { upAfterDusk: boolean; visibility: string } {
  const dark = v.night.obs.dark;
  if (!dark) return { upAfterDusk: false, visibility: 'The sky does not get dark tonight.' };
  let upAfterDusk: boolean;
  if (v.state === 'always-up') upAfterDusk = true;
  else if (v.state === 'always-down') upAfterDusk = false;
  else {
    const upAtDusk = altitudeAt(v.observer, dark.from, v.track).altitudeDeg > v.h0;
    upAfterDusk = upAtDusk || v.events.rises.some((t) => t > dark.from && t < dark.to);
  }
  const when = (ms: number) => skyEvent(ms, v.night.timeZone, v.night.localDate, '').text;
  if (v.elongationDeg < v.minElongationDeg) {
    return { upAfterDusk, visibility: `Too close to the Sun to see: ${Math.round(v.elongationDeg)}° from it.` };
  }
  if (v.place.aboveHorizon) {
    // Setting before dawn is what tells an evening planet from one that stays up all night.
    const setsInDark = v.events.sets.find((t) => t > v.night.obs.ms && t < dark.to);
    const setting = setsInDark === undefined ? '' : `; sets ${when(setsInDark)}`;
    return {
      upAfterDusk,
      visibility: `${Math.max(0, Math.round(v.place.altitudeDeg))}° up in the ${v.place.direction} at ${v.night.obsLocalTime}${setting}.`,
    };
  }
  if (!upAfterDusk) return { upAfterDusk, visibility: 'Not above the horizon between dusk and dawn.' };
  const laterRise = v.events.rises.find((t) => t > v.night.obs.ms && t < dark.to);
  if (laterRise !== undefined) {
    // Rising in the last few hours of darkness makes it a morning object.
    const morning = dark.to - laterRise < (dark.to - dark.from) / 3;
    return {
      upAfterDusk,
      visibility: morning
        ? `Morning sky: rises ${when(laterRise)}, before dawn.`
        : `Rises ${when(laterRise)}; below the horizon at ${v.night.obsLocalTime}.`,
    };
  }
  const earlierSet = v.events.sets.find((t) => t > dark.from && t < v.night.obs.ms);
  if (earlierSet !== undefined) return { upAfterDusk, visibility: `Low after dusk; sets ${when(earlierSet)}.` };
  return { upAfterDusk, visibility: `Below the horizon at ${v.night.obsLocalTime}.` };
}
