import type { LocalisedText, TemplateOutcome, UsedInput } from '@shared/statements/index.ts';
import type { ResolvedModel } from '@shared/schemas/calc.ts';
import type { Step } from '@shared/engine/working.ts';
import type { Statement, StatementStatus } from '../../models/index.ts';

/** The cosmology as a change description names it. */
export interface ModelSummary {
  label: string;
  H0: number;
}

/** What deciding a statement's new status needs to know of its last computation. */
export interface PreviousComputation {
  status: StatementStatus;
  acknowledgedTexts: LocalisedText | null;
  inputs: UsedInput[];
  model: ModelSummary | null;
}

/** A statement that can no longer be computed: it keeps its last numbers and text, marked broken. */
export interface BrokenOutcome {
  status: 'broken';
  statusReason: string;
}

/** A statement computed afresh: every column its computation sets. */
export interface ComputedOutcome {
  status: 'current' | 'changed';
  statusReason: string | null;
  value: number;
  unit: string;
  intervalLow: number | null;
  intervalHigh: number | null;
  significantFigures: number;
  texts: LocalisedText;
  footnotes: LocalisedText | null;
  acknowledgedTexts: LocalisedText;
  inputs: UsedInput[];
  working: Step[];
  warnings: string[];
  model: ResolvedModel | null;
}

export type Recomputed = BrokenOutcome | ComputedOutcome;

const sameTexts = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

/** The parts of a stored statement that applyOutcome reads (its cosmology must be loaded). */
export function previousOf(statement: Statement): PreviousComputation {
  const model = statement.model;
  return {
    status: statement.status,
    acknowledgedTexts: statement.acknowledgedTexts ?? null,
    inputs: statement.inputs ?? [],
    model: model ? { label: model.label, H0: model.H0 } : null,
  };
}

/** Says in words what moved between the inputs last accepted and now. */
export function describeInputChanges(before: UsedInput[], after: UsedInput[], modelBefore: ModelSummary | null, modelAfter: ModelSummary | null): string[] {
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
 * Turns a template outcome into the statement's new status and columns:
 * - cannot be computed → broken, with the reason (no number is presented as current);
 * - same wording as last accepted → current (the working and interval still update);
 * - different wording → changed, with what moved; the accepted wording is kept for side-by-side review.
 * A statement's first computation is accepted as it stands: its pages get reviewed anyway.
 * @param previous the statement's last computation, or null for a new statement
 * @param outcome what the template gave now
 * @returns the new status, with the computed columns unless broken
 */
export function applyOutcome(previous: PreviousComputation | null, outcome: TemplateOutcome): Recomputed {
  if (!outcome.ok) return { status: 'broken', statusReason: outcome.reason };
  const accepted = previous?.acknowledgedTexts ?? outcome.texts;
  const status = sameTexts(accepted, outcome.texts) ? 'current' : 'changed';
  let statusReason: string | null = null;
  if (status === 'changed') {
    const model = outcome.model ? { label: outcome.model.label, H0: outcome.model.H0 } : null;
    const what = describeInputChanges(previous?.inputs ?? [], outcome.inputs, previous?.model ?? null, model);
    statusReason = `The public wording changed${what.length ? `: ${what.join('; ')}` : ''}. A reviewer must accept the new wording.`;
  }
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
  };
}
