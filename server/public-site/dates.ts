/**
 * A date as visitors read it, "3 December 2026", in the page's locale (the day in UTC, so every
 * server prints the same).
 * @param iso an ISO 8601 instant
 * @param locale BCP 47
 */
export function longDate(iso: string, locale: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return iso;
  return new Intl.DateTimeFormat(locale, { dateStyle: 'long', timeZone: 'UTC' }).format(date);
}
