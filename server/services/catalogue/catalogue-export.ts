import type { Writable } from 'node:stream';
import { stringify } from 'csv-stringify/sync';
import { QueryTypes } from 'sequelize';
import { formatDeclination, formatRightAscension } from '@shared/catalogue/coordinates.ts';
import { findQuantity } from '@shared/catalogue/quantities.ts';
import { getSequelize } from '../../db.ts';
import { safeCell } from './csv-safe.ts';

const BATCH = 2000;

/** Writes a header and then rows in batches read by id (keyset), so memory stays flat at any size. */
async function writeInBatches<T extends { id: string }>(
  out: Writable,
  header: string[],
  fetch: (afterId: string) => Promise<T[]>,
  toCells: (row: T) => unknown[],
): Promise<void> {
  // A byte-order mark lets spreadsheet programs open the file as UTF-8.
  out.write(`\uFEFF${stringify([header])}`);
  let after = '00000000-0000-0000-0000-000000000000';
  for (;;) {
    const rows = await fetch(after);
    if (rows.length === 0) break;
    const chunk = stringify(rows.map((r) => toCells(r).map((c) => safeCell(c as string))));
    if (!out.write(chunk)) await new Promise((resolve) => out.once('drain', resolve));
    after = rows[rows.length - 1].id;
    if (rows.length < BATCH) break;
  }
}

/**
 * Every object as CSV: name, designations, kind, position (degrees and sexagesimal), constellation, notes.
 * @param out the response (or any writable stream)
 */
export async function exportObjectsCsv(out: Writable): Promise<void> {
  type Row = {
    id: string;
    name: string;
    designations: string[];
    kind: string;
    ra_deg: number | null;
    dec_deg: number | null;
    constellation: string | null;
    notes: string;
  };
  await writeInBatches<Row>(
    out,
    ['name', 'designations', 'kind', 'ra_deg', 'dec_deg', 'ra_hms', 'dec_dms', 'constellation', 'notes'],
    (after) =>
      getSequelize().query<Row>(
        'SELECT id, name, designations, kind, ra_deg, dec_deg, constellation, notes FROM sky_objects WHERE id > $1 ORDER BY id LIMIT $2',
        { type: QueryTypes.SELECT, bind: [after, BATCH] },
      ),
    (r) => [
      r.name,
      r.designations.join('; '),
      r.kind,
      r.ra_deg,
      r.dec_deg,
      r.ra_deg === null ? '' : formatRightAscension(r.ra_deg),
      r.dec_deg === null ? '' : formatDeclination(r.dec_deg),
      r.constellation,
      r.notes,
    ],
  );
}

/**
 * Current measurements (accepted or proposed, not retired) as CSV, in canonical units, with their
 * sources. The columns are the ones the import reads, so an export can be imported elsewhere.
 * @param out the response (or any writable stream)
 * @param skyObjectId only this object's measurements, when given
 */
export async function exportMeasurementsCsv(out: Writable, skyObjectId?: string): Promise<void> {
  type Row = {
    id: string;
    object: string;
    quantity: string;
    band: string | null;
    value: number;
    uncertainty: number | null;
    uncertainty_minus: number | null;
    uncertainty_plus: number | null;
    citation: string | null;
    bibcode: string | null;
    doi: string | null;
    preferred: boolean;
    status: string;
    note: string;
    created_at: Date;
  };
  await writeInBatches<Row>(
    out,
    [
      'object',
      'quantity',
      'value',
      'unit',
      'band',
      'uncertainty',
      'uncertainty_minus',
      'uncertainty_plus',
      'source',
      'bibcode',
      'doi',
      'preferred',
      'status',
      'note',
      'entered_at',
    ],
    (after) =>
      getSequelize().query<Row>(
        `SELECT m.id, o.name AS object, m.quantity, m.band, m.value, m.uncertainty, m.uncertainty_minus, m.uncertainty_plus,
           s.citation, s.bibcode, s.doi, m.preferred, m.status, m.note, m.created_at
         FROM measurements m JOIN sky_objects o ON o.id = m.object_id LEFT JOIN sources s ON s.id = m.source_id
         WHERE m.id > $1 AND m.retired_at IS NULL AND m.status <> 'declined' AND ($3::uuid IS NULL OR m.object_id = $3)
         ORDER BY m.id LIMIT $2`,
        { type: QueryTypes.SELECT, bind: [after, BATCH, skyObjectId ?? null] },
      ),
    (r) => [
      r.object,
      r.quantity,
      r.value,
      findQuantity(r.quantity)?.canonicalUnit ?? '',
      r.band,
      r.uncertainty,
      r.uncertainty_minus,
      r.uncertainty_plus,
      r.citation,
      r.bibcode,
      r.doi,
      r.preferred ? 'yes' : 'no',
      r.status,
      r.note,
      new Date(r.created_at).toISOString(),
    ],
  );
}
