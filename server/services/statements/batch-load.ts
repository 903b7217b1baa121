import { QueryTypes } from 'sequelize';
import { resolveModel } from '@shared/engine/model-resolve.ts';
import type { SentenceNames, StatementLocale } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import type { StatementStatus } from '../../models/index.ts';
import { contextKey, type BatchJob, type BatchModel, type BatchStatement } from './evaluate-batch.ts';
import { buildTemplateContexts, buildVenueNights, withVenue, type SettingsSnapshot } from './context.ts';
import { cosmologyDescriptionId } from './cosmology-descriptions.ts';

interface StatementRow {
  id: string;
  sky_object_id: string;
  template_id: string;
  venue_id: string | null;
  status: StatementStatus;
  /** JSON text, parsed where the batch is computed. */
  acknowledged_texts: string | null;
  inputs: string | null;
  night: string | null;
  model_label: string | null;
  model_h0: number | null;
  preview_text: string | null;
}

/**
 * The cosmology a batch computed under these settings names, stored (once) so statements can
 * reference it. Null when the model cannot be resolved: then every statement that needs it breaks
 * with the engine's reason, and none names a model.
 * @param settings the adopted settings
 */
export async function batchModelFor(settings: SettingsSnapshot): Promise<BatchModel | null> {
  let description: ReturnType<typeof resolveModel>['description'];
  try {
    description = resolveModel(settings.model).description;
  } catch {
    return null;
  }
  return { id: await cosmologyDescriptionId(description), json: JSON.stringify(description) };
}

/**
 * Loads a batch for evaluateBatch: only what deciding the new status needs (not the old working or
 * texts, which a recompute replaces), the objects, and their preferred measurements, in three queries;
 * statements about a venue also get the venue and its night (buildVenueNights).
 * @param ids the statements (those deleted meanwhile are left out)
 * @param settings the adopted settings
 * @param model the batch's cosmology (batchModelFor)
 * @param options.computedAt when the computation counts as made (and whose night venue statements read)
 * @param options.night a night chosen for one venue's statements
 * @param options.previewLocale load each statement's current text in this locale, for a preview
 */
export async function loadBatchJob(
  ids: string[],
  settings: SettingsSnapshot,
  model: BatchModel | null,
  options: { computedAt: Date; night?: { venueId: string; localDate: string }; previewLocale?: StatementLocale },
): Promise<BatchJob> {
  const sequelize = getSequelize();
  const rows = await sequelize.query<StatementRow>(
    `SELECT s.id, s.sky_object_id, s.template_id, s.venue_id, s.status,
            s.acknowledged_texts::text AS acknowledged_texts, s.inputs::text AS inputs, s.night::text AS night,
            d.label AS model_label, (d.description->>'H0')::float8 AS model_h0,
            CASE WHEN $2::text IS NULL THEN NULL ELSE s.texts->>$2::text END AS preview_text
       FROM statements s LEFT JOIN cosmology_descriptions d ON d.id = s.model_id
      WHERE s.id = ANY($1::uuid[])`,
    { bind: [ids, options.previewLocale ?? null], type: QueryTypes.SELECT },
  );
  const objectIds = [...new Set(rows.map((r) => r.sky_object_id))];
  const objects = objectIds.length
    ? await sequelize.query<{ id: string; name: string; kind: string; designations: string[]; sentenceNames: SentenceNames }>(
        'SELECT id, name, kind, designations, sentence_names AS "sentenceNames" FROM sky_objects WHERE id = ANY($1::uuid[])',
        {
          bind: [objectIds],
          type: QueryTypes.SELECT,
        },
      )
    : [];
  const contexts = await buildTemplateContexts(objects, settings);
  const venues = await buildVenueNights(
    [...new Set(rows.flatMap((r) => (r.venue_id ? [r.venue_id] : [])))],
    options.computedAt,
    options.night,
  );
  for (const r of rows) {
    const base = contexts.get(r.sky_object_id);
    const venue = r.venue_id ? venues.get(r.venue_id) : undefined;
    if (base && venue) contexts.set(contextKey(r.sky_object_id, r.venue_id), withVenue(base, venue));
  }
  const statements: BatchStatement[] = rows.map((r) => ({
    id: r.id,
    skyObjectId: r.sky_object_id,
    templateId: r.template_id,
    venueId: r.venue_id,
    status: r.status,
    model: r.model_label !== null && r.model_h0 !== null ? { label: r.model_label, H0: r.model_h0 } : null,
    json: { acknowledgedTexts: r.acknowledged_texts, inputs: r.inputs ?? '[]', night: r.night },
    ...(options.previewLocale ? { previewText: r.preview_text } : {}),
  }));
  return {
    statements,
    contexts: Object.fromEntries(contexts),
    model,
    settingsVersion: settings.version,
    computedAt: options.computedAt.toISOString(),
    ...(options.previewLocale ? { previewLocale: options.previewLocale } : {}),
  };
}
