import { Op, QueryTypes } from 'sequelize';
import type { CalcModel } from '@shared/schemas/calc.ts';
import type { PreviewRow } from '@shared/schemas/settings.ts';
import { STATEMENT_TEMPLATES, findTemplate, type StatementLocale } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { SkyObject, Statement } from '../../models/index.ts';
import { getSettings, timelineForStatements } from '../settings/index.ts';
import { loadBatchJob } from './batch-load.ts';
import type { PreviewChange } from './evaluate-batch.ts';
import { poolSize, runBatch } from './evaluation-pool.ts';

const BATCH = 1000;

/**
 * What switching the cosmology would do, without changing anything: every statement that depends on
 * the cosmology is computed with the proposed model (on the worker pool), and those whose public
 * text in the organisation's locale would change, or that would break, are listed with old and new text.
 * @param model the proposed cosmology
 * @returns the statements that would move, and how many were checked
 */
export async function previewCosmologyChange(model: CalcModel): Promise<{ rows: PreviewRow[]; checked: number }> {
  const settings = await getSettings();
  const locale = settings.defaultLocale as StatementLocale;
  const cosmological = STATEMENT_TEMPLATES.filter((t) => t.usesCosmology).map((t) => t.id);
  const ids = (
    await getSequelize().query<{ id: string }>(
      'SELECT id FROM statements WHERE template_id = ANY($1::text[]) ORDER BY sky_object_id',
      {
        bind: [cosmological],
        type: QueryTypes.SELECT,
      },
    )
  ).map((r) => r.id);
  const proposed = {
    model,
    band: settings.defaultBand,
    h0Range: settings.h0Range ?? null,
    version: settings.version,
    assumptions: { spectralIndex: settings.spectralIndexDefaults ?? {} },
    timeline: await timelineForStatements(),
  };
  const computedAt = new Date();
  const batches: Array<Promise<PreviewChange[]>> = [];
  const changes: PreviewChange[] = [];
  for (let i = 0; i < ids.length; i += BATCH) {
    // Loading the next batch overlaps the computing of earlier ones, without queueing them all.
    if (batches.length > poolSize()) changes.push(...(await batches.shift()!));
    // A preview writes nothing, so its model needs no stored description.
    const job = await loadBatchJob(ids.slice(i, i + BATCH), proposed, null, { computedAt, previewLocale: locale });
    batches.push(runBatch({ ...job, previewLocale: locale }, { inline: ids.length <= BATCH }));
  }
  for (const batch of batches) changes.push(...(await batch));
  if (changes.length === 0) return { rows: [], checked: ids.length };

  // Names and current texts only for the statements that move.
  const moved = await Statement.findAll({
    attributes: ['id', 'skyObjectId', 'templateId', 'texts'],
    where: { id: { [Op.in]: changes.map((c) => c.statementId) } },
  });
  const byId = new Map(moved.map((s) => [s.id, s]));
  const objects = new Map(
    (
      await SkyObject.findAll({
        attributes: ['id', 'name'],
        where: { id: { [Op.in]: [...new Set(moved.map((s) => s.skyObjectId))] } },
      })
    ).map((o) => [o.id, o]),
  );
  const order = new Map(ids.map((id, i) => [id, i]));
  const rows: PreviewRow[] = [];
  for (const change of changes.sort((a, b) => order.get(a.statementId)! - order.get(b.statementId)!)) {
    const statement = byId.get(change.statementId);
    if (!statement) continue;
    rows.push({
      statementId: statement.id,
      objectName: objects.get(statement.skyObjectId)?.name ?? '',
      templateTitle: findTemplate(statement.templateId)?.title ?? statement.templateId,
      oldText: statement.texts?.[locale] ?? null,
      newText: change.newText,
      newStatus: change.newStatus,
      reason: change.reason,
    });
  }
  return { rows, checked: ids.length };
}
