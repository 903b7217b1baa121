import { QueryTypes } from 'sequelize';
import { QUANTITY_IDS } from '@shared/catalogue/quantities.ts';
import type { SkyObjectListQuery, SkyObjectPageDto, SkyObjectRowDto } from '@shared/schemas/sky-object.ts';
import { getSequelize } from '../../db.ts';
import { containsPattern } from '../../db/like-pattern.ts';
import { ValidationError } from '../../errors.ts';

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
  // Each "missing …" predicate is written exactly as its partial index's (migration
  // 202612040901): the planner only uses a partial index whose predicate it can see is implied.
  if (query.missing === 'position') clauses.push('o.ra_deg IS NULL');
  else if (query.missing === 'any_preferred') clauses.push("o.preferred_quantities = '{}'::text[]");
  else if (query.missing === 'source')
    clauses.push(
      "EXISTS (SELECT 1 FROM measurements s WHERE s.object_id = o.id AND s.source_id IS NULL AND s.retired_at IS NULL AND s.status = 'accepted')",
    );
  else if (query.missing && (QUANTITY_IDS as string[]).includes(query.missing)) {
    // A literal from the allow-list above, not a bind value, so the partial index matches.
    clauses.push(`NOT (o.preferred_quantities @> ARRAY['${query.missing}']::text[])`);
  }
  return { where: clauses.length ? `WHERE ${clauses.join(' AND ')}` : '', replacements };
}

interface Row {
  id: string;
  name: string;
  /** lower(name) as PostgreSQL computes it, for the keyset cursor. */
  name_key: string;
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

/** Counts stop here: past it the table says "about N", from the planner's estimate. */
export const EXACT_COUNT_CAP = 2_000;

// Sorts whose key is never NULL and has an index ending in id can be paged by keyset: the next page
// starts after the last row's key instead of skipping OFFSET rows, so page 2,000 costs what page 1 does.
const KEYSET: Partial<Record<SkyObjectListQuery['sort'], { key: string; values: (row: Row) => unknown[] }>> = {
  name: { key: '(lower(o.name), o.id)', values: (r) => [r.name_key, r.id] },
  kind: { key: '(o.kind, lower(o.name), o.id)', values: (r) => [r.kind, r.name_key, r.id] },
};

/** The opaque cursor of the row a page ends on (base64url JSON of its sort key), or null. */
function cursorAfter(query: SkyObjectListQuery, last: Row | undefined): string | null {
  const keyset = KEYSET[query.sort];
  if (!keyset || !last) return null;
  return Buffer.from(JSON.stringify(keyset.values(last))).toString('base64url');
}

/** Reads a cursor back; a cursor that does not fit the sort is refused rather than guessed at. */
function readCursor(query: SkyObjectListQuery): unknown[] | null {
  if (!query.after) return null;
  const keyset = KEYSET[query.sort];
  let values: unknown;
  try {
    values = JSON.parse(Buffer.from(query.after, 'base64url').toString('utf8'));
  } catch {
    values = null;
  }
  const width = keyset ? keyset.key.split(',').length : 0;
  if (!keyset || !Array.isArray(values) || values.length !== width || !values.every((v) => typeof v === 'string'))
    throw ValidationError('after: this link to the next page no longer fits the table; go back to the first page.', {
      after: 'Not a cursor for this sort',
    });
  return values;
}

/**
 * The statements behind a page: its rows, a count that stops at EXACT_COUNT_CAP + 1, and the
 * planner's estimate for when it does. Exported for the benchmark, which times them at the database.
 */
export function skyObjectPageQueries(query: SkyObjectListQuery): {
  pageSql: string;
  countSql: string;
  estimateSql: string;
  replacements: Record<string, unknown>;
} {
  const filter = skyObjectFilter(query);
  const replacements: Record<string, unknown> = { ...filter.replacements };
  const desc = query.dir === 'desc';
  const order = ORDER[query.sort](desc ? 'DESC' : 'ASC');
  const cursor = readCursor(query);
  let pageWhere = filter.where;
  if (cursor) {
    const keyset = KEYSET[query.sort];
    const placeholders = cursor.map((value, i) => {
      replacements[`after${i}`] = value;
      return `:after${i}`;
    });
    const after = `${keyset?.key} ${desc ? '<' : '>'} (${placeholders.join(', ')})`;
    pageWhere = pageWhere ? `${pageWhere} AND ${after}` : `WHERE ${after}`;
  }
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
       FROM (SELECT o.id, o.name, lower(o.name) AS name_key, o.designations, o.kind, o.ra_deg, o.dec_deg, o.constellation, o.updated_at
             FROM ${from} ${pageWhere} ORDER BY ${order} LIMIT :limit OFFSET :offset) p
       ORDER BY ${order.replaceAll('o.', 'p.')}`,
    countSql: `${cte}SELECT count(*) AS total FROM (SELECT 1 FROM ${from} ${filter.where} LIMIT ${EXACT_COUNT_CAP + 1}) capped`,
    estimateSql: `EXPLAIN (FORMAT JSON) ${cte}SELECT 1 FROM ${from} ${filter.where}`,
    replacements: { ...replacements, limit: query.pageSize, offset: cursor ? 0 : (query.page - 1) * query.pageSize },
  };
}

/** The planner's row estimate for a filter, rounded to two significant figures. */
async function estimatedTotal(estimateSql: string, replacements: Record<string, unknown>): Promise<number> {
  const [row] = await getSequelize().query<{ 'QUERY PLAN': Array<{ Plan: { 'Plan Rows': number } }> }>(estimateSql, {
    type: QueryTypes.SELECT,
    replacements,
  });
  const rows = row['QUERY PLAN'][0].Plan['Plan Rows'];
  const scale = 10 ** Math.max(0, Math.floor(Math.log10(Math.max(rows, 1))) - 1);
  return Math.round(rows / scale) * scale;
}

/**
 * One page of the catalogue table: filtered, sorted and counted in the database. The total is exact up
 * to EXACT_COUNT_CAP; beyond it, the planner's estimate (never below the cap) with `totalExact: false`.
 * @param query the parsed query (shared SkyObjectListQuerySchema)
 * @throws ValidationError when `after` is not a cursor of this sort
 */
export async function listSkyObjects(query: SkyObjectListQuery): Promise<SkyObjectPageDto> {
  const { pageSql, countSql, estimateSql, replacements } = skyObjectPageQueries(query);
  const sequelize = getSequelize();
  const [rows, [{ total }]] = await Promise.all([
    sequelize.query<Row>(pageSql, { type: QueryTypes.SELECT, replacements }),
    sequelize.query<{ total: string }>(countSql, { type: QueryTypes.SELECT, replacements }),
  ]);
  const capped = Number(total) > EXACT_COUNT_CAP;
  const estimate = capped ? Math.max(EXACT_COUNT_CAP + 1, await estimatedTotal(estimateSql, replacements)) : Number(total);
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
    total: estimate,
    totalExact: !capped,
    page: query.page,
    pageSize: query.pageSize,
    nextAfter: rows.length === query.pageSize ? cursorAfter(query, rows.at(-1)) : null,
  };
}
