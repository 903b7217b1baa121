/**
 * The client's one way of writing a moment, in the reader's own locale and time zone: a date with
 * the time to the minute ("3 Dec 2026, 10:15" in en-GB), or the time alone where the day is plain
 * (today's last save, a pairing code's expiry). Formatters are built once: Intl's are costly to make.
 */
const dateTime = new Intl.DateTimeFormat(undefined, { dateStyle: 'medium', timeStyle: 'short' });
const time = new Intl.DateTimeFormat(undefined, { timeStyle: 'short' });

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
