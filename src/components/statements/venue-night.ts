import type { StatementDto } from '@shared/schemas/statement.ts';

const longDate = new Intl.DateTimeFormat(undefined, { dateStyle: 'long', timeZone: 'UTC' });

/** A venue's night "YYYY-MM-DD" as a person reads it (the date is the evening's, not an instant). */
export const nightDate = (localDate: string): string => longDate.format(new Date(`${localDate}T12:00:00Z`));

/**
 * Which venue and night a statement is for, in words ("for Corrie Vale Planetarium (demo), night of
 * 3 December 2026"), or null for a statement about the object alone.
 */
export function venueNightText(statement: Pick<StatementDto, 'venue' | 'night'>): string | null {
  if (!statement.venue) return null;
  return `for ${statement.venue.name}${statement.night ? `, night of ${nightDate(statement.night.localDate)}` : ''}`;
}

/** An instant as the venue's clock shows it ("17:20", to the nearest minute as the sky shows times), in its own time zone. */
export const venueClock = (utc: string, timeZone: string): string =>
  new Intl.DateTimeFormat(undefined, { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone }).format(
    new Date(Math.round(Date.parse(utc) / 60_000) * 60_000),
  );
