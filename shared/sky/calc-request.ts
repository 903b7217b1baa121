/**
 * The sky tonight on the calculation contract: `{"quantity": "sky_tonight", "inputs": {"latitude",
 * "longitude", "elevation_m", "time_zone", "night"}}` answered with the same data a venue's sky
 * snapshot holds, so the sky can be checked by script. Bad input becomes a CalcError naming the
 * input in the contract's own words.
 */
import { CalcError, shown } from '../engine/errors.ts';
import { SKY_TONIGHT, SkyTonightRequestSchema, type SkyTonightSuccess } from '../schemas/calc.ts';
import { SkyInputError } from './errors.ts';
import { computeSkyTonight } from './tonight.ts';

/** The sky code's field names, as the contract spells them. */
const CONTRACT_FIELD: Record<string, string> = {
  latitude: 'latitude',
  longitude: 'longitude',
  elevationM: 'elevation_m',
  timeZone: 'time_zone',
  localDate: 'night',
};

const NUMERIC = new Set(['latitude', 'longitude', 'elevation_m']);

function parse(raw: Record<string, unknown>) {
  const parsed = SkyTonightRequestSchema.safeParse(raw);
  if (parsed.success) return parsed.data;
  const issue = parsed.error.issues[0];
  const path = issue.path.map(String);
  const inputs = (typeof raw.inputs === 'object' && raw.inputs !== null ? raw.inputs : {}) as Record<string, unknown>;
  if (issue.code === 'unrecognized_keys') {
    const where = path.length === 0 ? 'a sky_tonight request' : 'the inputs of sky_tonight';
    throw new CalcError(
      'invalid_input',
      `${issue.keys.map((k) => `"${k}"`).join(', ')} ${issue.keys.length > 1 ? 'are' : 'is'} not a known field of ${where}`,
    );
  }
  const field = path[0] === 'inputs' && path.length > 1 ? path[1] : path.join('.');
  const got = path[0] === 'inputs' ? (path.length > 1 ? inputs[path[1]] : raw.inputs) : raw[path[0]];
  if (got === undefined) {
    throw new CalcError(
      'missing_input',
      field === 'inputs'
        ? 'sky_tonight needs inputs: latitude, longitude, time_zone and night (elevation_m optional)'
        : `${field} is required for sky_tonight`,
    );
  }
  if (NUMERIC.has(field)) throw new CalcError('invalid_input', `${field} must be a finite number (got ${shown(got)})`);
  if (field === 'time_zone' || field === 'night') {
    const what =
      field === 'night' ? 'the evening’s local date written YYYY-MM-DD' : 'an IANA time zone name such as "Europe/London"';
    throw new CalcError('invalid_input', `${field} must be ${what} (got ${shown(got)})`);
  }
  throw new CalcError('invalid_input', `${field} is not valid: ${issue.message} (got ${shown(got)})`);
}

/**
 * Answers one `sky_tonight` request.
 * @param raw the request (a JSON object whose quantity is "sky_tonight")
 * @param now the clock to record as computedAt
 * @returns the sky for that place and night
 * @throws CalcError for bad input
 */
export function skyTonightResult(raw: Record<string, unknown>, now: number): Omit<SkyTonightSuccess, 'id'> {
  const request = parse(raw);
  const { latitude, longitude, elevation_m, time_zone, night } = request.inputs;
  try {
    const sky = computeSkyTonight({
      latitude,
      longitude,
      elevationM: elevation_m ?? 0,
      timeZone: time_zone,
      localDate: night,
      now,
    });
    return { quantity: SKY_TONIGHT, sky };
  } catch (e) {
    if (!(e instanceof SkyInputError)) throw e;
    const field = CONTRACT_FIELD[e.field] ?? e.field;
    const got = (request.inputs as Record<string, unknown>)[field];
    if (NUMERIC.has(field)) throw new CalcError('out_of_range', `${field}: ${e.message} (got ${shown(got)})`);
    throw new CalcError('invalid_input', `${field}: ${e.message}${field === 'night' ? ` (got ${shown(got)})` : ''}`);
  }
}
