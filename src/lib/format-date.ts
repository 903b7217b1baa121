/**
 * The client's one way of writing a moment, in the reader's own locale and time zone: a date with
 * the time to the minute ("3 Dec 2026, 10:15" in en-GB), or the time alone where the day is plain
 * (today's last save, a pairing code's expiry). Formatters are built once: Intl's are costly to make.
 */
const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const time = new Intl.DateTimeFormat(undefined, { timeStyle: 'short' });
// A calendar date has no instant: it is read at noon UTC and written in UTC, so no time zone moves it a day.
const calendarDate = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeZone: 'UTC' });

const asDate = (value: string | Date) => (typeof value === 'string' ? new Date(value) : value);

/**
 * A moment as date and time to the minute.
 * @param value an ISO 8601 string from the API, or a Date
 */
export const formatDateTime = (value: string | Date): string => dateTime.format(asDate(value));

/**
 * A moment as time of day to the minute.
 * @param value an ISO 8601 string from the API, or a Date
 */
export const formatTime = (value: string | Date): string => time.format(asDate(value));

/**
 * A calendar date ("YYYY-MM-DD", e.g. a venue's night) in the same style as the date of
 * formatDateTime ("3 Dec 2026" in en-GB), whatever the reader's time zone.
 * @param localDate the date as the API sends it
 */
export const formatCalendarDate = (localDate: string): string => calendarDate.format(new Date(`${localDate}T12:00:00Z`));

/**
 * A moment as the time of day on another place's clock (a venue's), to the minute, in the same
 * style as formatTime.
 * @param value an ISO 8601 string from the API, or a Date
 * @param timeZone the place's IANA time zone
 */
export const formatTimeIn = (value: string | Date, timeZone: string): string =>
  new Intl.DateTimeFormat(undefined, { timeStyle: 'short', timeZone }).format(asDate(value));
