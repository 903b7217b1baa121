import type { CalcModel, ResolvedModel } from '../schemas/calc.ts';
import type { Step } from '../engine/working.ts';
import type { LocalisedText } from './locales.ts';

/** A preferred measurement as a statement uses it (values in the catalogue's canonical units). */
export interface StatementMeasurement {
  id: string;
  quantity: string;
  value: number;
  unit: string;
  band: string | null;
  sigma?: number | null;
  minus?: number | null;
  plus?: number | null;
  source: { id: string; citation: string };
}

/** Everything a template may read. */
export interface TemplateContext {
  object: { id: string; name: string; kind: string };
  measurements: StatementMeasurement[];
  model: CalcModel;
  /** The organisation's preferred band for magnitudes (e.g. V). */
  band: string;
}

/** An input a statement used, stored so a change can be detected and shown. */
export interface UsedInput {
  measurementId: string;
  quantity: string;
  band: string | null;
  value: number;
  unit: string;
  sigma?: number | null;
  minus?: number | null;
  plus?: number | null;
  sourceId: string;
  citation: string;
}

/** A rendered statement. */
export interface TemplateSuccess {
  ok: true;
  /** The headline number and its unit (what the words round). */
  value: number;
  unit: string;
  interval: { low: number; high: number } | null;
  significantFigures: number;
  texts: LocalisedText;
  /** Small print: which cosmology, which band. Null when nothing needs saying. */
  footnotes: LocalisedText | null;
  working: Step[];
  warnings: string[];
  inputs: UsedInput[];
  model: ResolvedModel | null;
}

/** A statement that cannot be rendered, and why, in words. */
export interface TemplateFailure {
  ok: false;
  code: 'missing_input' | 'calculation_failed' | 'not_applicable';
  reason: string;
  missing?: string[];
}

export type TemplateOutcome = TemplateSuccess | TemplateFailure;

/** A statement template: one sentence pattern, the data it needs, and how to compute it. */
export interface StatementTemplate {
  id: string;
  title: string;
  /** What it needs, in words, for the picker. */
  needs: string;
  /** True when the template uses the organisation's cosmology (so a model change can move it). */
  usesCosmology: boolean;
  evaluate(ctx: TemplateContext): TemplateOutcome;
}
