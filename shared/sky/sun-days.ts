/** Sunrise and sunset per local date at a venue, for slide schedules tied to the Sun. */
import type { SunDay } from '../schedule/evaluate.ts';
import { Ephemeris } from './ephemeris.ts';
import type { Observer } from './horizon.ts';
import { STANDARD_ALTITUDE } from './rise-set.ts';
import { sunNight, type SunNight } from './sun-tonight.ts';
import { localToMs, nextDate } from './time-zone.ts';

const NOON = 12 * 60;

const addDays = (date: string, n: number) => {
  const [y, m, d] = date.split('-').map(Number);
  return new Date(Date.UTC(y, m - 1, d + n)).toISOString().slice(0, 10);
};

/** Why the Sun's crossing is missing from a noon-to-noon window: it stayed above, or below, the horizon. */
const missing = (night: SunNight) => (night.lowest.altitudeDeg > STANDARD_ALTITUDE.sun ? 'sun_up' : 'sun_down');

/**
 * The morning sunrise and evening sunset of each local date from `firstDate`, `count` days, with
 * the same sunset definition as the sky tonight (upper limb, standard refraction: −0°50′; Meeus
 * ch. 15). A date's sunset is the evening crossing of its night (local noon to noon), its sunrise the
 * morning crossing that ends the night before; a missing one says whether the Sun stays up or down.
 * @param observer the venue's position
 * @param timeZone the venue's IANA time zone
 * @param firstDate "YYYY-MM-DD"
 * @param count how many dates (1–31)
 */
export function sunDays(observer: Observer, timeZone: string, firstDate: string, count: number): SunDay[] {
  const ephemeris = new Ephemeris();
  const nights = new Map<string, SunNight>();
  const night = (date: string) => {
    let n = nights.get(date);
    if (!n) {
      n = sunNight(
        observer,
        localToMs(date, NOON, timeZone),
        localToMs(nextDate(date), NOON, timeZone),
        ephemeris,
        timeZone,
        date,
      );
      nights.set(date, n);
    }
    return n;
  };
  const out: SunDay[] = [];
  for (let i = 0; i < Math.max(1, Math.min(31, count)); i += 1) {
    const date = addDays(firstDate, i);
    const evening = night(date);
    const morning = night(addDays(date, -1));
    const rise = morning.dawn.sunrise;
    const set = evening.dusk.sunset;
    out.push({
      date,
      sunrise: rise === null ? null : new Date(rise).toISOString(),
      sunset: set === null ? null : new Date(set).toISOString(),
      ...(rise === null ? { no_sunrise: missing(morning) } : {}),
      ...(set === null ? { no_sunset: missing(evening) } : {}),
    });
  }
  return out;
}
