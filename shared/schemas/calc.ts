/**
 * The calculation contract: one request and one result schema shared by
 * `POST /api/calc`, `npm run calc` and the client. Numbers must be finite
 * (zod's number rejects NaN and ±Infinity); the engine adds the domain checks.
 */
import { z } from 'zod';
import { CatalogueLimits } from '../validations.ts';
import { SkyTonightSchema } from './sky-tonight.ts';

/** Every quantity the engine computes, in the order a user interface may list them. */
export const CALC_QUANTITIES = [
  'comoving_distance',
  'transverse_comoving_distance',
  'angular_diameter_distance',
  'luminosity_distance',
  'light_travel_distance',
  'proper_distance',
  'lookback_time',
  'age_at_z',
  'age_now',
  'hubble_parameter',
  'distance_modulus',
  'absolute_magnitude',
  'luminosity_ratio_sun',
  'z_from_lookback_time',
  'z_from_luminosity_distance',
  'parallax_distance',
  'flux_ratio',
] as const;

/** A quantity name. */
export const CalcQuantitySchema = z.enum(CALC_QUANTITIES);
export type CalcQuantity = z.infer<typeof CalcQuantitySchema>;

/** Units a result can be in ("" is dimensionless). */
export const CALC_UNITS = ['Mpc', 'Gyr', 'mag', 'km/s/Mpc', 'pc', ''] as const;

const finite = z.number();
const sigma = z.number().nonnegative();
/**
 * Longest source label on an input: a catalogue citation at its longest plus the reference to its
 * measurement that statements append (" (measurement <uuid>)"), with room to spare.
 */
export const SOURCE_LABEL_MAX = CatalogueLimits.citationMax + 100;
const source = z.string().max(SOURCE_LABEL_MAX).optional();

/**
 * A numeric input: a plain number, or a value with a symmetric (`sigma`) or
 * asymmetric (`minus`, `plus`) 68 % uncertainty, optionally naming its source.
 */
export const MeasuredInputSchema = z.union([
  finite,
  z.strictObject({ value: finite, sigma: sigma.optional(), source }),
  z.strictObject({ value: finite, minus: sigma, plus: sigma, source }),
]);
export type MeasuredInput = z.infer<typeof MeasuredInputSchema>;

/** Numeric input names, for user interfaces and validation. */
export const CALC_NUMERIC_INPUTS = [
  'z',
  'm',
  'extinction',
  'alpha',
  'parallax_mas',
  'lookback_gyr',
  'distance_mpc',
  'm1',
  'm2',
  'delta_mag',
  'distance_1',
  'distance_2',
] as const;
export type CalcNumericInput = (typeof CALC_NUMERIC_INPUTS)[number];

/** The inputs of a request; which are needed depends on the quantity. */
export const CalcInputsSchema = z.strictObject({
  ...(Object.fromEntries(CALC_NUMERIC_INPUTS.map((k) => [k, MeasuredInputSchema.optional()])) as Record<
    CalcNumericInput,
    z.ZodOptional<typeof MeasuredInputSchema>
  >),
  band: z.string().max(40).optional(),
});
export type CalcInputs = z.infer<typeof CalcInputsSchema>;

/** A named preset. */
export const PresetModelSchema = z.strictObject({ preset: z.enum(['planck18', 'wmap9']) });
/** The simple Hubble law d = cz/H0 (classroom model). */
export const HubbleLawModelSchema = z.strictObject({ law: z.literal('hubble'), H0: finite, name: z.string().max(80).optional() });
/** A custom FLRW model; flat when Ode0 is omitted, no radiation when Tcmb0 is 0 or omitted. */
export const CustomModelSchema = z.strictObject({
  name: z.string().max(80).optional(),
  H0: finite,
  Om0: finite,
  Ode0: finite.optional(),
  Tcmb0: finite.optional(),
  Neff: finite.optional(),
  m_nu: z.union([finite, z.array(finite).max(10)]).optional(),
  Ob0: finite.optional(),
});
/** Any model. */
export const CalcModelSchema = z.union([PresetModelSchema, HubbleLawModelSchema, CustomModelSchema]);
export type CalcModel = z.infer<typeof CalcModelSchema>;

/** An optional 68 % range for H0, propagated with the density parameters held fixed. */
export const H0RangeSchema = z.strictObject({ low: finite, high: finite });

/** A calculation request. `model` defaults to the Planck 2018 preset. */
export const CalcRequestSchema = z.strictObject({
  id: z.union([z.string().max(200), z.number()]).optional(),
  quantity: CalcQuantitySchema,
  inputs: CalcInputsSchema.optional(),
  model: CalcModelSchema.optional(),
  H0_range: H0RangeSchema.optional(),
});
export type CalcRequest = z.infer<typeof CalcRequestSchema>;

const WorkingValueSchema = z.object({
  symbol: z.string(),
  name: z.string(),
  value: z.union([z.number(), z.string()]),
  unit: z.string(),
  source: z.string(),
});

/** One step of the working. */
export const StepSchema = z.object({
  title: z.string(),
  formula: z.string(),
  inputs: z.array(WorkingValueSchema),
  constants: z.array(WorkingValueSchema),
  result: z.object({ symbol: z.string(), name: z.string(), value: z.number(), unit: z.string() }),
  note: z.string().optional(),
});

/** The model a result was computed with, every parameter resolved, with sources. */
export const ResolvedModelSchema = z.object({
  name: z.string(),
  label: z.string(),
  kind: z.enum(['flrw', 'hubble_law']),
  H0: z.number(),
  Om0: z.number().optional(),
  Ode0: z.number().optional(),
  Ok0: z.number().optional(),
  Ogamma0: z.number().optional(),
  Onu0: z.number().optional(),
  Tcmb0: z.number().optional(),
  Neff: z.number().optional(),
  m_nu: z.array(z.number()).optional(),
  Ob0: z.number().optional(),
  flat: z.boolean().optional(),
  H0_range: z.object({ low: z.number(), high: z.number() }).optional(),
  sources: z.record(z.string(), z.string()),
});
export type ResolvedModel = z.infer<typeof ResolvedModelSchema>;

/** A successful result. `model` is null for quantities that need no cosmology. */
export const CalcSuccessSchema = z.object({
  id: z.union([z.string(), z.number()]).optional(),
  quantity: CalcQuantitySchema,
  value: z.number(),
  unit: z.enum(CALC_UNITS),
  /** failed_draws: how many Monte Carlo draws fell outside the quantity's domain and were left out (absent when none). */
  interval: z
    .object({ low: z.number(), high: z.number(), level: z.literal(0.68), failed_draws: z.number().int().optional() })
    .optional(),
  conversions: z.array(z.object({ value: z.number(), unit: z.string() })),
  warnings: z.array(z.string()),
  working: z.array(StepSchema),
  model: ResolvedModelSchema.nullable(),
});

/** A failed calculation: a snake_case code and a message naming the input. */
export const CalcFailureSchema = z.object({
  id: z.union([z.string(), z.number()]).optional(),
  error: z.object({ code: z.string(), message: z.string() }),
});

/** A calculation result. */
export const CalcResultSchema = z.union([CalcSuccessSchema, CalcFailureSchema]);
export type CalcResult = z.infer<typeof CalcResultSchema>;
export type CalcSuccess = z.infer<typeof CalcSuccessSchema>;
export type CalcFailure = z.infer<typeof CalcFailureSchema>;

/** The sky tonight: a quantity of its own, whose inputs are a place and a night rather than measurements. */
export const SKY_TONIGHT = 'sky_tonight' as const;

/** Every quantity the contract answers: the engine's and the sky tonight. */
export const CONTRACT_QUANTITIES = [...CALC_QUANTITIES, SKY_TONIGHT] as const;

/**
 * Inputs of `sky_tonight`: where (degrees, east longitude positive; metres above sea level, 0 when
 * omitted), the IANA time zone, and the evening's local date. Ranges are checked by the sky code,
 * which says what is wrong in words.
 */
export const SkyTonightInputsSchema = z.strictObject({
  latitude: finite,
  longitude: finite,
  elevation_m: finite.optional(),
  time_zone: z.string().max(64),
  night: z.string().max(10),
});
export type SkyTonightInputs = z.infer<typeof SkyTonightInputsSchema>;

/** A `sky_tonight` request (no model: the sky does not depend on a cosmology). */
export const SkyTonightRequestSchema = z.strictObject({
  id: z.union([z.string().max(200), z.number()]).optional(),
  quantity: z.literal(SKY_TONIGHT),
  inputs: SkyTonightInputsSchema,
});
export type SkyTonightRequest = z.infer<typeof SkyTonightRequestSchema>;

/** A `sky_tonight` result: the same data as a venue's sky for that night. */
export const SkyTonightSuccessSchema = z.object({
  id: z.union([z.string(), z.number()]).optional(),
  quantity: z.literal(SKY_TONIGHT),
  sky: SkyTonightSchema,
});
export type SkyTonightSuccess = z.infer<typeof SkyTonightSuccessSchema>;

/** Any answer of the contract: an engine result, the sky tonight, or a failure. */
export const ContractResultSchema = z.union([CalcSuccessSchema, SkyTonightSuccessSchema, CalcFailureSchema]);
export type ContractResult = z.infer<typeof ContractResultSchema>;
