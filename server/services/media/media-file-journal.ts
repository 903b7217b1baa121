import { Op, QueryTypes, type Transaction } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { logger } from '../../logger.ts';
import { INSTANCE_TAG, instanceGone } from '../../media/instance.ts';
import { Media, MediaRendition } from '../../models/index.ts';
import { getStorage } from '../../storage/storage.ts';

/**
 * Notes stored files whose fate is not settled yet, before they are written (or, for removals,
 * in the transaction that stops using them). A crash in between leaves the note for the sweep.
 * @param keys storage keys
 * @param transaction the caller's, when the note must commit with its change
 */
export async function noteFiles(keys: string[], transaction?: Transaction): Promise<void> {
  for (const key of new Set(keys)) {
    await getSequelize().query(
      'INSERT INTO media_file_intents (storage_key, created_at, owner) VALUES (:key, now(), :owner) ON CONFLICT (storage_key) DO NOTHING',
      {
        replacements: { key, owner: INSTANCE_TAG },
        transaction,
      },
    );
  }
}

async function referenced(keys: string[]): Promise<Set<string>> {
  const originals = await Media.findAll({ attributes: ['originalKey'], where: { originalKey: { [Op.in]: keys } } });
  const renditions = await MediaRendition.findAll({ attributes: ['storageKey'], where: { storageKey: { [Op.in]: keys } } });
  return new Set([...originals.map((m) => m.originalKey), ...renditions.map((r) => r.storageKey)]);
}

/**
 * Settles noted files: removes each from storage unless a row now refers to it, then clears its
 * note. A file that cannot be removed keeps its note, so a later sweep tries again.
 * @param keys storage keys
 */
export async function settleFiles(keys: Iterable<string>): Promise<void> {
  const unique = [...new Set(keys)];
  if (!unique.length) return;
  const used = await referenced(unique);
  const settled: string[] = [];
  for (const key of unique) {
    try {
      if (!used.has(key)) await getStorage().delete(key);
      settled.push(key);
    } catch (err) {
      logger.warn({ err, key }, 'could not remove a stored media file; the sweep will try again');
    }
  }
  if (settled.length)
    await getSequelize().query('DELETE FROM media_file_intents WHERE storage_key IN (:settled)', { replacements: { settled } });
}

/**
 * What a crash or an outage left unsettled: notes older than the grace period, and notes of a
 * server process on this machine that is no longer running, however young.
 * @param olderThan the cut-off
 */
export async function staleNotes(olderThan: Date): Promise<string[]> {
  const rows = await getSequelize().query<{ storage_key: string; owner: string | null; old: boolean }>(
    'SELECT storage_key, owner, created_at < :olderThan AS old FROM media_file_intents',
    { replacements: { olderThan }, type: QueryTypes.SELECT },
  );
  return rows.filter((r) => r.old || instanceGone(r.owner)).map((r) => r.storage_key);
}
