import type { CalcRequest, CalcSuccess, MeasuredInput } from '../schemas/calc.ts';
import { engineMessageInWords } from '../contract/words.ts';
import { calculate } from '../engine/calculate.ts';
import { resolveModel } from '../engine/model-resolve.ts';
import { budgetStep, h0RangeFor, withPeculiarVelocity } from './model-uncertainty.ts';
import type { StatementMeasurement, TemplateContext, TemplateFailure, UsedInput } from './types.ts';

/** Thrown inside a template's evaluation; turned into a TemplateFailure by `guard`. */
export class TemplateProblem extends Error {
  constructor(readonly failure: TemplateFailure) {
    super(failure.reason);
  }
}

export const missing = (what: string[], reason: string) =>
  new TemplateProblem({ ok: false, code: 'missing_input', reason, missing: what });

/** The preferred measurement of a quantity (and band), if any. */
export function find(ctx: TemplateContext, quantity: string, band?: string): StatementMeasurement | undefined {
  return ctx.measurements.find((m) => m.quantity === quantity && (band === undefined || m.band === band));
}

/** An engine input from a measurement, carrying its uncertainty and source. */
export function asInput(m: StatementMeasurement, scale = 1): MeasuredInput {
  const source = `${m.source.citation} (measurement ${m.id})`;
  if (m.minus != null && m.plus != null) return { value: m.value * scale, minus: m.minus * scale, plus: m.plus * scale, source };
  if (m.sigma != null) return { value: m.value * scale, sigma: m.sigma * scale, source };
  return { value: m.value * scale, source };
}

export function used(m: StatementMeasurement): UsedInput {
  return {
    measurementId: m.id,
    quantity: m.quantity,
    band: m.band,
    value: m.value,
    unit: m.unit,
    sigma: m.sigma ?? null,
    minus: m.minus ?? null,
    plus: m.plus ?? null,
    sourceId: m.source.id,
    citation: m.source.citation,
  };
}

/** Above this redshift the expansion dominates peculiar velocities (common practice: z ≈ 0.01). */
export const COSMOLOGICAL_Z = 0.01;

/** How the distance is known: a redshift in the Hubble flow, a distance, or a parallax. */
export type DistanceBasis =
  | { kind: 'z'; measurement: StatementMeasurement }
  | { kind: 'distance'; measurement: StatementMeasurement }
  | { kind: 'parallax'; measurement: StatementMeasurement };

/**
 * Chooses the distance evidence: a redshift of at least 0.01 (beyond that it measures the
 * expansion, not the object's own motion), else a stored distance, else a parallax.
 */
export function distanceBasis(ctx: TemplateContext): DistanceBasis | undefined {
  const z = find(ctx, 'redshift');
  if (z && z.value >= COSMOLOGICAL_Z) return { kind: 'z', measurement: z };
  const d = find(ctx, 'distance');
  if (d) return { kind: 'distance', measurement: d };
  const p = find(ctx, 'parallax');
  if (p) return { kind: 'parallax', measurement: p };
  return undefined;
}

export function requireDistance(ctx: TemplateContext): DistanceBasis {
  const basis = distanceBasis(ctx);
  if (!basis) {
    throw missing(
      ['redshift', 'distance', 'parallax'],
      'Needs a preferred redshift (0.01 or more), a distance or a parallax for this object.',
    );
  }
  return basis;
}

/** The engine inputs that carry the distance (distance in the catalogue is in parsecs). */
export function distanceInputs(basis: DistanceBasis): Partial<Record<'z' | 'distance_mpc' | 'parallax_mas', MeasuredInput>> {
  if (basis.kind === 'z') return { z: asInput(basis.measurement) };
  if (basis.kind === 'distance') return { distance_mpc: asInput(basis.measurement, 1e-6) };
  return { parallax_mas: asInput(basis.measurement) };
}

const lowerFirst = (s: string) => `${s.charAt(0).toLowerCase()}${s.slice(1)}`;

/**
 * A statement's reason for failing, from the engine's message: in words rather than contract keys
 * ("parallax_mas"), and without the calculator's advice to type a smaller uncertainty (a statement's
 * uncertainty is its measurement's).
 * @param message the engine's message
 * @returns e.g. "The calculation failed: parallax (mas) must be greater than 0 (the value is −130)."
 */
export function failureInWords(message: string): string {
  return `The calculation failed: ${lowerFirst(engineMessageInWords(message).replace(/; give a smaller uncertainty$/, ''))}.`;
}

/** Runs the engine; a failure becomes a TemplateProblem that names the engine's reason. */
export function run(request: CalcRequest): CalcSuccess {
  const result = calculate(request);
  if ('error' in result) {
    throw new TemplateProblem({
      ok: false,
      code: 'calculation_failed',
      reason: failureInWords(result.error.message),
    });
  }
  return result;
}

/**
 * Runs the engine for a statement that uses the organisation's cosmology, with the model's own
 * uncertainty in the interval that sets the public figures: the H0 range from the settings (or the
 * default) and, for a redshift, the peculiar-velocity term. The working gains a step showing each
 * contribution (left out with `budget: false` when an earlier run of the same statement showed it).
 */
export function runWithModel(ctx: TemplateContext, request: CalcRequest, options: { budget?: boolean } = {}): CalcSuccess {
  if (!request.model) return run(request);
  const range = h0RangeFor(request.model, ctx.h0Range);
  const z = request.inputs?.z;
  const pec = z === undefined ? null : withPeculiarVelocity(z);
  const ranged = run({
    ...request,
    inputs: pec ? { ...request.inputs, z: pec.input } : request.inputs,
    H0_range: { low: range.low, high: range.high },
  });
  // The statement names the adopted model itself (the engine's one shared description of it); the
  // H0 range it was drawn over is in the working's budget step.
  const result = ranged.model ? { ...ranged, model: resolveModel(request.model).description } : ranged;
  if (!pec || z === undefined || options.budget === false || !result.model) return result;
  const step = budgetStep({ z, sigmaPec: pec.sigmaPec, range, H0: result.model.H0 });
  return { ...result, working: [step, ...result.working] };
}
