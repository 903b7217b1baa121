import { z } from 'zod';
import { BAND_PATTERN } from '../catalogue/bands.ts';
import { checkRange, describeUnits, findQuantity, findUnit, QUANTITY_IDS } from '../catalogue/quantities.ts';
import { CatalogueLimits } from '../validations.ts';
import type { SourceRefDto } from './source.ts';

/** Why a measurement was refused; CSV reports group rejected rows by these. */
export type MeasurementProblem =
  | 'unknown_quantity'
  | 'non_numeric_value'
  | 'unit_mismatch'
  | 'band_missing'
  | 'band_not_allowed'
  | 'invalid_band'
  | 'invalid_uncertainty'
  | 'out_of_range';

/** Reads a number from a form or a CSV cell: '' means none; the typographic minus is accepted. */
export function readNumber(value: unknown): number | null | 'invalid' {
  if (value === undefined || value === null) return null;
  if (typeof value === 'number') return Number.isFinite(value) ? value : 'invalid';
  if (typeof value !== 'string') return 'invalid';
  const text = value.trim().replace(/\u2212/g, '-');
  if (text === '') return null;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(text)) return 'invalid';
  const n = Number(text);
  return Number.isFinite(n) ? n : 'invalid';
}

/** The uncertainty fields as the form and the CSV import name them. */
const UNCERTAINTY_LABELS = {
  uncertainty: 'Uncertainty (±)',
  uncertaintyMinus: 'Uncertainty minus',
  uncertaintyPlus: 'Uncertainty plus',
} as const;

const numberish = z.union([z.string(), z.number()]).nullish();

const issue = (ctx: z.RefinementCtx, path: string, message: string, reason: MeasurementProblem) =>
  ctx.addIssue({ code: 'custom', path: [path], message, params: { reason } });

/**
 * A measurement as entered, in any unit its quantity accepts. The output is in the quantity's
 * canonical unit, with what was typed kept as enteredValue and enteredUnit.
 */
export const MeasurementInputSchema = z
  .object({
    quantity: z.string({ message: 'Choose a quantity' }),
    value: numberish,
    unit: z.string().nullish(),
    band: z.string().nullish(),
    uncertainty: numberish,
    uncertaintyMinus: numberish,
    uncertaintyPlus: numberish,
    sourceId: z
      .uuid({ message: 'Choose a source from the list' })
      .nullish()
      .or(z.literal('').transform(() => null)),
    note: z.string().trim().max(CatalogueLimits.notesMax, `Notes are at most ${CatalogueLimits.notesMax} characters`).nullish(),
    /** True once the person has read the value's warnings (a negative parallax, a likely sign error) and keeps it. */
    confirm: z.boolean({ message: 'confirm must be true or false' }).optional(),
  })
  .transform((input, ctx) => {
    const quantity = findQuantity(input.quantity);
    if (!quantity) {
      issue(ctx, 'quantity', `Unknown quantity "${input.quantity}": use one of ${QUANTITY_IDS.join(', ')}.`, 'unknown_quantity');
      return z.NEVER;
    }
    const value = readNumber(input.value);
    if (value === 'invalid')
      issue(
        ctx,
        'value',
        `"${String(input.value).trim()}" is not a number; write it like 0.158, −1.46 or 2.5e-3.`,
        'non_numeric_value',
      );
    else if (value === null) issue(ctx, 'value', 'Enter a value.', 'non_numeric_value');
    const unit = findUnit(quantity, input.unit);
    if (!unit)
      issue(
        ctx,
        'unit',
        `"${(input.unit ?? '').trim()}" is not a unit of ${quantity.label.toLowerCase()}; use ${describeUnits(quantity)}.`,
        'unit_mismatch',
      );
    const band = (input.band ?? '').trim() || null;
    if (quantity.needsBand && !band) issue(ctx, 'band', `${quantity.label} needs a band, e.g. V.`, 'band_missing');
    if (!quantity.needsBand && band) issue(ctx, 'band', `${quantity.label} has no band; leave it empty.`, 'band_not_allowed');
    if (band && !BAND_PATTERN.test(band))
      issue(ctx, 'band', 'A band is a short name of letters and digits, e.g. V, B, Ks_2MASS.', 'invalid_band');

    const sigma = readNumber(input.uncertainty);
    const minus = readNumber(input.uncertaintyMinus);
    const plus = readNumber(input.uncertaintyPlus);
    for (const [path, v] of [
      ['uncertainty', sigma],
      ['uncertaintyMinus', minus],
      ['uncertaintyPlus', plus],
    ] as const) {
      const label = UNCERTAINTY_LABELS[path];
      if (v === 'invalid') issue(ctx, path, `${label} is a number, e.g. 0.02.`, 'invalid_uncertainty');
      // A published uncertainty is never zero; "none published" is an empty field. The sign of an
      // asymmetric one is in the field's name (minus or plus), so the number itself is above zero.
      else if (v !== null && !(v > 0))
        issue(
          ctx,
          path,
          `${label} must be more than zero; leave it empty when the source gives none${path === 'uncertainty' ? '' : ' (the sign is in the field: minus or plus)'}.`,
          'invalid_uncertainty',
        );
    }
    if (sigma !== null && (minus !== null || plus !== null))
      issue(
        ctx,
        'uncertainty',
        'Give either a symmetric uncertainty (±) or a minus and a plus, not both.',
        'invalid_uncertainty',
      );
    if ((minus === null) !== (plus === null))
      issue(
        ctx,
        minus === null ? 'uncertaintyMinus' : 'uncertaintyPlus',
        'An asymmetric uncertainty needs both a minus and a plus.',
        'invalid_uncertainty',
      );
    if (typeof value !== 'number' || !unit) return z.NEVER;

    const canonical = value * unit.toCanonical;
    const rangeProblem = checkRange(quantity, canonical);
    if (rangeProblem) issue(ctx, 'value', rangeProblem, 'out_of_range');
    const scale = (v: number | null | 'invalid') => (typeof v === 'number' ? v * unit.toCanonical : null);
    return {
      quantity: quantity.id,
      band,
      value: canonical,
      uncertainty: scale(sigma),
      uncertaintyMinus: scale(minus),
      uncertaintyPlus: scale(plus),
      enteredValue: value,
      enteredUnit: unit.id,
      sourceId: input.sourceId ?? null,
      note: input.note ?? '',
      confirm: input.confirm === true,
    };
  });
export type MeasurementInput = z.input<typeof MeasurementInputSchema>;
export type MeasurementValues = z.output<typeof MeasurementInputSchema>;

/** What the measurement form holds before parsing. */
export interface MeasurementFormValues {
  quantity: string;
  value: string;
  unit: string;
  band: string;
  uncertaintyKind: 'none' | 'symmetric' | 'asymmetric';
  uncertainty: string;
  uncertaintyMinus: string;
  uncertaintyPlus: string;
  sourceId: string;
  note: string;
}

const reason = z.string().trim().max(CatalogueLimits.reasonMax, `At most ${CatalogueLimits.reasonMax} characters`);

/**
 * Marks or unmarks a measurement as preferred. `replaces` is the preferred measurement the reviewer
 * saw (null for none): when another reviewer has changed it meanwhile, the request is refused.
 */
export const MeasurementPreferredSchema = z.object({
  preferred: z.boolean({ message: 'preferred must be true or false' }),
  /** True once the reviewer has read which statements a negative parallax will leave without a distance. */
  confirm: z.boolean({ message: 'confirm must be true or false' }).optional(),
  replaces: z.uuid({ message: 'replaces must be a measurement id or null' }).nullable().optional(),
});
export type MeasurementPreferredInput = z.infer<typeof MeasurementPreferredSchema>;

/**
 * The body of a 409 `confirmation_needed` (in the error's `current`): what to read before sending
 * the same request again with `confirm: true`.
 */
export interface MeasurementConfirmationDto {
  warnings: Array<{ code: string; message: string }>;
  /** Statements that will no longer work out (making a negative parallax preferred). */
  statements: Array<{ id: string; text: string }>;
}

/** A reviewer's decision on a proposed measurement; declining needs a reason. */
export const MeasurementReviewSchema = z
  .object({ decision: z.enum(['accept', 'decline'], { message: 'Decision is accept or decline' }), reason: reason.optional() })
  .refine((v) => v.decision === 'accept' || (v.reason ?? '').length > 0, {
    path: ['reason'],
    message: 'Say why the measurement is declined.',
  });
export type MeasurementReviewInput = z.infer<typeof MeasurementReviewSchema>;

/** Retiring keeps the measurement and its history; a reason is required. */
export const MeasurementRetireSchema = z.object({ reason: reason.min(1, 'Say why the measurement is retired.') });

/** A measurement as the API shows it. */
export interface MeasurementDto {
  id: string;
  objectId: string;
  quantity: string;
  band: string | null;
  value: number;
  unit: string;
  uncertainty: number | null;
  uncertaintyMinus: number | null;
  uncertaintyPlus: number | null;
  enteredValue: number;
  enteredUnit: string;
  source: SourceRefDto | null;
  preferred: boolean;
  status: 'proposed' | 'accepted' | 'declined';
  retired: boolean;
  retireReason: string | null;
  reviewReason: string | null;
  note: string;
  createdBy: string | null;
  createdAt: string;
  reviewedBy: string | null;
  reviewedAt: string | null;
  can: { update: boolean; prefer: boolean; review: boolean; retire: boolean };
}

/** One row of an object's measurement history. */
/** One event in an object's history: a measurement's change, or (`object_created`, no measurement) the object's creation. */
export interface MeasurementHistoryDto {
  id: string;
  measurementId: string | null;
  quantity: string | null;
  action: string;
  changedBy: string | null;
  reason: string | null;
  oldValues: Record<string, unknown> | null;
  newValues: Record<string, unknown> | null;
  createdAt: string;
}
