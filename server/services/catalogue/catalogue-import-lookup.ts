import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';

/** Normalises a DOI as typed in a cell ("https://doi.org/10.…", "doi:10.…") to the bare "10.…". */
export const bareDoi = (text: string) =>
  text
    .trim()
    .replace(/^https?:\/\/(dx\.)?doi\.org\//i, '')
    .replace(/^doi:\s*/i, '')
    .toLowerCase();

/**
 * Finds the objects named in a file: by name (ignoring case) or by an exact designation.
 * @returns a lookup from the text as typed to the object id
 */
export async function lookUpObjects(texts: string[]): Promise<Map<string, string>> {
  const found = new Map<string, string>();
  if (texts.length === 0) return found;
  // Joins on the typed names (indexed by lower(name)) rather than `= ANY(array)`, which compares every object with every name.
  const byName = await getSequelize().query<{ id: string; lname: string }>(
    'SELECT o.id, t.lname FROM unnest($1::text[]) AS t(lname) JOIN sky_objects o ON lower(o.name) = t.lname',
    { type: QueryTypes.SELECT, bind: [[...new Set(texts.map((t) => t.toLowerCase()))]] },
  );
  const idByName = new Map(byName.map((r) => [r.lname, r.id]));
  const rest: string[] = [];
  for (const text of texts) {
    const id = idByName.get(text.toLowerCase());
    if (id) found.set(text, id);
    else rest.push(text);
  }
  if (rest.length === 0) return found;
  // Only the texts that are not names are looked up as designations (usually few).
  const byDesignation = await getSequelize().query<{ id: string; d: string }>(
    'SELECT o.id, t.d FROM unnest($1::text[]) AS t(d) JOIN sky_objects o ON o.designations @> ARRAY[t.d]',
    { type: QueryTypes.SELECT, bind: [rest] },
  );
  for (const r of byDesignation) if (!found.has(r.d)) found.set(r.d, r.id);
  return found;
}

/**
 * Finds the sources named in a file: by citation (ignoring case), bibcode or DOI.
 * @returns a lookup from the text as typed to the source id
 */
export async function lookUpSources(texts: string[]): Promise<Map<string, string>> {
  const found = new Map<string, string>();
  if (texts.length === 0) return found;
  const rows = await getSequelize().query<{ id: string; citation: string; bibcode: string | null; doi: string | null }>(
    `SELECT s.id, s.citation, s.bibcode, s.doi FROM unnest($1::text[]) AS t(lcitation) JOIN sources s ON lower(s.citation) = t.lcitation
     UNION SELECT s.id, s.citation, s.bibcode, s.doi FROM unnest($2::text[]) AS t(bibcode) JOIN sources s ON s.bibcode = t.bibcode
     UNION SELECT s.id, s.citation, s.bibcode, s.doi FROM unnest($3::text[]) AS t(ldoi) JOIN sources s ON lower(s.doi) = t.ldoi`,
    { type: QueryTypes.SELECT, bind: [texts.map((t) => t.toLowerCase()), texts, texts.map(bareDoi)] },
  );
  const byCitation = new Map(rows.map((r) => [r.citation.toLowerCase(), r.id]));
  const byBibcode = new Map(rows.filter((r) => r.bibcode).map((r) => [r.bibcode!, r.id]));
  const byDoi = new Map(rows.filter((r) => r.doi).map((r) => [r.doi!.toLowerCase(), r.id]));
  for (const text of texts) {
    const id = byCitation.get(text.toLowerCase()) ?? byBibcode.get(text) ?? byDoi.get(bareDoi(text));
    if (id) found.set(text, id);
  }
  return found;
}

/** The parts of a measurement that make two of them the same. */
export interface DuplicateKey {
  objectId: string;
  quantity: string;
  band: string | null;
  value: number;
  sourceId: string;
}

/**
 * Which candidates already exist as current measurements (same object, quantity, band, value and source).
 * @returns the indexes (into candidates) that are duplicates
 */
export async function findExistingDuplicates(candidates: DuplicateKey[]): Promise<Set<number>> {
  if (candidates.length === 0) return new Set();
  const rows = await getSequelize().query<{ i: number }>(
    `SELECT t.i FROM unnest($1::uuid[], $2::text[], $3::text[], $4::float8[], $5::uuid[], $6::int[]) AS t(object_id, quantity, band, value, source_id, i)
     WHERE EXISTS (SELECT 1 FROM measurements m WHERE m.object_id = t.object_id AND m.quantity = t.quantity
       AND coalesce(m.band, '') = coalesce(t.band, '') AND m.value = t.value AND m.source_id = t.source_id
       AND m.retired_at IS NULL AND m.status <> 'declined')`,
    {
      type: QueryTypes.SELECT,
      bind: [
        candidates.map((c) => c.objectId),
        candidates.map((c) => c.quantity),
        candidates.map((c) => c.band),
        candidates.map((c) => c.value),
        candidates.map((c) => c.sourceId),
        candidates.map((_, i) => i),
      ],
    },
  );
  return new Set(rows.map((r) => r.i));
}
