import { QueryTypes, type Transaction } from 'sequelize';
import type { ResolvedModel } from '@shared/schemas/calc.ts';
import { getSequelize } from '../../db.ts';

// Rows never change once written, so an id learnt once holds for the life of the process.
const known = new Map<string, string>();

/**
 * The id of the stored description of a resolved cosmology, storing it the first time it is seen.
 * PostgreSQL computes the id (SHA-256 of the jsonb text), so the same model always gets one row
 * whichever instance writes it first.
 * @param description the resolved model, as the engine gives it
 * @param transaction the transaction to write in, if any
 * @returns the description's id
 */
export async function cosmologyDescriptionId(description: ResolvedModel, transaction?: Transaction): Promise<string> {
  const json = JSON.stringify(description);
  const hit = known.get(json);
  if (hit) return hit;
  const [row] = await getSequelize().query<{ id: string }>(
    `WITH d AS (SELECT $1::jsonb AS description)
     INSERT INTO cosmology_descriptions (id, label, description)
       SELECT encode(sha256(convert_to(description::text, 'UTF8')), 'hex'), description->>'label', description FROM d
     ON CONFLICT (id) DO UPDATE SET label = EXCLUDED.label
     RETURNING id`,
    { bind: [json], type: QueryTypes.SELECT, transaction },
  );
  // Inside a transaction the row exists for others only once it commits.
  if (transaction) transaction.afterCommit(() => void known.set(json, row.id));
  else known.set(json, row.id);
  return row.id;
}
