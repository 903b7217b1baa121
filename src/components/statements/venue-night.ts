import type { StatementDto } from '@shared/schemas/statement.ts';
import { formatCalendarDate, formatTimeIn } from '@/lib/format-date.ts';

/** A venue's night "YYYY-MM-DD" as a person reads it (the date is the evening's, not an instant). */
export const nightDate = (localDate: string): string => formatCalendarDate(localDate);

/**
 * Which venue and night a statement is for, in words ("for Corrie Vale Planetarium (demo), night of
 * 3 Dec 2026"), or null for a statement about the object alone.
 */
export function venueNightText(statement: Pick<StatementDto, 'venue' | 'night'>): string | null {
  if (!statement.venue) return null;
  return `for ${statement.venue.name}${statement.night ? `, night of ${nightDate(statement.night.localDate)}` : ''}`;
}

/** An instant as the venue's clock shows it ("17:20", to the nearest minute as the sky shows times), in its own time zone. */
export const venueClock = (utc: string, timeZone: string): string =>
  formatTimeIn(new Date(Math.round(Date.parse(utc) / 60_000) * 60_000), timeZone);
