import { QueryTypes, type Transaction } from 'sequelize';
import type { Step } from '@shared/engine/working.ts';
import { skeletonIds, unpackWorking, type SkeletonJson } from '@shared/statements/working-codec.ts';
import { getSequelize } from '../../db.ts';

/**
 * Where statements' workings are kept: each statement stores its packed working, and the step
 * skeletons it refers to live in `working_skeletons`, written once (see working-codec.ts).
 * Packing itself is in working-pack.ts, which worker threads use without a database.
 */

const CACHE_LIMIT = 5000;
// Skeletons never change, so what has been read or committed once stays true.
const cache = new Map<string, SkeletonJson>();
const remember = (id: string, json: SkeletonJson) => {
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(id, json);
};

/**
 * Stores the skeletons a batch of workings refers to, skipping those known to be stored.
 * @param skeletons skeleton JSON by id
 * @param transaction the transaction that writes the workings (so both land or neither)
 */
export async function saveSkeletons(skeletons: Iterable<[string, SkeletonJson]>, transaction: Transaction): Promise<void> {
  const fresh = [...skeletons].filter(([id]) => !cache.has(id));
  if (fresh.length === 0) return;
  await getSequelize().query(
    `INSERT INTO working_skeletons (id, skeleton)
       SELECT r.id, r.skeleton::json FROM json_to_recordset($1::json) AS r(id char(22), skeleton text)
     ON CONFLICT (id) DO NOTHING`,
    { bind: [JSON.stringify(fresh.map(([id, skeleton]) => ({ id, skeleton })))], transaction },
  );
  transaction.afterCommit(() => {
    for (const [id, json] of fresh) remember(id, json);
  });
}

/**
 * Reads a stored working back into steps, fetching the skeletons it needs.
 * @param stored the statement's `working` column
 * @returns the steps
 */
export async function readWorking(stored: unknown): Promise<Step[]> {
  const missing = skeletonIds(stored).filter((id) => !cache.has(id));
  if (missing.length > 0) {
    const rows = await getSequelize().query<{ id: string; skeleton: string }>(
      'SELECT id, skeleton::text AS skeleton FROM working_skeletons WHERE id = ANY($1::text[])',
      {
        bind: [missing],
        type: QueryTypes.SELECT,
      },
    );
    for (const row of rows) remember(row.id, row.skeleton);
  }
  return unpackWorking(stored, (id) => cache.get(id));
}
