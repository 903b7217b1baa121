import { z } from 'zod';
import { canonicalTimeZone, isLocalDate } from '../sky/time-zone.ts';
import { VenueLimits } from '../validations.ts';

const name = z
  .string({ message: 'Enter a name' })
  .trim()
  .min(1, 'Enter a name')
  .max(VenueLimits.nameMax, `Names are at most ${VenueLimits.nameMax} characters`);

/** Numbers from JSON, or from a form's text field. */
const number = (what: string) =>
  z.preprocess(
    (v) => (typeof v === 'string' && v.trim() !== '' ? Number(v) : v),
    z.number({ message: `Enter the ${what} as a number` }).refine(Number.isFinite, `Enter the ${what} as a number`),
  );

const latitude = number('latitude').pipe(
  z
    .number()
    .min(-90, 'Latitude is from −90 (south pole) to 90 (north pole)')
    .max(90, 'Latitude is from −90 (south pole) to 90 (north pole)'),
);
const longitude = number('longitude').pipe(
  z.number().min(-180, 'Longitude is from −180 to 180 (east positive)').max(180, 'Longitude is from −180 to 180 (east positive)'),
);
const elevationM = number('elevation').pipe(
  z.number().min(-500, 'Elevation is from −500 to 9000 metres').max(9000, 'Elevation is from −500 to 9000 metres'),
);

/** An IANA time zone the runtime knows, stored under its canonical name. */
export const TimeZoneSchema = z
  .string({ message: 'Choose a time zone' })
  .trim()
  .min(1, 'Choose a time zone')
  .transform((value, ctx) => {
    const canonical = canonicalTimeZone(value);
    if (!canonical) {
      ctx.addIssue({
        code: 'custom',
        message: `"${value.slice(0, 64)}" is not a time zone; use an IANA name such as Europe/London`,
      });
      return z.NEVER;
    }
    return canonical;
  });

export const VenueCreateSchema = z.object({
  name,
  latitude,
  longitude,
  elevationM: elevationM.default(0),
  timeZone: TimeZoneSchema,
});
export type VenueCreateInput = z.input<typeof VenueCreateSchema>;
export type VenueCreateValues = z.output<typeof VenueCreateSchema>;

export const VenueUpdateSchema = z
  .object({
    name: name.optional(),
    latitude: latitude.optional(),
    longitude: longitude.optional(),
    elevationM: elevationM.optional(),
    timeZone: TimeZoneSchema.optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'Nothing to change' });
export type VenueUpdateValues = z.output<typeof VenueUpdateSchema>;

/** A venue as the API shows it. */
export const VenueDtoSchema = z.object({
  id: z.string(),
  name: z.string(),
  latitude: z.number(),
  longitude: z.number(),
  elevationM: z.number(),
  timeZone: z.string(),
  isDemo: z.boolean(),
  screenCount: z.number(),
  createdAt: z.string(),
  updatedAt: z.string(),
  can: z.object({ update: z.boolean(), delete: z.boolean(), manageScreens: z.boolean() }),
});
export type VenueDto = z.infer<typeof VenueDtoSchema>;

/** A venue as a choice in a list (e.g. the venue a statement is for): every member of staff sees these. */
export const VenueChoiceDtoSchema = z.object({ id: z.string(), name: z.string(), timeZone: z.string() });
export type VenueChoiceDto = z.infer<typeof VenueChoiceDtoSchema>;

/** Query for the sky of a venue: an optional date and clock time. */
export const SkyQuerySchema = z.object({
  date: z
    .string()
    .refine(isLocalDate, 'The date must be a real calendar date written YYYY-MM-DD, between 1800 and 2200')
    .optional(),
  at: z
    .string()
    .regex(/^([01]\d|2[0-3]):[0-5]\d$/, 'The time must be written HH:MM on the 24-hour clock')
    .optional(),
});
export type SkyQuery = z.infer<typeof SkyQuerySchema>;
