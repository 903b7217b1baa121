import type { TemplateOutcome, UsedInput } from '@shared/statements/index.ts';
import type { ResolvedModel } from '@shared/schemas/calc.ts';
import type { Statement, StatementStatus } from '../../models/index.ts';

/** The columns a computation sets. */
export type ComputedFields = Pick<
  Statement,
  | 'status' | 'statusReason' | 'value' | 'unit' | 'intervalLow' | 'intervalHigh' | 'significantFigures' | 'texts'
  | 'footnotes' | 'acknowledgedTexts' | 'inputs' | 'working' | 'warnings' | 'model' | 'settingsVersion' | 'computedAt'
>;

const sameTexts = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** Says in words what moved between the inputs last accepted and now. */
export function describeInputChanges(before: UsedInput[], after: UsedInput[], modelBefore: ResolvedModel | null, modelAfter: ResolvedModel | null): string[] {
  const changes: string[] = [];
  const key = (i: UsedInput) => `${i.quantity}|${i.band ?? ''}`;
  const old = new Map(before.map((i) => [key(i), i]));
  for (const now of after) {
    const was = old.get(key(now));
    const label = `${now.quantity.replaceAll('_', ' ')}${now.band ? ` (${now.band})` : ''}`;
    if (!was) changes.push(`${label} is now used (${now.value} ${now.unit}, ${now.citation})`);
    else if (was.measurementId !== now.measurementId) changes.push(`a different ${label} measurement is preferred: ${was.value} → ${now.value} ${now.unit} (${now.citation})`);
    else if (was.value !== now.value || was.sigma !== now.sigma || was.minus !== now.minus || was.plus !== now.plus) changes.push(`${label} was corrected: ${was.value} → ${now.value} ${now.unit}`);
    else if (was.citation !== now.citation) changes.push(`the source of ${label} was edited`);
    old.delete(key(now));
  }
  for (const gone of old.values()) changes.push(`${gone.quantity.replaceAll('_', ' ')} is no longer used`);
  if ((modelBefore?.label ?? null) !== (modelAfter?.label ?? null) || modelBefore?.H0 !== modelAfter?.H0) {
    changes.push(`the cosmology changed: ${modelBefore?.label ?? 'none'} → ${modelAfter?.label ?? 'none'}`);
  }
  return changes;
}

/**
 * Turns a template outcome into the statement's new columns and status:
 * - cannot be computed → broken, with the reason (no number is presented as current);
 * - same wording as last accepted → current (the working and interval still update);
 * - different wording → changed, with what moved; the accepted wording is kept for side-by-side review.
 * A statement's first computation is accepted as it stands: its pages get reviewed anyway.
 */
export function applyOutcome(previous: Statement | null, outcome: TemplateOutcome, settingsVersion: number, now = new Date()): ComputedFields {
  if (!outcome.ok) {
    return {
      status: 'broken',
      statusReason: outcome.reason,
      value: previous?.value ?? null,
      unit: previous?.unit ?? null,
      intervalLow: previous?.intervalLow ?? null,
      intervalHigh: previous?.intervalHigh ?? null,
      significantFigures: previous?.significantFigures ?? null,
      texts: previous?.texts ?? null,
      footnotes: previous?.footnotes ?? null,
      acknowledgedTexts: previous?.acknowledgedTexts ?? null,
      inputs: previous?.inputs ?? [],
      working: previous?.working ?? [],
      warnings: previous?.warnings ?? [],
      model: previous?.model ?? null,
      settingsVersion,
      computedAt: now,
    };
  }
  const accepted = previous?.acknowledgedTexts ?? outcome.texts;
  let status: StatementStatus = sameTexts(accepted, outcome.texts) ? 'current' : 'changed';
  let statusReason: string | null = null;
  if (status === 'changed') {
    const what = describeInputChanges(previous?.inputs ?? [], outcome.inputs, previous?.model ?? null, outcome.model);
    statusReason = `The public wording changed${what.length ? `: ${what.join('; ')}` : ''}. A reviewer must accept the new wording.`;
  }
  // A statement that was changed and has since moved back to the accepted wording is current again.
  if (previous?.status === 'changed' && status === 'current') statusReason = null;
  return {
    status,
    statusReason,
    value: outcome.value,
    unit: outcome.unit,
    intervalLow: outcome.interval?.low ?? null,
    intervalHigh: outcome.interval?.high ?? null,
    significantFigures: outcome.significantFigures,
    texts: outcome.texts,
    footnotes: outcome.footnotes,
    acknowledgedTexts: accepted,
    inputs: outcome.inputs,
    working: outcome.working,
    warnings: outcome.warnings,
    model: outcome.model,
    settingsVersion,
    computedAt: now,
  };
}
