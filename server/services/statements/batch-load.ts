import { QueryTypes } from 'sequelize';
import { resolveModel } from '@shared/engine/model-resolve.ts';
import type { SentenceNames, StatementLocale } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { contextKey, type BatchJob, type BatchModel } from './evaluate-batch.ts';
import { buildTemplateContexts, buildVenueNights, withVenue, type SettingsSnapshot } from './context.ts';
import { cosmologyDescriptionId } from './cosmology-descriptions.ts';

/** A batch's statements as one JSON text, and what the server's thread needs of them to build the contexts. */
interface BatchRow {
  statements: string;
  object_ids: string[];
  venue_ids: string[];
  /** Object and venue of each statement about a venue's night, as contextKey writes them. */
  venue_keys: string[];
}

// One row per batch: PostgreSQL writes the statements as the JSON of BatchStatement[] (their JSON
// columns embedded as they are stored, the model's H0 as float8), so this thread never builds the
// rows (see BatchJob.statements).
const LOAD_STATEMENTS = `
SELECT coalesce(json_agg(json_build_object(
         'id', s.id, 'skyObjectId', s.sky_object_id, 'templateId', s.template_id, 'venueId', s.venue_id, 'status', s.status,
         'model', CASE WHEN d.label IS NOT NULL AND d.description->>'H0' IS NOT NULL
                       THEN json_build_object('label', d.label, 'H0', (d.description->>'H0')::float8) END,
         'acknowledgedTexts', s.acknowledged_texts, 'inputs', coalesce(s.inputs, '[]'::jsonb), 'night', s.night,
         'previewText', CASE WHEN $2::text IS NULL THEN NULL ELSE s.texts->>$2::text END)), '[]')::text AS statements,
       coalesce(array_agg(DISTINCT s.sky_object_id::text), '{}')::text[] AS object_ids,
       coalesce(array_agg(DISTINCT s.venue_id::text) FILTER (WHERE s.venue_id IS NOT NULL), '{}')::text[] AS venue_ids,
       coalesce(array_agg(DISTINCT s.sky_object_id::text || '@' || s.venue_id::text) FILTER (WHERE s.venue_id IS NOT NULL), '{}')::text[] AS venue_keys
  FROM statements s LEFT JOIN cosmology_descriptions d ON d.id = s.model_id
 WHERE s.id = ANY($1::uuid[])`;

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
  const [batch] = await sequelize.query<BatchRow>(LOAD_STATEMENTS, {
    bind: [ids, options.previewLocale ?? null],
    type: QueryTypes.SELECT,
  });
  const objects = batch.object_ids.length
    ? await sequelize.query<{ id: string; name: string; kind: string; designations: string[]; sentenceNames: SentenceNames }>(
        'SELECT id, name, kind, designations, sentence_names AS "sentenceNames" FROM sky_objects WHERE id = ANY($1::uuid[])',
        {
          bind: [batch.object_ids],
          type: QueryTypes.SELECT,
        },
      )
    : [];
  const contexts = await buildTemplateContexts(objects, settings);
  const venues = await buildVenueNights(batch.venue_ids, options.computedAt, options.night);
  for (const key of batch.venue_keys) {
    const [objectId, venueId] = key.split('@');
    const base = contexts.get(objectId);
    const venue = venues.get(venueId);
    if (base && venue) contexts.set(contextKey(objectId, venueId), withVenue(base, venue));
  }
  const statements = batch.statements;
  return {
    statements,
    contexts: Object.fromEntries(contexts),
    model,
    settingsVersion: settings.version,
    computedAt: options.computedAt.toISOString(),
    ...(options.previewLocale ? { previewLocale: options.previewLocale } : {}),
  };
}
