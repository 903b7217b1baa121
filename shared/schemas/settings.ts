import { z } from 'zod';
import { CalcModelSchema } from './calc.ts';
import { AdoptableModelSchema } from './cosmology-check.ts';
import { STATEMENT_LOCALES } from '../statements/locales.ts';
import { SKY_OBJECT_KINDS } from '../catalogue/kinds.ts';

/** One kind's default spectral index (f_ν ∝ ν^α), always with the source it comes from. */
export const SpectralIndexDefaultSchema = z.object({
  value: z
    .number({ message: 'The spectral index must be a number' })
    .min(-5, 'A spectral index below −5 is not plausible')
    .max(5, 'A spectral index above 5 is not plausible'),
  sigma: z.number().positive('The spread must be above 0').max(5).nullable().default(null),
  source: z
    .string({ message: 'Name the source of the default' })
    .trim()
    .min(5, 'Name the source of the default (a paper or handbook)')
    .max(300, 'The source is at most 300 characters'),
});
/**
 * Default spectral indices by object kind: used, as a stated assumption, for the K-correction of an
 * object without a measured one at a redshift where the K-correction matters.
 */
export const SpectralIndexDefaultsSchema = z.partialRecord(z.enum(SKY_OBJECT_KINDS), SpectralIndexDefaultSchema);
export type SpectralIndexDefaults = z.infer<typeof SpectralIndexDefaultsSchema>;

/** The organisation's range for H0 (km/s/Mpc) with where it comes from: the model's own uncertainty. */
export const H0RangeSettingSchema = z
  .object({
    low: z
      .number({ message: 'Low end of the H0 range: write a number in km/s/Mpc, e.g. 67' })
      .positive('Low end of the H0 range: H0 is above 0 km/s/Mpc')
      .max(200, 'Low end of the H0 range: at most 200 km/s/Mpc (measurements give about 67 to 74)'),
    high: z
      .number({ message: 'High end of the H0 range: write a number in km/s/Mpc, e.g. 74' })
      .positive('High end of the H0 range: H0 is above 0 km/s/Mpc')
      .max(200, 'High end of the H0 range: at most 200 km/s/Mpc (measurements give about 67 to 74)'),
    source: z
      .string({ message: 'Source of the H0 range: name the paper or handbook it comes from' })
      .trim()
      .min(10, 'Source of the H0 range: name the paper or handbook it comes from (10 characters or more)')
      .max(1000, 'Source of the H0 range: at most 1,000 characters'),
  })
  .refine((r) => r.low < r.high, { message: 'High end of the H0 range: it must be above the low end', path: ['high'] });
export type H0Range = z.infer<typeof H0RangeSettingSchema>;

export const SettingsDtoSchema = z.object({
  cosmologyModel: CalcModelSchema,
  cosmologyLabel: z.string(),
  defaultBand: z.string(),
  defaultLocale: z.enum(STATEMENT_LOCALES),
  eyeSafetyNotice: z.string(),
  spectralIndexDefaults: SpectralIndexDefaultsSchema,
  /** The H0 range statements use; null means the default (shown in h0RangeInUse). */
  h0Range: H0RangeSettingSchema.nullable(),
  h0RangeInUse: H0RangeSettingSchema,
  version: z.number(),
  updatedAt: z.string(),
});
export type SettingsDto = z.infer<typeof SettingsDtoSchema>;

export const SettingsUpdateSchema = z
  .object({
    defaultBand: z.string().min(1).max(20).optional(),
    defaultLocale: z.enum(STATEMENT_LOCALES, { message: `Locale must be one of ${STATEMENT_LOCALES.join(', ')}` }).optional(),
    eyeSafetyNotice: z
      .string()
      .trim()
      .min(40, 'The eye-safety notice must say enough to be useful (40 characters or more)')
      .max(2000)
      .optional(),
    spectralIndexDefaults: SpectralIndexDefaultsSchema.optional(),
    /** null goes back to the default range. */
    h0Range: H0RangeSettingSchema.nullable().optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change' });
export type SettingsUpdateInput = z.infer<typeof SettingsUpdateSchema>;

export const CosmologyChangeSchema = z.object({
  model: AdoptableModelSchema,
  /** The settings version the admin previewed against; a newer one means someone else changed it. */
  expectedVersion: z.number().int().positive(),
});
export type CosmologyChangeInput = z.infer<typeof CosmologyChangeSchema>;

export const CosmologyPreviewSchema = z.object({ model: AdoptableModelSchema });
export type CosmologyPreviewInput = z.infer<typeof CosmologyPreviewSchema>;

/** One statement whose public text a model change would move. */
export const PreviewRowSchema = z.object({
  statementId: z.string(),
  objectName: z.string(),
  templateTitle: z.string(),
  oldText: z.string().nullable(),
  newText: z.string().nullable(),
  newStatus: z.enum(['current', 'changed', 'broken']),
  reason: z.string().nullable(),
});
export type PreviewRow = z.infer<typeof PreviewRowSchema>;
