import { Op, QueryTypes, type WhereOptions } from 'sequelize';
import { evaluateStatement } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { defineJob } from '../../jobs/queue.ts';
import { logger } from '../../logger.ts';
import { SkyObject, Statement } from '../../models/index.ts';
import { getSettings } from '../organisation-settings.ts';
import { applyOutcome, type ComputedFields } from './apply-outcome.ts';
import { buildTemplateContext, type SettingsSnapshot } from './context.ts';
import { statementEvents } from './events.ts';

/** Which statements to recompute. */
export type RecomputeScope =
  | { all: true }
  | { objectId: string }
  | { statementIds: string[] }
  | { measurementId: string }
  | { sourceId: string };

const BATCH = 500;
const COMPUTED_COLUMNS: Array<keyof ComputedFields> = [
  'status', 'statusReason', 'value', 'unit', 'intervalLow', 'intervalHigh', 'significantFigures', 'texts', 'footnotes',
  'acknowledgedTexts', 'inputs', 'working', 'warnings', 'model', 'settingsVersion', 'computedAt',
];

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

/**
 * Recomputes statements with the organisation's current settings and writes them back in batches.
 * Every batch checks, inside its transaction, that the adopted settings have not moved since the
 * computation started; if they have, the batch is dropped (the change queued its own recompute),
 * so no statement is ever marked current against a model that is no longer adopted.
 * @param options.settings compute against this snapshot instead of reading it (a long job's start)
 * @returns how many statements were written, and which changed or broke
 */
export async function recomputeStatements(scope: RecomputeScope, options: { settings?: SettingsSnapshot } = {}): Promise<{ written: number; changed: string[]; broken: string[] }> {
  const settings = options.settings ?? (await currentSettingsSnapshot());
  const ids = await idsFor(scope);
  const changed: string[] = [];
  const broken: string[] = [];
  let written = 0;
  for (let i = 0; i < ids.length; i += BATCH) {
    const statements = await Statement.findAll({ where: { id: { [Op.in]: ids.slice(i, i + BATCH) } } as WhereOptions<Statement> });
    const objects = new Map((await SkyObject.findAll({ where: { id: { [Op.in]: [...new Set(statements.map((s) => s.skyObjectId))] } } })).map((o) => [o.id, o]));
    const contexts = new Map<string, Awaited<ReturnType<typeof buildTemplateContext>>>();
    const rows: Array<ComputedFields & { id: string; skyObjectId: string; templateId: string; createdAt: Date }> = [];
    for (const statement of statements) {
      const object = objects.get(statement.skyObjectId);
      if (!object) continue;
      let ctx = contexts.get(object.id);
      if (!ctx) {
        ctx = await buildTemplateContext(object, settings);
        contexts.set(object.id, ctx);
      }
      const fields = applyOutcome(statement, evaluateStatement(statement.templateId, ctx), settings.version);
      if (fields.status === 'changed' && statement.status !== 'changed') changed.push(statement.id);
      if (fields.status === 'broken' && statement.status !== 'broken') broken.push(statement.id);
      rows.push({ ...fields, id: statement.id, skyObjectId: statement.skyObjectId, templateId: statement.templateId, createdAt: statement.createdAt });
    }
    await getSequelize().transaction(async (transaction) => {
      const current = await getSettings(transaction, 'share');
      if (current.version !== settings.version) throw new SettingsMovedError('The organisation settings changed during the recompute.');
      // One INSERT … ON CONFLICT DO UPDATE per batch instead of a round trip per statement.
      await Statement.bulkCreate(rows as never[], { updateOnDuplicate: [...COMPUTED_COLUMNS, 'updatedAt'], transaction });
    });
    written += rows.length;
  }
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
