import type { SlideSchedule } from '@shared/schemas/slide-schedule.ts';
import type { SunDay } from '@shared/schedule/evaluate.ts';
import { sunDays } from '@shared/sky/sun-days.ts';
import { localDateOf } from '@shared/sky/time-zone.ts';
import type { Venue } from '../../models/index.ts';

/** Days of sunrise and sunset the feed carries: yesterday (for a window still open past midnight) and a week ahead. */
export const FEED_SUN_DAYS = 8;

const cache = new Map<string, SunDay[]>();

/** Whether a schedule depends on the Sun (only then does the feed need sunrise and sunset). */
export const followsTheSun = (s: SlideSchedule | null | undefined): boolean =>
  !!s && (s.from?.at === 'sunrise' || s.from?.at === 'sunset' || s.until?.at === 'sunrise' || s.until?.at === 'sunset');

/**
 * Sunrise and sunset at the venue from yesterday for FEED_SUN_DAYS days (local dates), computed
 * once per venue position and local date (about 60 ms a day on the shared machine, so it is kept).
 */
export function venueSunDays(
  venue: Pick<Venue, 'id' | 'latitude' | 'longitude' | 'elevationM' | 'timeZone'>,
  now: number,
): SunDay[] {
  const today = localDateOf(now, venue.timeZone);
  const key = [venue.id, venue.latitude, venue.longitude, venue.elevationM, venue.timeZone, today].join('|');
  const known = cache.get(key);
  if (known) return known;
  const [y, m, d] = today.split('-').map(Number);
  const yesterday = new Date(Date.UTC(y, m - 1, d - 1)).toISOString().slice(0, 10);
  const days = sunDays(
    { latitude: venue.latitude, longitude: venue.longitude, elevationM: venue.elevationM ?? 0 },
    venue.timeZone,
    yesterday,
    FEED_SUN_DAYS,
  );
  for (const k of cache.keys()) if (k.startsWith(`${venue.id}|`)) cache.delete(k);
  cache.set(key, days);
  return days;
}
