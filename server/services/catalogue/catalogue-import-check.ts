import type { ImportMapping, ImportRejection, ImportRejectionReason, ImportReport } from '@shared/schemas/catalogue-import.ts';
import { MeasurementInputSchema, type MeasurementProblem } from '@shared/schemas/measurement.ts';
import { CatalogueLimits } from '@shared/validations.ts';
import { getSequelize } from '../../db.ts';
import { parallaxWarnings } from '@shared/catalogue/measurement-warnings.ts';
import { CatalogueImport, Measurement, type User } from '../../models/index.ts';
import type { AcceptedImportRow } from '../../models/catalogue-import.ts';
import { decodeCsv } from './csv-decode.ts';
import { ROWS_PER_SLICE, readCsvRows, yieldToEventLoop, type CsvRow } from './csv-rows.ts';
import { findExistingDuplicates, lookUpObjects, lookUpSources } from './catalogue-import-lookup.ts';

// In semicolon files the comma is the decimal mark (the convention of the locales that use them).
const decimalComma = (text: string | undefined) =>
  text && /^[+-−]?\d+,\d+$/.test(text.trim()) ? text.trim().replace(',', '.') : text;

const distinct = (rows: CsvRow[], field: 'object' | 'source') => [
  ...new Set(rows.map((r) => (r.cells[field] ?? '').trim()).filter(Boolean)),
];

/**
 * The dry run: reads the file, checks every row and stores the accepted ones under an import id,
 * changing nothing in the catalogue. The report lists every rejected row with its number and reason.
 * @param file the uploaded bytes and their name
 * @param mapping field → column header; guessed from the headers when absent
 * @throws HttpError 422 when the file cannot be read at all (empty, binary, not UTF-8, not CSV)
 */
export async function checkCatalogueImport(
  file: { buffer: Buffer; originalname: string },
  mapping: ImportMapping | undefined,
  actor: User,
): Promise<CatalogueImport> {
  const started = performance.now();
  const decoded = decodeCsv(file.buffer);
  const parsed = await readCsvRows(decoded, mapping);
  const [objects, sources] = await Promise.all([
    lookUpObjects(distinct(parsed.rows, 'object')),
    lookUpSources(distinct(parsed.rows, 'source')),
  ]);

  const rejections: ImportRejection[] = [];
  const byReason: Partial<Record<ImportRejectionReason, number>> = {};
  const reject = (row: number, reason: ImportRejectionReason, message: string) => {
    rejections.push({ row, reason, message });
    byReason[reason] = (byReason[reason] ?? 0) + 1;
  };
  const candidates: AcceptedImportRow[] = [];
  const seen = new Map<string, number>();

  for (const [index, { row, cells }] of parsed.rows.entries()) {
    // Checked in slices: other requests are answered while a large file is checked.
    if (index > 0 && index % ROWS_PER_SLICE === 0) await yieldToEventLoop();
    const objectText = (cells.object ?? '').trim();
    const sourceText = (cells.source ?? '').trim();
    const semicolon = decoded.delimiter === ';';
    const result = MeasurementInputSchema.safeParse({
      quantity: (cells.quantity ?? '').trim(),
      value: semicolon ? decimalComma(cells.value) : cells.value,
      unit: cells.unit ?? '',
      band: cells.band,
      uncertainty: semicolon ? decimalComma(cells.uncertainty) : cells.uncertainty,
      uncertaintyMinus: semicolon ? decimalComma(cells.uncertaintyMinus) : cells.uncertaintyMinus,
      uncertaintyPlus: semicolon ? decimalComma(cells.uncertaintyPlus) : cells.uncertaintyPlus,
      note: cells.note,
    });
    const objectId = objects.get(objectText);
    if (!objectText) {
      reject(row, 'unknown_object', 'The object cell is empty.');
      continue;
    }
    if (!objectId) {
      reject(
        row,
        'unknown_object',
        `No object is named "${objectText}" (by name or designation). Add it to the catalogue first.`,
      );
      continue;
    }
    if (!result.success) {
      const first = result.error.issues[0];
      const reason = ((first as { params?: { reason?: MeasurementProblem } }).params?.reason ??
        (first.path[0] === 'note' ? 'too_long' : 'non_numeric_value')) as ImportRejectionReason;
      reject(row, reason, result.error.issues.map((i) => i.message).join(' '));
      continue;
    }
    if (!sourceText) {
      reject(
        row,
        'missing_source',
        'The source cell is empty; every imported measurement needs its source (citation, bibcode or DOI).',
      );
      continue;
    }
    const sourceId = sources.get(sourceText);
    if (!sourceId) {
      reject(
        row,
        'unknown_source',
        `No source matches "${sourceText}". Add it under Sources first, then name it by its citation, bibcode or DOI.`,
      );
      continue;
    }
    const v = result.data;
    const key = `${objectId}|${v.quantity}|${v.band ?? ''}|${v.value}|${sourceId}`;
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      reject(row, 'duplicate', `Same object, quantity, band, value and source as row ${earlier}.`);
      continue;
    }
    seen.set(key, row);
    candidates.push({
      row,
      objectId,
      sourceId,
      quantity: v.quantity,
      band: v.band,
      value: v.value,
      uncertainty: v.uncertainty,
      uncertaintyMinus: v.uncertaintyMinus,
      uncertaintyPlus: v.uncertaintyPlus,
      enteredValue: v.enteredValue,
      enteredUnit: v.enteredUnit,
      note: v.note,
    });
  }

  const existing = await findExistingDuplicates(candidates);
  const accepted = candidates.filter((c, i) => {
    if (!existing.has(i)) return true;
    reject(c.row, 'duplicate', 'This measurement is already in the catalogue (same object, quantity, band, value and source).');
    return false;
  });
  rejections.sort((a, b) => a.row - b.row);
  const confirmations = await confirmationsFor(accepted);

  const report: ImportReport = {
    fileName: file.originalname,
    encoding: 'utf-8',
    hadByteOrderMark: decoded.hadByteOrderMark,
    delimiter: decoded.delimiter,
    headers: parsed.headers,
    mapping: parsed.mapping,
    totalRows: parsed.rows.length,
    acceptedCount: accepted.length,
    rejectedCount: rejections.length,
    rejections: rejections.slice(0, CatalogueLimits.importReportedRejectionsMax),
    rejectionsByReason: byReason,
    warnings: warningsFor(decoded.delimiter, rejections.length),
    confirmations: confirmations.slice(0, CatalogueLimits.importReportedRejectionsMax),
    confirmationCount: confirmations.length,
    durationMs: 0,
  };
  report.durationMs = Math.round(performance.now() - started);
  return storeCheckedImport(actor.id, file.originalname.slice(0, 255), report, accepted);
}

/**
 * The accepted rows whose values need a yes before import: each parallax, compared with the
 * object's accepted parallaxes, gets the same warnings as in the measurement form.
 */
async function confirmationsFor(accepted: AcceptedImportRow[]): Promise<Array<{ row: number; message: string }>> {
  const parallaxes = accepted.filter((r) => r.quantity === 'parallax');
  if (parallaxes.length === 0) return [];
  const published = await Measurement.findAll({
    where: {
      skyObjectId: [...new Set(parallaxes.map((r) => r.objectId))],
      quantity: 'parallax',
      status: 'accepted',
      retiredAt: null,
    },
    attributes: ['skyObjectId', 'value', 'uncertainty'],
  });
  const byObject = new Map<string, Array<{ value: number; uncertainty: number | null }>>();
  for (const m of published) byObject.set(m.skyObjectId, [...(byObject.get(m.skyObjectId) ?? []), m]);
  return parallaxes.flatMap((r) => {
    const sigma =
      r.uncertainty ??
      (r.uncertaintyMinus !== null && r.uncertaintyPlus !== null ? Math.max(r.uncertaintyMinus, r.uncertaintyPlus) : null);
    const warnings = parallaxWarnings(r.value, sigma, byObject.get(r.objectId) ?? []);
    return warnings.length === 0 ? [] : [{ row: r.row, message: warnings.map((w) => w.message).join(' ') }];
  });
}

/**
 * Stores the report and accepted rows. The rows go in as one JSON text parameter: Sequelize's own
 * JSON escaping takes seconds for 50,000 rows, the driver's parameter takes milliseconds.
 */
async function storeCheckedImport(
  actorId: string,
  fileName: string,
  report: ImportReport,
  accepted: AcceptedImportRow[],
): Promise<CatalogueImport> {
  const [[row]] = (await getSequelize().query(
    `INSERT INTO catalogue_imports (id, created_by_id, file_name, status, report, accepted_rows, created_at, updated_at)
     VALUES (gen_random_uuid(), $1, $2, 'checked', $3::jsonb, $4::jsonb, now(), now()) RETURNING id`,
    { bind: [actorId, fileName, JSON.stringify(report), JSON.stringify(accepted)] },
  )) as unknown as [[{ id: string }]];
  const record = await CatalogueImport.findByPk(row.id, { attributes: { exclude: ['acceptedRows'] } });
  return record!;
}

function warningsFor(delimiter: string, rejected: number): string[] {
  const warnings: string[] = [];
  if (delimiter === ';')
    warnings.push('Columns are separated by semicolons, so a comma in a number was read as the decimal mark (0,158 = 0.158).');
  if (rejected > CatalogueLimits.importReportedRejectionsMax)
    warnings.push(
      `Only the first ${CatalogueLimits.importReportedRejectionsMax} rejected rows are listed; the counts by reason cover all ${rejected}.`,
    );
  return warnings;
}
