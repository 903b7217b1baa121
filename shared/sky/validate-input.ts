/** Checks the inputs to the sky computations, so bad data fails with words rather than NaN. */
import { SkyInputError } from './errors.ts';
import { canonicalTimeZone, isLocalDate } from './time.ts';

/** A venue and a night to compute. */
export interface SkyRequest {
  /** Degrees, −90 (south pole) to 90 (north pole). */
  latitude: number;
  /** Degrees, east positive, −180 to 180. */
  longitude: number;
  /** Metres above sea level. */
  elevationM: number;
  /** IANA time zone, e.g. "Europe/London". */
  timeZone: string;
  /** The evening's local date "YYYY-MM-DD". */
  localDate: string;
  /** Optional local clock time "HH:MM" for the positions; before 12:00 means the next morning. */
  observeAt?: string;
  /** The caller's clock: recorded as computedAt (nothing in shared/ reads the clock). */
  now: Date | number;
}

/**
 * Returns the request with a canonical time zone.
 * @throws SkyInputError naming the field at fault
 */
export function checkSkyRequest(request: SkyRequest): SkyRequest {
  const { latitude, longitude, elevationM } = request;
  if (typeof latitude !== 'number' || !Number.isFinite(latitude) || latitude < -90 || latitude > 90) {
    throw new SkyInputError('latitude', 'Latitude must be a number of degrees from −90 (south pole) to 90 (north pole).');
  }
  if (typeof longitude !== 'number' || !Number.isFinite(longitude) || longitude < -180 || longitude > 180) {
    throw new SkyInputError('longitude', 'Longitude must be a number of degrees from −180 to 180 (east positive).');
  }
  if (typeof elevationM !== 'number' || !Number.isFinite(elevationM) || elevationM < -500 || elevationM > 9000) {
    throw new SkyInputError('elevationM', 'Elevation must be a number of metres from −500 to 9000.');
  }
  const timeZone = canonicalTimeZone(request.timeZone);
  if (!timeZone)
    throw new SkyInputError(
      'timeZone',
      `"${String(request.timeZone)}" is not a time zone this system knows; use an IANA name such as Europe/London.`,
    );
  if (typeof request.localDate !== 'string' || !isLocalDate(request.localDate)) {
    throw new SkyInputError('localDate', 'The date must be a real calendar date written YYYY-MM-DD, between 1800 and 2200.');
  }
  if (request.observeAt !== undefined && !/^([01]\d|2[0-3]):[0-5]\d$/.test(request.observeAt)) {
    throw new SkyInputError('observeAt', 'The time must be written HH:MM on the 24-hour clock.');
  }
  const now = request.now instanceof Date ? request.now.getTime() : request.now;
  if (typeof now !== 'number' || !Number.isFinite(now)) throw new SkyInputError('now', 'A valid current time must be passed in.');
  return { ...request, timeZone };
}
