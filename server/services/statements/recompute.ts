import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { enqueue, type SendOptions } from '../../jobs/queue.ts';
import { logger } from '../../logger.ts';
import { Statement } from '../../models/index.ts';
import { getSettings, timelineForStatements } from '../settings/index.ts';
import { batchModelFor, loadBatchJob } from './batch-load.ts';
import type { SettingsSnapshot } from './context.ts';
import type { WriteBatchResult } from './evaluate-batch.ts';
import { poolSize, runBatch } from './evaluation-pool.ts';
import { statementEvents } from './events.ts';
import { saveSkeletons } from './working-store.ts';

/** Which statements to recompute. */
export type RecomputeScope =
  | { all: true }
  | { skyObjectId: string }
  | { statementIds: string[] }
  | { measurementId: string }
  | { sourceId: string }
  /** Every statement of these templates (e.g. those that read Earth's timeline, after it is edited). */
  | { templateIds: string[] }
  /** The statements about a venue's night, for that night (the venue's night in progress when left out). */
  | { venueId: string; localDate?: string };

const BATCH = 1000;
/** Batches being written at once, each on its own connection, while later ones are computed. */
const WRITES_IN_FLIGHT = 2;

/**
 * Lets the event loop run what is waiting (requests, timers) before the next step: a query's answer
 * is handled in the same task as the work its promise continues with (building the next batch,
 * encoding the next write), and together they held the server's thread for too long.
 */
const breathe = () => new Promise<void>((resolve) => setImmediate(resolve));

/** Raised when the adopted cosmology changed under a running recompute; its results are dropped. */
export class SettingsMovedError extends Error {}

/** The adopted settings as a statement computation reads them. */
export async function currentSettingsSnapshot(): Promise<SettingsSnapshot> {
  const [row, timeline] = await Promise.all([getSettings(), timelineForStatements()]);
  return {
    model: row.cosmologyModel,
    band: row.defaultBand,
    h0Range: row.h0Range ?? null,
    version: row.version,
    assumptions: { spectralIndex: row.spectralIndexDefaults ?? {} },
    timeline,
  };
}

async function idsFor(scope: RecomputeScope): Promise<string[]> {
  if ('statementIds' in scope) return scope.statementIds;
  if ('venueId' in scope)
    return (
      await Statement.findAll({
        attributes: ['id'],
        where: { venueId: scope.venueId },
        order: [['skyObjectId', 'ASC']],
        raw: true,
      })
    ).map((s) => s.id);
  if ('templateIds' in scope)
    return (
      await Statement.findAll({
        attributes: ['id'],
        where: { templateId: scope.templateIds },
        order: [['skyObjectId', 'ASC']],
        raw: true,
      })
    ).map((s) => s.id);
  if ('skyObjectId' in scope)
    return (await Statement.findAll({ attributes: ['id'], where: { skyObjectId: scope.skyObjectId }, raw: true })).map(
      (s) => s.id,
    );
  // Ordered by object, so a batch holds whole objects and their statements share Monte Carlo runs.
  // One text of every id, split here: a hundred thousand row objects held the server's thread for tens of milliseconds.
  if ('all' in scope) {
    const [{ ids }] = await getSequelize().query<{ ids: string }>(
      "SELECT coalesce(string_agg(id::text, ',' ORDER BY sky_object_id), '') AS ids FROM statements",
      { type: QueryTypes.SELECT },
    );
    return ids === '' ? [] : ids.split(',');
  }
  // Statements whose inputs used this measurement or source.
  const rows = await getSequelize().query<{ id: string }>(
    'measurementId' in scope
      ? 'SELECT statement_id AS id FROM statement_inputs WHERE measurement_id = :id'
      : 'SELECT DISTINCT statement_id AS id FROM statement_inputs WHERE source_id = :id',
    { replacements: { id: 'measurementId' in scope ? scope.measurementId : scope.sourceId }, type: QueryTypes.SELECT },
  );
  const ids = rows.map((r) => r.id);
  if ('measurementId' in scope) {
    // A newly preferred measurement is not in any statement's inputs yet: also take its object's statements.
    const objectRows = await getSequelize().query<{ id: string }>(
      'SELECT s.id FROM statements s JOIN measurements m ON m.object_id = s.sky_object_id WHERE m.id = :id',
      { replacements: { id: scope.measurementId }, type: QueryTypes.SELECT },
    );
    ids.push(...objectRows.map((r) => r.id));
  }
  return [...new Set(ids)];
}

// The rows of a batch travel as one json parameter that PostgreSQL splits into records, so
// nothing is escaped into SQL text, and rows deleted meanwhile stay deleted. The accepted wording
// comes in only from a first computation or a statement following tonight (null otherwise, so the
// stored one stays); beyond that only a reviewer changes it. Inputs come only when they moved (a
// cosmology change leaves them as they are).
const UPDATE_COMPUTED = `
UPDATE statements AS s SET
  status = r.status, status_reason = r.status_reason, value = r.value, unit = r.unit,
  interval_low = r.interval_low, interval_high = r.interval_high, significant_figures = r.significant_figures,
  texts = r.texts, footnotes = r.footnotes, acknowledged_texts = COALESCE(r.acknowledged_texts, s.acknowledged_texts),
  inputs = COALESCE(r.inputs, s.inputs), working = r.working, warnings = r.warnings, model_id = r.model_id, night = r.night,
  settings_version = r.settings_version, computed_at = r.computed_at, updated_at = now()
FROM json_to_recordset($1::json) AS r(
  id uuid, status text, status_reason text, value float8, unit text, interval_low float8, interval_high float8,
  significant_figures smallint, texts jsonb, footnotes jsonb, acknowledged_texts jsonb, inputs jsonb, working json,
  warnings jsonb, model_id char(64), night jsonb, settings_version integer, computed_at timestamptz)
WHERE s.id = r.id`;

// A broken statement keeps its last numbers, text and working for review; only its status moves.
const UPDATE_BROKEN = `
UPDATE statements AS s SET status = 'broken', status_reason = r.status_reason, settings_version = r.settings_version,
  computed_at = r.computed_at, updated_at = now()
FROM json_to_recordset($1::json) AS r(id uuid, status_reason text, settings_version integer, computed_at timestamptz)
WHERE s.id = r.id`;

// Which measurements and sources the batch's statements now use, for those whose choice moved
// (statements deleted meanwhile are skipped).
const UNLINK_INPUTS = 'DELETE FROM statement_inputs WHERE statement_id = ANY($1::uuid[])';
const LINK_INPUTS = `
INSERT INTO statement_inputs (statement_id, measurement_id, source_id)
  SELECT l.statement_id, l.measurement_id, l.source_id
    FROM json_to_recordset($1::json) AS l(statement_id uuid, measurement_id uuid, source_id uuid)
    JOIN statements s ON s.id = l.statement_id
ON CONFLICT (statement_id, measurement_id) DO NOTHING`;

/** Writes one batch, inside a transaction that first checks the settings have not moved. */
async function writeBatch(result: WriteBatchResult, settings: SettingsSnapshot): Promise<void> {
  const sequelize = getSequelize();
  await sequelize.transaction(async (transaction) => {
    const current = await getSettings(transaction, 'share');
    if (current.version !== settings.version)
      throw new SettingsMovedError('The organisation settings changed during the recompute.');
    await saveSkeletons(result.skeletons, transaction);
    for (const rows of result.computedRows) {
      await breathe();
      await sequelize.query(UPDATE_COMPUTED, { bind: [rows], transaction });
    }
    if (result.brokenRows !== '[]') await sequelize.query(UPDATE_BROKEN, { bind: [result.brokenRows], transaction });
    if (result.relinked.length > 0) {
      await sequelize.query(UNLINK_INPUTS, { bind: [result.relinked], transaction });
      await sequelize.query(LINK_INPUTS, { bind: [result.inputLinks], transaction });
    }
  });
}

/**
 * Recomputes statements with the organisation's current settings and writes them back in batches.
 * Every batch checks, inside its transaction, that the adopted settings have not moved since the
 * computation started; if they have, the batch is dropped (the change queued its own recompute),
 * so no statement is ever marked current against a model that is no longer adopted.
 * Batches are computed on the worker pool while earlier ones are written; a scope of one batch
 * is computed inline.
 * @param options.settings compute against this snapshot instead of reading it (a long job's start)
 * @returns how many statements were written, and which changed or broke
 * @throws SettingsMovedError when the settings changed during the recompute
 */
export async function recomputeStatements(
  scope: RecomputeScope,
  options: { settings?: SettingsSnapshot } = {},
): Promise<{ written: number; changed: string[]; broken: string[]; recovered: string[] }> {
  const settings = options.settings ?? (await currentSettingsSnapshot());
  const ids = await idsFor(scope);
  // Every venue's new night asks, most with no statements: nothing to load or store then.
  if (ids.length === 0) return { written: 0, changed: [], broken: [], recovered: [] };
  const model = await batchModelFor(settings);
  const computedAt = new Date();
  const inline = ids.length <= BATCH;
  // Two batches queued per worker, so none waits for the next to load; plus those being written.
  const inFlight = 2 * Math.max(1, poolSize()) + WRITES_IN_FLIGHT;
  const totals = { written: 0, changed: [] as string[], broken: [] as string[], recovered: [] as string[] };
  const running = new Set<Promise<void>>();
  let failure: unknown;
  for (let i = 0; i < ids.length && failure === undefined; i += BATCH) {
    if (running.size >= inFlight) await Promise.race(running);
    if (failure !== undefined) break;
    const night = 'venueId' in scope && scope.localDate ? { venueId: scope.venueId, localDate: scope.localDate } : undefined;
    const job = await loadBatchJob(ids.slice(i, i + BATCH), settings, model, { computedAt, night });
    await breathe();
    const task = runBatch(job, { inline })
      .then(async (result) => {
        await writeBatch(result, settings);
        totals.written += result.written;
        totals.changed.push(...result.changed);
        totals.broken.push(...result.broken);
        totals.recovered.push(...result.recovered);
      })
      .catch((error: unknown) => {
        failure ??= error;
      })
      .finally(() => running.delete(task));
    running.add(task);
  }
  await Promise.all(running);
  if (failure !== undefined) throw failure;
  if (totals.changed.length) statementEvents.emit('textChanged', { statementIds: totals.changed });
  if (totals.broken.length) statementEvents.emit('broken', { statementIds: totals.broken });
  if (totals.recovered.length) statementEvents.emit('recovered', { statementIds: totals.recovered });
  return totals;
}

/**
 * The scopes of many queued recomputes as few recomputes: any "all" makes one of everything; a
 * venue's named night keeps its own (its night is part of the computation); the rest become one
 * recompute of the union of their statements.
 * @param scopes the queued scopes, oldest first
 * @returns the scopes to run
 */
export async function mergeScopes(scopes: RecomputeScope[]): Promise<RecomputeScope[]> {
  if (scopes.some((s) => 'all' in s)) return [{ all: true }];
  const nights = scopes.filter((s) => 'venueId' in s && s.localDate);
  const rest = scopes.filter((s) => !nights.includes(s));
  if (rest.length <= 1) return [...nights, ...rest];
  const ids = new Set<string>();
  for (const scope of rest) for (const id of await idsFor(scope)) ids.add(id);
  return [...nights, { statementIds: [...ids] }];
}

/** A scope queued under the object's earlier name (`objectId`): jobs may wait in the queue across an upgrade. */
function upgradeScope(scope: RecomputeScope | { objectId: string }): RecomputeScope {
  return 'objectId' in scope ? { skyObjectId: scope.objectId } : scope;
}

/** The job kind of a statement recompute. */
export const RECOMPUTE_JOB = 'statements.recompute';
/** Queued recomputes handed over at once and merged into one. */
export const RECOMPUTE_BATCH = 100;

/**
 * Queues a recompute of the statements a scope covers (inline when no queue runs).
 * @param options pg-boss send options (a singleton key where several servers may queue one trigger)
 */
export async function enqueueRecompute(data: { scope: RecomputeScope }, options: SendOptions = {}): Promise<void> {
  await enqueue(RECOMPUTE_JOB, data, options);
}

/**
 * The background job: recompute what the queued scopes cover (up to RECOMPUTE_BATCH jobs merged at
 * a time, so a burst of catalogue edits costs one recompute, not one per edit); a settings change
 * mid-way ends quietly (its own job follows).
 * @param jobs the queued jobs' data, oldest first
 */
export async function runRecomputeJobs(jobs: { scope: RecomputeScope | { objectId: string } }[]): Promise<void> {
  for (const scope of await mergeScopes(jobs.map((j) => upgradeScope(j.scope)))) {
    try {
      const result = await recomputeStatements(scope);
      logger.info(
        {
          scope: 'statementIds' in scope ? { statements: scope.statementIds.length } : scope,
          jobs: jobs.length,
          written: result.written,
          changed: result.changed.length,
          broken: result.broken.length,
        },
        'statements recomputed',
      );
    } catch (error) {
      if (error instanceof SettingsMovedError) {
        logger.info({ scope }, 'recompute superseded by a settings change');
        continue;
      }
      throw error;
    }
  }
}
