import { containsPattern } from '../../db/like-pattern.ts';
import { QueryTypes, type Transaction } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { ValidationError } from '../../errors.ts';

/** An object in the catalogue, as the library shows it beside an image. */
export interface LinkedObject {
  id: string;
  name: string;
}

/**
 * The objects each image shows, by image id.
 * @param mediaIds the images
 */
export async function objectsForMedia(mediaIds: string[]): Promise<Map<string, LinkedObject[]>> {
  const byMedia = new Map<string, LinkedObject[]>(mediaIds.map((id) => [id, []]));
  if (!mediaIds.length) return byMedia;
  const rows = await getSequelize().query<{ media_id: string; id: string; name: string }>(
    `SELECT l.media_id, o.id, o.name FROM media_object_links l JOIN sky_objects o ON o.id = l.sky_object_id
      WHERE l.media_id IN (:mediaIds) ORDER BY lower(o.name)`,
    { replacements: { mediaIds }, type: QueryTypes.SELECT },
  );
  for (const row of rows) byMedia.get(row.media_id)?.push({ id: row.id, name: row.name });
  return byMedia;
}

/**
 * Sets the objects an image shows, replacing the previous list.
 * @throws HttpError 400 naming the ids that are not in the catalogue
 */
export async function replaceMediaObjects(mediaId: string, objectIds: string[], transaction: Transaction): Promise<void> {
  const ids = [...new Set(objectIds)];
  const q = getSequelize();
  if (ids.length) {
    const found = await q.query<{ id: string }>('SELECT id FROM sky_objects WHERE id IN (:ids)', {
      replacements: { ids },
      type: QueryTypes.SELECT,
      transaction,
    });
    const known = new Set(found.map((r) => r.id));
    const unknown = ids.filter((id) => !known.has(id));
    if (unknown.length)
      throw ValidationError('objectIds: some objects are not in the catalogue (they may have been deleted).', {
        objectIds: 'Some objects are not in the catalogue.',
      });
  }
  await q.query('DELETE FROM media_object_links WHERE media_id = :mediaId', { replacements: { mediaId }, transaction });
  for (const id of ids) {
    await q.query('INSERT INTO media_object_links (media_id, sky_object_id) VALUES (:mediaId, :id)', {
      replacements: { mediaId, id },
      transaction,
    });
  }
}

/** Escapes LIKE wildcards so a search for "50%" finds the characters, not everything. */
export const likePattern = (text: string) => containsPattern(text);

/**
 * Catalogue objects whose name or designation contains the text, for the object picker.
 * @param text what the person typed
 */
export async function suggestObjects(text: string): Promise<LinkedObject[]> {
  return getSequelize().query<LinkedObject>(
    `SELECT id, name FROM sky_objects
      WHERE name ILIKE :pattern OR EXISTS (SELECT 1 FROM unnest(designations) d WHERE d ILIKE :pattern)
      ORDER BY lower(name) LIMIT 12`,
    { replacements: { pattern: likePattern(text) }, type: QueryTypes.SELECT },
  );
}
