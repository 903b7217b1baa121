import { ASTRONOMICAL_UNIT, SPEED_OF_LIGHT } from '../../engine/constants.ts';
import { fromConstant } from '../../engine/working.ts';
import { PLANET_NAMES, type PlanetId } from '../../sky/bodies.ts';
import { compose, derivedStep } from '../compose.ts';
import { perLocale, type StatementLocale } from '../locales.ts';
import { nameIn } from '../names.ts';
import { formatApproximate } from '../number-words.ts';
import { choosePrecision, roundToSignificant, type PrecisionChoice } from '../precision.ts';
import {
  DISTANCE_RELATIVE_UNCERTAINTY,
  LARGEST_MEASURED_DIFFERENCE,
  requirePlanet,
  requireVenueNight,
  WINDOW_DRIFT,
  WORDING_WINDOW_HOURS,
} from '../tonight.ts';
import type { NightBasis, StatementNight, StatementTemplate, StatementVenue } from '../types.ts';
import { isFrench } from './words.ts';

/** Planet names in French (the catalogue's names are English). */
const FRENCH_NAMES: Record<PlanetId, string> = {
  mercury: 'Mercure',
  venus: 'Vénus',
  mars: 'Mars',
  jupiter: 'Jupiter',
  saturn: 'Saturne',
  uranus: 'Uranus',
  neptune: 'Neptune',
};

// Decided by planet, not by the night's value, so a planet's sentence keeps one shape all year:
// Uranus (about 2 h 40 min) and Neptune (about 4 h) read better in hours and minutes than as
// "160 minutes"; Saturn (70–90 min) stays in minutes, which compares directly with the others.
const IN_HOURS: ReadonlySet<PlanetId> = new Set(['uranus', 'neptune']);

/** Stands for the number in the sentence a reviewer signs off (NightBasis.method.wording). */
const NUMBER_SLOT = '…';

const plural = (n: number, en: string, fr: string, locale: StatementLocale) => {
  const word = isFrench(locale) ? fr : en;
  return (isFrench(locale) ? n >= 2 : n !== 1) ? `${word}s` : word;
};

/** The number of minutes the words say, for a value and a figure count (hours-and-minutes wording rounds to the minute). */
function wordedMinutes(minutes: number, significantFigures: number, inHours: boolean): number {
  const shown = roundToSignificant(minutes, significantFigures);
  return inHours ? Math.round(shown) : shown;
}

/** How a planet-light wording holds over the evening. */
interface WindowPrecision extends PrecisionChoice {
  /** True when the words are the same over the whole ±6 h window. */
  holds: boolean;
  /** Otherwise, minutes either side of the observation time within which they are certainly the same. */
  holdsForMinutes: number | null;
}

/**
 * Figures for a light time that must hold over the evening. Rounding is monotonic, so equal words at
 * the window's nearest and farthest distance mean equal words at every instant between. The rule's
 * figures are kept when they hold all evening, else one fewer when those do; when neither does (the
 * light time sits on a rounding boundary), one fewer all the same, and the working states how long
 * the words hold either side of the observation time: the time to the nearest rounding boundary at
 * the planet's largest rate of change (so at least that long).
 * @param minutes the light time at the observation time
 * @param rule the precision rule's choice from the ephemeris uncertainty
 * @param drift the planet's largest relative change within ±6 h
 */
function precisionForWindow(minutes: number, rule: PrecisionChoice, drift: number, inHours: boolean): WindowPrecision {
  const low = minutes * (1 - drift);
  const high = minutes * (1 + drift);
  const holdsAt = (k: number) => wordedMinutes(low, k, inHours) === wordedMinutes(high, k, inHours);
  const within = `Within ±${WORDING_WINDOW_HOURS} h of the observation time the light time stays within ${low.toPrecision(5)}–${high.toPrecision(5)} min`;
  const rn = rule.significantFigures;
  const named = (k: number) => `${k} significant figure${k > 1 ? 's' : ''}`;
  const choice = (n: number, reason: string, holdsForMinutes: number | null = null): WindowPrecision => ({
    significantFigures: n,
    relativeUncertainty: rule.relativeUncertainty,
    reason: `${rule.reason} ${reason}`,
    holds: holdsForMinutes === null,
    holdsForMinutes,
  });
  if (holdsAt(rn)) return choice(rn, `${within}, which rounds to the same words: the wording holds for the whole evening.`);
  const n = Math.max(1, rn - 1);
  if (holdsAt(n)) {
    return choice(n, `${within}; ${rn} figures would change during the evening, ${named(n)} hold for the whole evening.`);
  }
  // The nearest rounding boundary of the n-figure words, and the time to reach it at the largest rate.
  const place = 10 ** (Math.floor(Math.log10(minutes)) - n + 1);
  const step = inHours ? Math.max(1, place) : place;
  const shown = wordedMinutes(minutes, n, inHours);
  const margin = Math.max(0, step / 2 - Math.abs(minutes - shown));
  const ratePerMinute = (minutes * drift) / (WORDING_WINDOW_HOURS * 60);
  const holdsFor = Math.floor(margin / ratePerMinute / 10) * 10;
  return choice(
    n,
    `${within}, across a rounding boundary at ${rn} and at ${n} figures. Shown to ${named(n)}, which hold for at least ${holdsFor} minutes either side of the time in the footnote (the time to the nearest rounding boundary at the planet’s largest rate of change), and then move by one in the last figure.`,
    holdsFor,
  );
}

/** "43.2 minutes", "2 hours and 40 minutes", "4 heures 6 minutes", from minutes already rounded. */
function durationWords(locale: StatementLocale, minutes: number, significantFigures: number, inHours: boolean): string {
  if (!inHours)
    return `${formatApproximate(minutes, significantFigures, locale).text} ${plural(minutes, 'minute', 'minute', locale)}`;
  const shown = wordedMinutes(minutes, significantFigures, true);
  const h = Math.floor(shown / 60);
  const m = shown - h * 60;
  const hours = `${h} ${plural(h, 'hour', 'heure', locale)}`;
  if (m === 0) return hours;
  return `${hours}${isFrench(locale) ? ' ' : ' and '}${m} ${plural(m, 'minute', 'minute', locale)}`;
}

function sentence(locale: StatementLocale, englishName: string, planet: PlanetId, duration: string): string {
  if (!isFrench(locale)) return `Light from ${englishName} takes about ${duration} to reach us tonight.`;
  const name = FRENCH_NAMES[planet];
  return `La lumière ${/^[AEIOUYÉ]/.test(name) ? 'd’' : 'de '}${name} met environ ${duration} à nous parvenir ce soir.`;
}

const dateFormats = new Map<StatementLocale, Intl.DateTimeFormat>();
function longDate(locale: StatementLocale, localDate: string): string {
  let f = dateFormats.get(locale);
  if (!f) {
    f = new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeZone: 'UTC' });
    dateFormats.set(locale, f);
  }
  return f.format(new Date(`${localDate}T12:00:00Z`));
}

const WHEN: Record<string, [string, string]> = {
  'nautical-dusk': ['the end of nautical twilight', 'la fin du crépuscule nautique'],
  'civil-dusk': ['the end of civil twilight', 'la fin du crépuscule civil'],
  sunset: ['sunset', 'le coucher du Soleil'],
  'sun-lowest': ['the moment the Sun is lowest', 'le moment où le Soleil est au plus bas'],
  chosen: ['the chosen time', 'l’heure choisie'],
};

/** Which venue and night, as small print under the sentence. */
function nightFootnote(locale: StatementLocale, venue: StatementVenue, night: StatementNight): string {
  const [en, fr] = WHEN[night.observation.basis] ?? [night.observation.basis, night.observation.basis];
  const at = night.observation.localTime
    ? isFrench(locale)
      ? ` à ${night.observation.localTime.replace(':', ' h ')}`
      : ` at ${night.observation.localTime}`
    : '';
  return isFrench(locale)
    ? `Pour ${venue.name}, la nuit du ${longDate(locale, night.localDate)}${at}, heure locale (${fr}).`
    : `For ${venue.name} on the night of ${longDate(locale, night.localDate)}${at} local time (${en}).`;
}

/** "Light from Jupiter takes about 43 minutes to reach us tonight", for one venue and night. */
export const planetLightTonight: StatementTemplate = {
  id: 'planet-light-tonight',
  title: 'How long a planet’s light takes to reach us tonight',
  needs: 'a planet the sky engine computes (Mercury to Neptune) and the venue whose night it is',
  kinds: ['planet'],
  kindsReason: 'it follows a planet the sky engine computes (Mercury to Neptune) through one venue’s night.',
  usesCosmology: false,
  needsVenue: true,
  followsTonight: true,
  evaluate(ctx) {
    const planet = requirePlanet(ctx);
    const { venue, night, distanceAu } = requireVenueNight(ctx, planet);
    const k = DISTANCE_RELATIVE_UNCERTAINTY[planet];
    const kmPerAu = ASTRONOMICAL_UNIT.value / 1000;
    const seconds = (distanceAu * kmPerAu) / SPEED_OF_LIGHT.value;
    const minutes = seconds / 60;
    const inHours = IN_HOURS.has(planet);
    const place = `${venue.name} (${venue.latitude}°, ${venue.longitude}°, ${venue.elevationM} m, ${venue.timeZone})`;
    const distanceStep = derivedStep({
      title: `${PLANET_NAMES[planet]}’s distance from the Earth at the observation time`,
      formula: 'd = |r_planet(t − τ) − r_Earth(t)|, τ = d / c (light-time corrected, Meeus ch. 33)',
      inputs: [
        {
          symbol: 't',
          name: 'observation time (UTC)',
          value: night.observation.utc.replace(/\.\d+Z$/, 'Z'),
          unit: '',
          source: `the sky for ${place} on the night of ${night.localDate}, at ${WHEN[night.observation.basis]?.[0] ?? night.observation.basis}${night.observation.localTime ? ` (${night.observation.localTime} local time)` : ''}`,
        },
      ],
      result: { symbol: 'd', name: `distance of ${PLANET_NAMES[planet]} from the Earth’s centre`, value: distanceAu, unit: 'au' },
      note: `Ephemeris: ${night.ephemeris}. The venue sets the time (its dusk); the distance is from the Earth’s centre, and the venue’s own place moves it by less than one Earth radius (about 4.3 × 10⁻⁵ au; Earth radius 6371 km recalled from memory), far below the wording’s precision.`,
    });
    const sigmaStep = derivedStep({
      title: 'Uncertainty of the distance',
      formula: 'σ_d = k × d',
      inputs: [
        { symbol: 'd', name: 'distance', value: distanceAu, unit: 'au', source: 'previous step' },
        {
          symbol: 'k',
          name: `relative uncertainty given to ${PLANET_NAMES[planet]}’s distance`,
          value: k,
          unit: '',
          source: 'tolerance of our reference test against astropy 5.2.1’s built-in ephemeris (tests/reference/sky)',
        },
      ],
      result: { symbol: 'σ_d', name: 'uncertainty of the distance', value: k * distanceAu, unit: 'au' },
      note: `The ephemeris distance is far more precise than the wording needs. Largest difference measured against astropy, any planet, 1992–2040: ${LARGEST_MEASURED_DIFFERENCE} (relative), mostly the reference’s own error; full VSOP87 is good to about 1″ in position over these years (recalled from memory). The distance also changes during the evening; the wording step chooses figures that hold over it.`,
    });
    const timeStep = derivedStep({
      title: 'Light-travel time',
      formula: 't = d × au / c',
      inputs: [{ symbol: 'd', name: 'distance', value: distanceAu, unit: 'au', source: 'previous step' }],
      constants: [fromConstant(ASTRONOMICAL_UNIT), fromConstant(SPEED_OF_LIGHT)],
      result: { symbol: 't', name: 'light-travel time', value: seconds, unit: 's' },
      note: 'au in km is au [m] / 1000, so t [s] = d [au] × (au [m] / 1000) / c [km/s].',
    });
    const minutesStep = derivedStep({
      title: 'In minutes',
      formula: 't [min] = t [s] / 60',
      inputs: [{ symbol: 't', name: 'light-travel time', value: seconds, unit: 's', source: 'previous step' }],
      result: { symbol: 't', name: 'light-travel time', value: minutes, unit: 'min' },
      note: inHours
        ? `${PLANET_NAMES[planet]}’s light takes over two hours, so the wording gives hours and minutes.`
        : 'The wording gives minutes.',
    });
    const interval = { low: minutes * (1 - k), high: minutes * (1 + k) };
    const drift = WINDOW_DRIFT[planet];
    const window = { low: minutes * (1 - drift), high: minutes * (1 + drift) };
    const precision = precisionForWindow(minutes, choosePrecision(minutes, interval), drift, inHours);
    const figures = precision.significantFigures;
    const windowStep = derivedStep({
      title: `How far the light time moves during the evening (±${WORDING_WINDOW_HOURS} h)`,
      formula: 't_low, t_high = t × (1 ∓ δ)',
      inputs: [
        { symbol: 't', name: 'light-travel time', value: minutes, unit: 'min', source: 'previous step' },
        {
          symbol: 'δ',
          name: `largest relative change of ${PLANET_NAMES[planet]}’s distance within ±${WORDING_WINDOW_HOURS} h`,
          value: drift,
          unit: '',
          source: 'our ephemeris sampled 2020–2039, plus 15 % (shared/statements/tonight.ts)',
        },
      ],
      result: { symbol: 't_high − t_low', name: 'range over the evening', value: window.high - window.low, unit: 'min' },
      note: precision.holds
        ? `The wording keeps ${figures} significant figure${figures > 1 ? 's' : ''}: the same words at both ends of the evening.`
        : `On this night the light time sits on a rounding boundary: ${figures} significant figure${figures > 1 ? 's' : ''}, the same words for at least ${precision.holdsForMinutes} minutes either side of the time in the footnote, then one more or less in the last figure.`,
    });
    const english = nameIn(ctx.object, 'en-GB');
    const basis: NightBasis = {
      venueId: venue.id,
      localDate: night.localDate,
      observationUtc: night.observation.utc,
      method: {
        planet,
        venue: { latitude: venue.latitude, longitude: venue.longitude, elevationM: venue.elevationM, timeZone: venue.timeZone },
        ephemeris: night.ephemeris,
        skyVersion: night.skyVersion,
        constants: { auM: ASTRONOMICAL_UNIT.value, cKmS: SPEED_OF_LIGHT.value },
        wording: perLocale((locale) => sentence(locale, english, planet, NUMBER_SLOT)),
      },
    };
    const composed = compose({
      value: minutes,
      unit: 'min',
      interval,
      sentence: (locale) => sentence(locale, english, planet, durationWords(locale, minutes, figures, inHours)),
      footnote: (locale) => nightFootnote(locale, venue, night),
      working: [distanceStep, sigmaStep, timeStep, minutesStep, windowStep],
      inputs: [],
      model: null,
      precision,
    });
    return { ...composed, night: basis };
  },
};
