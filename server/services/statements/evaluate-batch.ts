import {
  evaluateStatement,
  findTemplate,
  type StatementLocale,
  type TemplateContext,
  type UsedInput,
} from '@shared/statements/index.ts';
import type { SkeletonJson } from '@shared/statements/working-codec.ts';
import { applyOutcome, type PreviousComputation } from './apply-outcome.ts';
import { packForStorage } from './working-pack.ts';

/** One statement of a batch, as loaded: what it is and its last computation (the status rule reads it). */
export interface BatchStatement extends PreviousComputation {
  id: string;
  skyObjectId: string;
  templateId: string;
  /** The venue whose night it describes, or null. */
  venueId: string | null;
  /** Its current public text in the preview's locale (previews only). */
  previewText?: string | null;
}

/** The cosmology every statement of the batch is computed under, as stored. */
export interface BatchModel {
  /** Its cosmology_descriptions id. */
  id: string;
  /** Its description as JSON text: an outcome's model must be exactly this one. */
  json: string;
}

/**
 * Where a statement's context is in BatchJob.contexts: by object, or by object and venue for a
 * statement about a venue's night (its context adds the venue and the night's sky).
 */
export const contextKey = (skyObjectId: string, venueId: string | null): string =>
  venueId ? `${skyObjectId}@${venueId}` : skyObjectId;

/** A batch of statements to compute: plain data, so it can cross to a worker thread. */
export interface BatchJob {
  /**
   * The statements as one JSON text (an array of BatchStatement), as PostgreSQL aggregates it: the
   * server's thread holds one string instead of a thousand rows with their texts and inputs (which
   * lived long enough to make its young-generation collections pause for tens of milliseconds),
   * hands it to the worker as a copy of its bytes, and the worker parses it.
   */
  statements: string;
  /** Each template context, by contextKey (object id, or object and venue). */
  contexts: Record<string, TemplateContext>;
  /** Null when the adopted settings use no cosmology a statement could name. */
  model: BatchModel | null;
  settingsVersion: number;
  /** ISO time the computation counts as made. */
  computedAt: string;
  /** Set for a preview: report wording changes in this locale, write nothing. */
  previewLocale?: StatementLocale;
}

/** A batch computed for writing: the rows as JSON text, ready to be a single query parameter. */
export interface WriteBatchResult {
  /**
   * The computed rows (columns named as in the table) as JSON arrays of at most WRITE_ROWS rows
   * each, one UPDATE apiece: the server's thread then encodes and sends under a megabyte at a time
   * and serves requests between them, where a whole batch's three megabytes held it for tens of
   * milliseconds.
   */
  computedRows: string[];
  /** JSON array of broken rows: id, status_reason, settings_version, computed_at. */
  brokenRows: string;
  /** Statements whose measurements or sources changed, and the links they now have (JSON array). */
  relinked: string[];
  inputLinks: string;
  /** The working skeletons the computed rows refer to, to be saved with them. */
  skeletons: Array<[string, SkeletonJson]>;
  written: number;
  /** Statements that became changed or broken in this batch. */
  changed: string[];
  broken: string[];
  /** Statements that were changed or broken and are current again (their wording is back to the accepted one). */
  recovered: string[];
}

/** A statement whose public wording (in the preview's locale) or status would move. */
export interface PreviewChange {
  statementId: string;
  newText: string | null;
  newStatus: 'current' | 'changed' | 'broken';
  reason: string | null;
}

/** Rows per UPDATE (see WriteBatchResult.computedRows). */
const WRITE_ROWS = 250;

function chunks<T>(items: T[], size: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < items.length; i += size) out.push(items.slice(i, i + size));
  return out;
}

const INPUT_FIELDS = [
  'measurementId',
  'quantity',
  'band',
  'value',
  'unit',
  'sigma',
  'minus',
  'plus',
  'sourceId',
  'citation',
] as const;

/** Same inputs, field by field (stored inputs come back from jsonb with their keys reordered). */
function sameInputs(a: UsedInput[], b: UsedInput[]): boolean {
  return a.length === b.length && a.every((x, i) => INPUT_FIELDS.every((f) => (x[f] ?? null) === (b[i][f] ?? null)));
}

/** Same measurements and sources, whatever their values. */
function sameLinks(a: UsedInput[], b: UsedInput[]): boolean {
  const key = (i: UsedInput) => `${i.measurementId}|${i.sourceId}`;
  const before = new Set(a.map(key));
  return a.length === b.length && b.every((i) => before.has(key(i)));
}

/**
 * Computes a batch: every statement's template against its object's context, with the status
 * rules of applyOutcome. Statements of one object are computed one after another, so templates
 * that need the same Monte Carlo share it (the engine keeps the last few runs' draws).
 * Pure (no database); runs in a worker thread or inline.
 * @param job the batch
 * @returns the rows to write, or with `previewLocale` the wording that would move
 * @throws Error when an outcome names a cosmology other than the batch's (a settings mix-up)
 */
export function evaluateBatch(job: BatchJob & { previewLocale: StatementLocale }): PreviewChange[];
export function evaluateBatch(job: BatchJob): WriteBatchResult;
export function evaluateBatch(job: BatchJob): WriteBatchResult | PreviewChange[] {
  const ordered = (JSON.parse(job.statements) as BatchStatement[]).sort((a, b) =>
    a.skyObjectId < b.skyObjectId ? -1 : a.skyObjectId > b.skyObjectId ? 1 : 0,
  );
  const computed: Record<string, unknown>[] = [];
  const brokenRows: Record<string, unknown>[] = [];
  const changed: string[] = [];
  const broken: string[] = [];
  const recovered: string[] = [];
  const preview: PreviewChange[] = [];
  let checkedModel: object | null = null;
  const skeletons = new Map<string, SkeletonJson>();
  const relinked: string[] = [];
  const inputLinks: Array<{ statement_id: string; measurement_id: string; source_id: string }> = [];
  for (const statement of ordered) {
    const ctx = job.contexts[contextKey(statement.skyObjectId, statement.venueId)];
    if (!ctx) continue;
    // Stored inputs may be JSON null (nothing recorded yet): none.
    statement.inputs ??= [];
    const previous: PreviousComputation = statement;
    const result = applyOutcome(previous, evaluateStatement(statement.templateId, ctx), findTemplate(statement.templateId));
    if (job.previewLocale) {
      const newText = result.status === 'broken' ? null : (result.texts[job.previewLocale] ?? null);
      if (newText !== (statement.previewText ?? null) || result.status !== statement.status) {
        preview.push({
          statementId: statement.id,
          newText,
          newStatus: result.status,
          reason: result.status === 'broken' ? result.statusReason : null,
        });
      }
      continue;
    }
    if (result.status === 'broken') {
      if (statement.status !== 'broken') broken.push(statement.id);
      brokenRows.push({
        id: statement.id,
        status_reason: result.statusReason,
        settings_version: job.settingsVersion,
        computed_at: job.computedAt,
      });
      continue;
    }
    if (result.status === 'changed' && statement.status !== 'changed') changed.push(statement.id);
    if (result.status === 'current' && statement.status !== 'current') recovered.push(statement.id);
    let modelId: string | null = null;
    if (result.model) {
      // Outcomes share the engine's one description per model: compare each distinct one once.
      if (result.model !== checkedModel) {
        if (!job.model || JSON.stringify(result.model) !== job.model.json)
          throw new Error(`Statement ${statement.id} was computed under a cosmology other than the adopted one.`);
        checkedModel = result.model;
      }
      modelId = job.model!.id;
    }
    const inputsMoved = !sameInputs(previous.inputs, result.inputs);
    if (inputsMoved && !sameLinks(previous.inputs, result.inputs)) {
      relinked.push(statement.id);
      for (const i of result.inputs)
        inputLinks.push({ statement_id: statement.id, measurement_id: i.measurementId, source_id: i.sourceId });
    }
    const packed = packForStorage(result.working);
    for (const entry of packed.skeletons) skeletons.set(...entry);
    computed.push({
      id: statement.id,
      status: result.status,
      status_reason: result.statusReason,
      value: result.value,
      unit: result.unit,
      interval_low: result.intervalLow,
      interval_high: result.intervalHigh,
      significant_figures: result.significantFigures,
      texts: result.texts,
      footnotes: result.footnotes,
      // Only a first computation sets the accepted wording; afterwards only a reviewer does, or a
      // new night for a statement that follows tonight (applyOutcome decides).
      acknowledged_texts: previous.acknowledgedTexts && !result.followedNight ? null : result.acknowledgedTexts,
      inputs: inputsMoved ? result.inputs : null,
      working: packed.stored,
      warnings: result.warnings,
      model_id: modelId,
      night: result.night,
      settings_version: job.settingsVersion,
      computed_at: job.computedAt,
    });
  }
  if (job.previewLocale) return preview;
  return {
    computedRows: chunks(computed, WRITE_ROWS).map((rows) => JSON.stringify(rows)),
    brokenRows: JSON.stringify(brokenRows),
    skeletons: [...skeletons],
    relinked,
    inputLinks: JSON.stringify(inputLinks),
    written: computed.length + brokenRows.length,
    changed,
    broken,
    recovered,
  };
}
