import { containsPattern } from '../db/like-pattern.ts';
import { QueryTypes } from 'sequelize';
import { QUANTITY_IDS } from '@shared/catalogue/quantities.ts';
import type { SkyObjectListQuery, SkyObjectPageDto, SkyObjectRowDto } from '@shared/schemas/sky-object.ts';
import { getSequelize } from '../db.ts';

// Every sort ends on id so pages never repeat or skip rows that tie.
const ORDER: Record<SkyObjectListQuery['sort'], (dir: string) => string> = {
  name: (d) => `lower(o.name) ${d}, o.id ${d}`,
  kind: (d) => `o.kind ${d}, lower(o.name) ${d}, o.id ${d}`,
  constellation: (d) => `o.constellation ${d} NULLS LAST, lower(o.name) ${d}, o.id ${d}`,
  ra: (d) => `o.ra_deg ${d} NULLS LAST, o.id ${d}`,
  dec: (d) => `o.dec_deg ${d} NULLS LAST, o.id ${d}`,
  updated: (d) => `o.updated_at ${d}, o.id ${d}`,
};

/** Builds the WHERE clause with named replacements; values never reach the SQL text. */
export function skyObjectFilter(query: Pick<SkyObjectListQuery, 'q' | 'kind' | 'missing'>): {
  where: string;
  replacements: Record<string, unknown>;
} {
  const clauses: string[] = [];
  const replacements: Record<string, unknown> = {};
  if (query.q) {
    replacements.pattern = containsPattern(query.q, { lower: true });
    replacements.exact = query.q;
    clauses.push('(lower(o.name) LIKE :pattern OR o.designations @> ARRAY[:exact]::text[])');
  }
  if (query.kind) {
    replacements.kind = query.kind;
    clauses.push('o.kind = :kind');
  }
  if (query.missing === 'position') clauses.push('o.ra_deg IS NULL');
  else if (query.missing === 'any_preferred')
    clauses.push('NOT EXISTS (SELECT 1 FROM measurements p WHERE p.object_id = o.id AND p.preferred)');
  else if (query.missing === 'source')
    clauses.push(
      "EXISTS (SELECT 1 FROM measurements s WHERE s.object_id = o.id AND s.source_id IS NULL AND s.retired_at IS NULL AND s.status = 'accepted')",
    );
  else if (query.missing && (QUANTITY_IDS as string[]).includes(query.missing)) {
    replacements.missingQuantity = query.missing;
    clauses.push(
      'NOT EXISTS (SELECT 1 FROM measurements p WHERE p.object_id = o.id AND p.quantity = :missingQuantity AND p.preferred)',
    );
  }
  return { where: clauses.length ? `WHERE ${clauses.join(' AND ')}` : '', replacements };
}

interface Row {
  id: string;
  name: string;
  designations: string[];
  kind: SkyObjectRowDto['kind'];
  ra_deg: number | null;
  dec_deg: number | null;
  constellation: string | null;
  updated_at: Date;
  measurement_count: string;
  preferred_count: string;
  proposed_count: string;
}

/**
 * The two statements behind a page: the rows and the total. Exported for the benchmark, which
 * times them at the database with EXPLAIN ANALYZE.
 */
export function skyObjectPageQueries(query: SkyObjectListQuery): {
  pageSql: string;
  countSql: string;
  replacements: Record<string, unknown>;
} {
  const { where, replacements } = skyObjectFilter(query);
  const order = ORDER[query.sort](query.dir === 'desc' ? 'DESC' : 'ASC');
  // A search is selective but PostgreSQL cannot tell from trigram statistics, and may walk the whole
  // name index looking for 50 matches; materialising the matches first keeps a search to its hits.
  const from = query.q ? 'matched o' : 'sky_objects o';
  const cte = query.q
    ? 'WITH matched AS MATERIALIZED (SELECT * FROM sky_objects o WHERE lower(o.name) LIKE :pattern OR o.designations @> ARRAY[:exact]::text[]) '
    : '';
  return {
    // The page is chosen first and the counts computed for its 50 rows only: in one flat query
    // PostgreSQL would compute them for every row skipped by OFFSET too.
    pageSql: `${cte}SELECT p.*,
         (SELECT count(*) FROM measurements m WHERE m.object_id = p.id AND m.retired_at IS NULL AND m.status = 'accepted') AS measurement_count,
         (SELECT count(*) FROM measurements m WHERE m.object_id = p.id AND m.preferred) AS preferred_count,
         (SELECT count(*) FROM measurements m WHERE m.object_id = p.id AND m.retired_at IS NULL AND m.status = 'proposed') AS proposed_count
       FROM (SELECT o.id, o.name, o.designations, o.kind, o.ra_deg, o.dec_deg, o.constellation, o.updated_at
             FROM ${from} ${where} ORDER BY ${order} LIMIT :limit OFFSET :offset) p
       ORDER BY ${order.replaceAll('o.', 'p.')}`,
    countSql: `${cte}SELECT count(*) AS total FROM ${from} ${where}`,
    replacements: { ...replacements, limit: query.pageSize, offset: (query.page - 1) * query.pageSize },
  };
}

/**
 * One page of the catalogue table: filtered, sorted and counted in the database.
 * @param query the parsed query (shared SkyObjectListQuerySchema)
 */
export async function listSkyObjects(query: SkyObjectListQuery): Promise<SkyObjectPageDto> {
  const { pageSql, countSql, replacements } = skyObjectPageQueries(query);
  const sequelize = getSequelize();
  const [rows, [{ total }]] = await Promise.all([
    sequelize.query<Row>(pageSql, { type: QueryTypes.SELECT, replacements }),
    sequelize.query<{ total: string }>(countSql, { type: QueryTypes.SELECT, replacements }),
  ]);
  return {
    rows: rows.map((r) => ({
      id: r.id,
      name: r.name,
      designations: r.designations,
      kind: r.kind,
      raDeg: r.ra_deg,
      decDeg: r.dec_deg,
      constellation: r.constellation,
      measurementCount: Number(r.measurement_count),
      preferredCount: Number(r.preferred_count),
      proposedCount: Number(r.proposed_count),
      updatedAt: new Date(r.updated_at).toISOString(),
    })),
    total: Number(total),
    page: query.page,
    pageSize: query.pageSize,
  };
}
