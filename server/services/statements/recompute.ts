import { Op, QueryTypes, type WhereOptions } from 'sequelize';
import { evaluateStatement, type TemplateContext } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { defineJob } from '../../jobs/queue.ts';
import { logger } from '../../logger.ts';
import { SkyObject, Statement } from '../../models/index.ts';
import { getSettings } from '../organisation-settings.ts';
import { applyOutcome, type ComputedFields } from './apply-outcome.ts';
import { buildTemplateContexts, type SettingsSnapshot } from './context.ts';
import { statementEvents } from './events.ts';

/** Which statements to recompute. */
export type RecomputeScope =
  | { all: true }
  | { objectId: string }
  | { statementIds: string[] }
  | { measurementId: string }
  | { sourceId: string };

const BATCH = 1000;
const WRITES_IN_FLIGHT = 2;

/** Raised when the adopted cosmology changed under a running recompute; its results are dropped. */
export class SettingsMovedError extends Error {}

/** The adopted settings as a statement computation reads them. */
export async function currentSettingsSnapshot(): Promise<SettingsSnapshot> {
  const row = await getSettings();
  return { model: row.cosmologyModel, band: row.defaultBand, version: row.version };
}

async function idsFor(scope: RecomputeScope): Promise<string[]> {
  if ('statementIds' in scope) return scope.statementIds;
  if ('objectId' in scope) return (await Statement.findAll({ attributes: ['id'], where: { skyObjectId: scope.objectId }, raw: true })).map((s) => s.id);
  if ('all' in scope) return (await Statement.findAll({ attributes: ['id'], order: [['skyObjectId', 'ASC']], raw: true })).map((s) => s.id);
  // Statements whose stored inputs used this measurement or source (GIN index on inputs).
  const probe = 'measurementId' in scope ? { measurementId: scope.measurementId } : { sourceId: scope.sourceId };
  const rows = await getSequelize().query<{ id: string }>('SELECT id FROM statements WHERE inputs @> :probe::jsonb', {
    replacements: { probe: JSON.stringify([probe]) },
    type: QueryTypes.SELECT,
  });
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

type Row = ComputedFields & { id: string };

/** The statements of one batch with the contexts their templates read (one query for all the objects' measurements). */
async function loadBatch(ids: string[], settings: SettingsSnapshot): Promise<{ statements: Statement[]; contexts: Map<string, TemplateContext> }> {
  // Plain rows without the working: applyOutcome reads the previous working only to keep it on a
  // broken statement, which the UPDATE does in place, and parsing 1,000 workings costs more than the maths.
  const statements = (await Statement.findAll({
    attributes: { exclude: ['working'] },
    where: { id: { [Op.in]: ids } } as WhereOptions<Statement>,
    raw: true,
  })) as Statement[];
  const objectIds = [...new Set(statements.map((s) => s.skyObjectId))];
  const objects = await SkyObject.findAll({ attributes: ['id', 'name', 'kind'], where: { id: { [Op.in]: objectIds } }, raw: true });
  return { statements, contexts: await buildTemplateContexts(objects, settings) };
}

// One UPDATE per batch: the rows travel as a single JSON parameter that PostgreSQL splits into
// records, so nothing is escaped into SQL text and rows deleted meanwhile stay deleted.
const UPDATE_BATCH = `
UPDATE statements AS s SET
  status = r.status, status_reason = r.status_reason, value = r.value, unit = r.unit,
  interval_low = r.interval_low, interval_high = r.interval_high, significant_figures = r.significant_figures,
  texts = r.texts, footnotes = r.footnotes, acknowledged_texts = r.acknowledged_texts, inputs = r.inputs,
  working = CASE WHEN r.status = 'broken' THEN s.working ELSE r.working END, warnings = r.warnings, model = r.model, settings_version = r.settings_version,
  computed_at = r.computed_at, updated_at = now()
FROM jsonb_to_recordset($1::jsonb -> 'rows') AS r(
  id uuid, status text, status_reason text, value float8, unit text, interval_low float8, interval_high float8,
  significant_figures smallint, texts jsonb, footnotes jsonb, acknowledged_texts jsonb, inputs jsonb, working jsonb,
  warnings jsonb, model jsonb, settings_version integer, computed_at timestamptz)
WHERE s.id = r.id`;

const COLUMN_OF: Record<keyof ComputedFields, string> = {
  status: 'status', statusReason: 'status_reason', value: 'value', unit: 'unit', intervalLow: 'interval_low',
  intervalHigh: 'interval_high', significantFigures: 'significant_figures', texts: 'texts', footnotes: 'footnotes',
  acknowledgedTexts: 'acknowledged_texts', inputs: 'inputs', working: 'working', warnings: 'warnings', model: 'model',
  settingsVersion: 'settings_version', computedAt: 'computed_at',
};

function asRecord(row: Row): Record<string, unknown> {
  const record: Record<string, unknown> = { id: row.id };
  for (const [key, column] of Object.entries(COLUMN_OF)) record[column] = row[key as keyof ComputedFields];
  return record;
}

/** Writes one batch, inside a transaction that first checks the settings have not moved. */
async function writeBatch(rows: Row[], settings: SettingsSnapshot): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const current = await getSettings(transaction, 'share');
    if (current.version !== settings.version) throw new SettingsMovedError('The organisation settings changed during the recompute.');
    // An object parameter: the driver serialises it once (a string would be scanned again on the way).
    await getSequelize().query(UPDATE_BATCH, { bind: [{ rows: rows.map(asRecord) }], transaction });
  });
}

/**
 * Recomputes statements with the organisation's current settings and writes them back in batches.
 * Every batch checks, inside its transaction, that the adopted settings have not moved since the
 * computation started; if they have, the batch is dropped (the change queued its own recompute),
 * so no statement is ever marked current against a model that is no longer adopted.
 * While PostgreSQL writes earlier batches, the next is loaded and computed.
 * @param options.settings compute against this snapshot instead of reading it (a long job's start)
 * @returns how many statements were written, and which changed or broke
 */
export async function recomputeStatements(scope: RecomputeScope, options: { settings?: SettingsSnapshot } = {}): Promise<{ written: number; changed: string[]; broken: string[] }> {
  const settings = options.settings ?? (await currentSettingsSnapshot());
  const ids = await idsFor(scope);
  const changed: string[] = [];
  const broken: string[] = [];
  let written = 0;
  const writing: Array<Promise<void>> = [];
  for (let i = 0; i < ids.length; i += BATCH) {
    const { statements, contexts } = await loadBatch(ids.slice(i, i + BATCH), settings);
    const rows: Row[] = [];
    for (const statement of statements) {
      const ctx = contexts.get(statement.skyObjectId);
      if (!ctx) continue;
      const fields = applyOutcome(statement, evaluateStatement(statement.templateId, ctx), settings.version);
      if (fields.status === 'changed' && statement.status !== 'changed') changed.push(statement.id);
      if (fields.status === 'broken' && statement.status !== 'broken') broken.push(statement.id);
      rows.push({ ...fields, id: statement.id });
    }
    // PostgreSQL parses and stores earlier batches (on their own connections) while this one is computed.
    if (writing.length >= WRITES_IN_FLIGHT) await writing.shift();
    const write = writeBatch(rows, settings);
    // Awaited later; until then a failure must not count as unhandled.
    write.catch(() => undefined);
    writing.push(write);
    written += rows.length;
  }
  for (const write of writing) await write;
  if (changed.length) statementEvents.emit('textChanged', { statementIds: changed });
  if (broken.length) statementEvents.emit('broken', { statementIds: broken });
  return { written, changed, broken };
}

/** The background job: recompute a scope; a settings change mid-way ends quietly (its own job follows). */
export const enqueueRecompute = defineJob<{ scope: RecomputeScope }>('statements.recompute', async ({ scope }) => {
  try {
    const result = await recomputeStatements(scope);
    logger.info({ scope, written: result.written, changed: result.changed.length, broken: result.broken.length }, 'statements recomputed');
  } catch (error) {
    if (error instanceof SettingsMovedError) {
      logger.info({ scope }, 'recompute superseded by a settings change');
      return;
    }
    throw error;
  }
});
