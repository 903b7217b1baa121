import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { containsPattern } from '../../db/like-pattern.ts';
import { Measurement, Source } from '../../models/index.ts';

/** A source with how many measurements in use (not retired) cite it. */
export interface SourceWithUse {
  source: Source;
  measurementCount: number;
}

/**
 * Sources by citation (at most 500), those whose citation, bibcode or DOI contains the search text
 * (ignoring case) when one is given, each with its measurements in use.
 */
export async function listSources(q?: string): Promise<SourceWithUse[]> {
  const pattern = q ? containsPattern(q, { lower: true }) : null;
  const rows = await getSequelize().query<{ id: string; count: string }>(
    `SELECT s.id, (SELECT count(*) FROM measurements m WHERE m.source_id = s.id AND m.retired_at IS NULL) AS count
     FROM sources s WHERE $1::text IS NULL OR lower(s.citation) LIKE $1 OR lower(coalesce(s.bibcode, '')) LIKE $1 OR lower(coalesce(s.doi, '')) LIKE $1
     ORDER BY lower(s.citation) LIMIT 500`,
    { type: QueryTypes.SELECT, bind: [pattern] },
  );
  const sources = await Source.findAll({ where: { id: rows.map((r) => r.id) } });
  const byId = new Map(sources.map((s) => [s.id, s]));
  return rows.map((r) => ({ source: byId.get(r.id)!, measurementCount: Number(r.count) }));
}

/** How many measurements in use (not retired) cite a source. */
export function measurementsCiting(source: Source): Promise<number> {
  return Measurement.count({ where: { sourceId: source.id, retiredAt: null } });
}
