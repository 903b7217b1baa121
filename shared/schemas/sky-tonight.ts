/**
 * The sky tonight as JSON (what a venue's sky snapshot stores and the calculation contract's
 * `sky_tonight` returns), as a zod schema so a script or a test can check it. Mirrors
 * shared/sky/types.ts; the `satisfies` checks below keep the two in step.
 */
import { z } from 'zod';
import type { SkyTonight } from '../sky/types.ts';

const GrazeNoteSchema = z.object({
  crosses: z.boolean(),
  closestUtc: z.string(),
  closestLocalTime: z.string(),
  pastDeg: z.number(),
  marginDeg: z.number(),
});

/** A moment: its state, UTC and local ISO times (null when it does not happen), and words. */
export const SkyEventSchema = z.object({
  state: z.enum(['occurs', 'grazes', 'none']),
  utc: z.string().nullable(),
  local: z.string().nullable(),
  localDate: z.string().nullable(),
  localTime: z.string().nullable(),
  text: z.string(),
  graze: GrazeNoteSchema.nullable(),
});

const TimesSchema = z.object({
  state: z.enum(['rises-and-sets', 'always-up', 'always-down']),
  rise: SkyEventSchema,
  transit: SkyEventSchema,
  set: SkyEventSchema,
  earlierSet: SkyEventSchema.nullable(),
  laterRise: SkyEventSchema.nullable(),
  summary: z.string(),
});

const PlaceSchema = z.object({
  rightAscensionDeg: z.number(),
  declinationDeg: z.number(),
  rightAscensionText: z.string(),
  declinationText: z.string(),
  altitudeDeg: z.number(),
  azimuthDeg: z.number(),
  direction: z.string(),
  aboveHorizon: z.boolean(),
});

/** The whole sky tonight for one place and night. */
export const SkyTonightSchema = z.object({
  version: z.number(),
  localDate: z.string(),
  timeZone: z.string(),
  observer: z.object({ latitude: z.number(), longitude: z.number(), elevationM: z.number() }),
  computedAt: z.string(),
  window: z.object({ startUtc: z.string(), endUtc: z.string() }),
  observation: SkyEventSchema.extend({
    basis: z.enum(['chosen', 'nautical-dusk', 'civil-dusk', 'sunset', 'sun-lowest']),
    skyDark: z.boolean(),
  }),
  sun: z.object({
    sunset: SkyEventSchema,
    sunrise: SkyEventSchema,
    civilDusk: SkyEventSchema,
    nauticalDusk: SkyEventSchema,
    astronomicalDusk: SkyEventSchema,
    astronomicalDawn: SkyEventSchema,
    nauticalDawn: SkyEventSchema,
    civilDawn: SkyEventSchema,
    darkness: z.object({
      kind: z.enum(['astronomical', 'nautical', 'civil', 'twilight-all-night', 'no-night', 'dark-all-day']),
      text: z.string(),
      grazes: z.boolean(),
      lowestSunAltitudeDeg: z.number(),
    }),
  }),
  moon: PlaceSchema.extend({
    phaseName: z.string(),
    illuminatedFraction: z.number(),
    phaseAngleDeg: z.number(),
    elongationDeg: z.number(),
    longitudeFromSunDeg: z.number(),
    waxing: z.boolean(),
    distanceKm: z.number(),
    times: TimesSchema,
  }),
  planets: z.array(
    PlaceSchema.extend({
      id: z.string(),
      name: z.string(),
      upAfterDusk: z.boolean(),
      visibility: z.string(),
      elongationDeg: z.number(),
      distanceAu: z.number(),
      distanceKm: z.number(),
      lightTimeSeconds: z.number(),
      times: TimesSchema,
    }),
  ),
  method: z.object({ ephemeris: z.string(), algorithms: z.array(z.string()), notes: z.array(z.string()) }),
});

// Every SkyTonight the engine makes must pass the schema (compile-time check of the field names).
type Parsed = z.infer<typeof SkyTonightSchema>;
export type SkyTonightCheck = SkyTonight extends Parsed ? true : never;
const _inStep: SkyTonightCheck = true;
void _inStep;
