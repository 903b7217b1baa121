import { z } from 'zod';
import { StepSchema, ResolvedModelSchema } from './calc.ts';
import { STATEMENT_LOCALES } from '../statements/locales.ts';

export const STATEMENT_STATUSES = ['current', 'changed', 'broken'] as const;
export const StatementStatusSchema = z.enum(STATEMENT_STATUSES);
export type StatementStatusValue = z.infer<typeof StatementStatusSchema>;

export const STATEMENT_STATUS_LABELS: Record<StatementStatusValue, string> = {
  current: 'Current',
  changed: 'Changed',
  broken: 'Broken',
};

const LocalisedTextSchema = z.record(z.enum(STATEMENT_LOCALES), z.string());

export const StatementCreateSchema = z.object({
  objectId: z.uuid({ message: 'Choose an object' }),
  templateId: z.string({ message: 'Choose a statement' }).min(1, 'Choose a statement').max(40),
  /** For templates about a venue's night; refused by the others. */
  venueId: z.uuid({ message: 'Choose a venue from the list' }).nullish(),
});
export type StatementCreateInput = z.infer<typeof StatementCreateSchema>;

export const StatementListQuerySchema = z.object({
  status: StatementStatusSchema.optional(),
  objectId: z.uuid({ message: 'objectId must be a valid id' }).optional(),
  templateId: z.string().max(40).optional(),
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(200).default(50),
});
export type StatementListQuery = z.infer<typeof StatementListQuerySchema>;

const UsedInputSchema = z.object({
  measurementId: z.string(),
  quantity: z.string(),
  band: z.string().nullable(),
  value: z.number(),
  unit: z.string(),
  sigma: z.number().nullable().optional(),
  minus: z.number().nullable().optional(),
  plus: z.number().nullable().optional(),
  sourceId: z.string(),
  citation: z.string(),
});

/** A statement as the API shows it. */
export const StatementDtoSchema = z.object({
  id: z.string(),
  object: z.object({ id: z.string(), name: z.string(), kind: z.string() }),
  template: z.object({ id: z.string(), title: z.string() }),
  /** The venue whose night it describes, or null. */
  venue: z.object({ id: z.string(), name: z.string(), timeZone: z.string() }).nullable(),
  /** For a statement that follows tonight: the night and observation instant last computed. */
  night: z.object({ localDate: z.string(), observationUtc: z.string() }).nullable(),
  status: StatementStatusSchema,
  statusReason: z.string().nullable(),
  value: z.number().nullable(),
  unit: z.string().nullable(),
  interval: z.object({ low: z.number(), high: z.number() }).nullable(),
  significantFigures: z.number().nullable(),
  texts: LocalisedTextSchema.nullable(),
  footnotes: LocalisedTextSchema.nullable(),
  acknowledgedTexts: LocalisedTextSchema.nullable(),
  acknowledgedAt: z.string().nullable(),
  inputs: z.array(UsedInputSchema),
  working: z.array(StepSchema).optional(),
  warnings: z.array(z.string()),
  model: ResolvedModelSchema.nullable(),
  computedAt: z.string(),
  can: z.object({ recompute: z.boolean(), acknowledge: z.boolean() }),
});
export type StatementDto = z.infer<typeof StatementDtoSchema>;

/** A template as the picker lists it. */
export const StatementTemplateDtoSchema = z.object({
  id: z.string(),
  title: z.string(),
  needs: z.string(),
  /** The object kinds it is valid for (the picker offers it only for these). */
  kinds: z.array(z.string()),
  /** Why other kinds are refused. */
  kindsReason: z.string(),
  usesCosmology: z.boolean(),
  /** Creating it needs a venue. */
  needsVenue: z.boolean(),
  /** Its number follows the venue's night without a new sign-off. */
  followsTonight: z.boolean(),
  /** For a phrase form (a number inside a writer's sentence): the sentence template it shortens; null otherwise. */
  phraseOf: z.string().nullable(),
});
export type StatementTemplateDto = z.infer<typeof StatementTemplateDtoSchema>;
