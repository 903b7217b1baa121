import type {
  LocalisedText,
  NightBasis,
  StatementTemplate,
  StoredNight,
  TemplateOutcome,
  UsedInput,
} from '@shared/statements/index.ts';
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
  /** For a statement that follows tonight: the venue, night and method it was last computed for, and the method last accepted. */
  night: StoredNight | null;
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
  night: StoredNight | null;
  /** True when only the night moved and the accepted wording follows it (it must be written). */
  followedNight: boolean;
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
    night: statement.night ?? null,
  };
}

/** Says in words what moved between the inputs last accepted and now. */
export function describeInputChanges(
  before: UsedInput[],
  after: UsedInput[],
  modelBefore: ModelSummary | null,
  modelAfter: ModelSummary | null,
): string[] {
  const changes: string[] = [];
  const key = (i: UsedInput) => `${i.quantity}|${i.band ?? ''}`;
  const old = new Map(before.map((i) => [key(i), i]));
  for (const now of after) {
    const was = old.get(key(now));
    const label = `${now.quantity.replaceAll('_', ' ')}${now.band ? ` (${now.band})` : ''}`;
    if (!was) changes.push(`${label} is now used (${now.value} ${now.unit}, ${now.citation})`);
    else if (was.measurementId !== now.measurementId)
      changes.push(`a different ${label} measurement is preferred: ${was.value} → ${now.value} ${now.unit} (${now.citation})`);
    else if (was.value !== now.value || was.sigma !== now.sigma || was.minus !== now.minus || was.plus !== now.plus)
      changes.push(`${label} was corrected: ${was.value} → ${now.value} ${now.unit}`);
    else if (was.citation !== now.citation) changes.push(`the source of ${label} was edited`);
    old.delete(key(now));
  }
  for (const gone of old.values()) changes.push(`${gone.quantity.replaceAll('_', ' ')} is no longer used`);
  if ((modelBefore?.label ?? null) !== (modelAfter?.label ?? null) || modelBefore?.H0 !== modelAfter?.H0) {
    changes.push(`the cosmology changed: ${modelBefore?.label ?? 'none'} → ${modelAfter?.label ?? 'none'}`);
  }
  return changes;
}

const place = (v: NightBasis['method']['venue']) => `${v.latitude}°, ${v.longitude}°, ${v.elevationM} m`;

/**
 * Says in words what moved in a tonight statement's method (everything but the night): the
 * venue's position or time zone, the constants, the ephemeris or sky rules, the sentence.
 * @param a the method last accepted
 * @param b the method now
 */
export function describeMethodChanges(a: NightBasis['method'], b: NightBasis['method']): string[] {
  const changes: string[] = [];
  if (a.planet !== b.planet) changes.push(`the object is now worked out as ${b.planet} (was ${a.planet})`);
  if (place(a.venue) !== place(b.venue)) changes.push(`the venue moved: ${place(a.venue)} → ${place(b.venue)}`);
  if (a.venue.timeZone !== b.venue.timeZone)
    changes.push(`the venue's time zone changed: ${a.venue.timeZone} → ${b.venue.timeZone}`);
  if (a.constants.auM !== b.constants.auM || a.constants.cKmS !== b.constants.cKmS)
    changes.push('the astronomical unit or the speed of light used changed');
  if (a.ephemeris !== b.ephemeris || a.skyVersion !== b.skyVersion) changes.push('the ephemeris or the sky rules changed');
  if (JSON.stringify(a.wording) !== JSON.stringify(b.wording)) changes.push('the sentence around the number changed');
  return changes;
}

/**
 * Turns a template outcome into the statement's new status and columns:
 * - cannot be computed → broken, with the reason (no number is presented as current);
 * - same wording as last accepted → current (the working and interval still update);
 * - different wording → changed, with what moved; the accepted wording is kept for side-by-side review.
 * - a template that follows tonight, computed by the method last accepted (same venue position,
 *   constants, ephemeris and sentence), so only the night moved → current, and the accepted
 *   wording follows the new night: reviewers sign off the method, not each night's number. A new
 *   method takes the paths above, and stays unaccepted until a reviewer accepts its wording.
 * A statement's first computation is accepted as it stands: its pages get reviewed anyway.
 * @param previous the statement's last computation, or null for a new statement
 * @param outcome what the template gave now
 * @param template the template's flags (followsTonight)
 * @returns the new status, with the computed columns unless broken
 */
export function applyOutcome(
  previous: PreviousComputation | null,
  outcome: TemplateOutcome,
  template: Pick<StatementTemplate, 'followsTonight'> = {},
): Recomputed {
  if (!outcome.ok) return { status: 'broken', statusReason: outcome.reason };
  const acceptedMethod = previous?.night?.acceptedMethod ?? null;
  const methodChanges = acceptedMethod && outcome.night ? describeMethodChanges(acceptedMethod, outcome.night.method) : null;
  const followedNight = !!template.followsTonight && methodChanges !== null && methodChanges.length === 0;
  const accepted = followedNight ? outcome.texts : (previous?.acknowledgedTexts ?? outcome.texts);
  const status = sameTexts(accepted, outcome.texts) ? 'current' : 'changed';
  let statusReason: string | null = null;
  if (status === 'changed') {
    const model = outcome.model ? { label: outcome.model.label, H0: outcome.model.H0 } : null;
    const what = [
      ...describeInputChanges(previous?.inputs ?? [], outcome.inputs, previous?.model ?? null, model),
      ...(methodChanges ?? []),
    ];
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
    // A first computation is accepted as it stands, method included; later ones keep the accepted
    // method (a reviewer's acceptance moves it), unless none was ever accepted and the wording stands.
    night: outcome.night
      ? {
          ...outcome.night,
          acceptedMethod: acceptedMethod ?? (previous === null || status === 'current' ? outcome.night.method : null),
        }
      : null,
    followedNight: followedNight && !sameTexts(previous?.acknowledgedTexts ?? null, outcome.texts),
  };
}
