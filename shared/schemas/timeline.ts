import { z } from 'zod';
import { STATEMENT_LOCALES } from '../statements/locales.ts';

/** The oldest date an entry may have: well beyond the age of the universe (about 13.8 billion years). */
const MAX_YEARS_AGO = 2e10;

const yearsNumber = (what: string) =>
  z.preprocess(
    (v) => (typeof v === 'string' && v.trim() !== '' ? Number(v.replaceAll(/[\s,_]/g, '')) : v),
    z
      .number({ message: `Enter the ${what} in years, as a number` })
      .refine(Number.isFinite, `Enter the ${what} in years, as a number`),
  );

const phrase = z
  .string({ message: 'Enter the wording for this language' })
  .trim()
  .min(3, 'Enter the wording for this language')
  .max(240, 'The wording is at most 240 characters')
  .refine((s) => !/[.!?]$/.test(s), 'Leave out the full stop: the wording ends the sentence')
  .refine((s) => !/[\u0000-\u001f<>]/.test(s), 'The wording may not contain angle brackets or control characters');

const fields = {
  label: z
    .string({ message: 'Enter a short name for staff' })
    .trim()
    .min(1, 'Enter a short name for staff')
    .max(120, 'The name is at most 120 characters'),
  yearsAgo: yearsNumber('date').pipe(
    z
      .number()
      .gt(0, 'The date is in years before today, more than 0')
      .lt(MAX_YEARS_AGO, 'The date must be less than 20 billion years ago'),
  ),
  uncertaintyYears: yearsNumber('uncertainty').pipe(
    z.number().gt(0, 'Give the date’s uncertainty (more than 0 years), as its source states it'),
  ),
  relation: z.enum(['around', 'before'], { message: 'Choose “around the time” or “before”' }),
  phrases: z.object(
    Object.fromEntries(STATEMENT_LOCALES.map((l) => [l, phrase])) as Record<(typeof STATEMENT_LOCALES)[number], typeof phrase>,
    { message: 'Enter the wording in every language' },
  ),
  sourceCitation: z
    .string({ message: 'Name the published source of the date' })
    .trim()
    .min(5, 'Name the published source of the date')
    .max(500, 'The source is at most 500 characters'),
  sourceUrl: z
    .url({ protocol: /^https?$/, message: 'Enter a web address starting with https:// (or leave it empty)' })
    .max(500, 'The address is at most 500 characters')
    .nullish()
    .or(z.literal('').transform(() => null)),
  note: z.string().trim().max(1000, 'The note is at most 1000 characters').nullish(),
};

const uncertaintyBelowDate = (v: { yearsAgo?: number; uncertaintyYears?: number }) =>
  v.yearsAgo === undefined || v.uncertaintyYears === undefined || v.uncertaintyYears < v.yearsAgo;
const uncertaintyMessage = { message: 'The uncertainty must be smaller than the date itself', path: ['uncertaintyYears'] };

/** A new timeline entry. */
export const TimelineEntryCreateSchema = z.object(fields).refine(uncertaintyBelowDate, uncertaintyMessage);
export type TimelineEntryCreateInput = z.infer<typeof TimelineEntryCreateSchema>;

/** Changes to an entry (only what is sent changes). */
export const TimelineEntryUpdateSchema = z
  .object(fields)
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Change at least one field')
  .refine(uncertaintyBelowDate, uncertaintyMessage);
export type TimelineEntryUpdateInput = z.infer<typeof TimelineEntryUpdateSchema>;

/** An entry as the API shows it. */
export const TimelineEntryDtoSchema = z.object({
  id: z.string(),
  label: z.string(),
  yearsAgo: z.number(),
  uncertaintyYears: z.number(),
  relation: z.enum(['around', 'before']),
  phrases: z.record(z.enum(STATEMENT_LOCALES), z.string()),
  sourceCitation: z.string(),
  sourceUrl: z.string().nullable(),
  note: z.string().nullable(),
  updatedAt: z.string(),
  can: z.object({ update: z.boolean(), delete: z.boolean() }),
});
export type TimelineEntryDto = z.infer<typeof TimelineEntryDtoSchema>;
