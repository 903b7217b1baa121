import { parse, type Options } from 'csv-parse';
import { IMPORT_FIELDS, type ImportField, type ImportMapping } from '@shared/schemas/catalogue-import.ts';
import { CatalogueLimits } from '@shared/validations.ts';
import { BadRequestError, UnprocessableError } from '../../errors.ts';
import type { DecodedCsv } from './csv-decode.ts';

/** Lets other requests run between slices of a long check (a 100,000-row file takes seconds). */
export const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve));

/** Rows handled between two yields; a slice takes a few milliseconds. */
export const ROWS_PER_SLICE = 2_000;

const CHARS_PER_SLICE = 64 * 1024;

/**
 * csv-parse's streaming parser fed 64 KB at a time, yielding to the event loop between slices, so
 * parsing a large file never holds up other requests for long.
 */
async function parseInSlices(text: string, options: Options): Promise<string[][]> {
  const parser = parse(options);
  const records: string[][] = [];
  let failure: unknown;
  parser.on('readable', () => {
    for (let record = parser.read(); record !== null; record = parser.read()) records.push(record as string[]);
  });
  const ended = new Promise<void>((resolve) => {
    parser.once('end', resolve);
    parser.once('error', (err) => {
      failure = err;
      resolve();
    });
  });
  for (let i = 0; i < text.length && !failure; i += CHARS_PER_SLICE) {
    parser.write(text.slice(i, i + CHARS_PER_SLICE));
    await yieldToEventLoop();
  }
  if (!failure) parser.end();
  await ended;
  if (failure) throw failure;
  return records;
}

/** A data row: its number as a spreadsheet shows it (header = 1) and its cells by field. */
export interface CsvRow {
  row: number;
  cells: Partial<Record<ImportField, string>>;
}

const refuse = (code: string, message: string) => UnprocessableError(message, code);

/** Header spellings recognised without a mapping, compared without case, spaces, _ or -. */
const HEADER_GUESSES: Record<ImportField, string[]> = {
  object: ['object', 'objectname', 'name', 'target', 'designation'],
  quantity: ['quantity', 'measure'],
  value: ['value'],
  unit: ['unit', 'units'],
  band: ['band', 'filter', 'passband'],
  uncertainty: ['uncertainty', 'error', 'err', 'sigma', '±'],
  uncertaintyMinus: ['uncertaintyminus', 'errorminus', 'errminus', 'minus', 'lowererror'],
  uncertaintyPlus: ['uncertaintyplus', 'errorplus', 'errplus', 'plus', 'uppererror'],
  source: ['source', 'citation', 'reference', 'ref', 'bibcode', 'doi'],
  note: ['note', 'notes', 'comment', 'comments'],
};

const squash = (s: string) => s.toLowerCase().replace(/[\s_-]+/g, '');

/** The mapping used: the one given, or one guessed from the headers. */
export function resolveMapping(headers: string[], given: ImportMapping | undefined): ImportMapping {
  if (given && Object.keys(given).length > 0) {
    for (const [field, header] of Object.entries(given)) {
      if (header && !headers.includes(header)) {
        throw BadRequestError(
          `The column "${header}" chosen for ${field} is not in the file. Its columns are: ${headers.join(', ')}.`,
          'invalid_mapping',
        );
      }
    }
    return Object.fromEntries(Object.entries(given).filter(([, h]) => h)) as ImportMapping;
  }
  const mapping: ImportMapping = {};
  for (const field of IMPORT_FIELDS) {
    const header = headers.find((h) => HEADER_GUESSES[field].includes(squash(h)));
    if (header && !Object.values(mapping).includes(header)) mapping[field] = header;
  }
  return mapping;
}

/**
 * Parses the text into rows of mapped cells. Quoted fields may hold the delimiter and line breaks;
 * blank lines are skipped but still counted, so row numbers match what a spreadsheet shows.
 * @throws HttpError 422 when the text is not CSV, has no data rows, lacks required columns or is too long
 */
export async function readCsvRows(
  decoded: DecodedCsv,
  given: ImportMapping | undefined,
): Promise<{ headers: string[]; mapping: ImportMapping; rows: CsvRow[] }> {
  let records: string[][];
  try {
    records = await parseInSlices(decoded.text, {
      delimiter: decoded.delimiter,
      bom: true,
      relax_column_count: true,
      skip_empty_lines: false,
      trim: true,
    });
  } catch (error) {
    const detail = error instanceof Error ? error.message.replace(/^Invalid Record Length: /, '') : 'unreadable';
    throw refuse(
      'malformed_csv',
      `The file could not be read as CSV: ${detail}. Check for a quote (") that is opened but never closed.`,
    );
  }
  const headerIndex = records.findIndex((r) => r.some((c) => c !== ''));
  if (headerIndex < 0) throw refuse('empty_file', 'The file has no header row.');
  const headers = records[headerIndex].map((h) => h.trim());
  const mapping = resolveMapping(headers, given);
  const missing = (['object', 'quantity', 'value'] as const).filter((f) => !mapping[f]);
  if (missing.length) {
    throw refuse(
      'missing_columns',
      `No column was found for ${missing.join(', ')}. The file's columns are: ${headers.join(', ') || '(none)'}. Name the columns object, quantity, value, unit, band, uncertainty and source, or choose them below.`,
    );
  }
  const columnOf = Object.fromEntries(
    Object.entries(mapping).map(([field, header]) => [field, headers.indexOf(header!)]),
  ) as Partial<Record<ImportField, number>>;
  const rows: CsvRow[] = [];
  for (let i = headerIndex + 1; i < records.length; i += 1) {
    const record = records[i];
    if (record.every((c) => c === '')) continue;
    const cells: CsvRow['cells'] = {};
    for (const [field, index] of Object.entries(columnOf)) cells[field as ImportField] = record[index!] ?? '';
    rows.push({ row: i + 1, cells });
    if (rows.length % ROWS_PER_SLICE === 0) await yieldToEventLoop();
    if (rows.length > CatalogueLimits.importMaxRows) {
      throw refuse(
        'too_many_rows',
        `The file has more than ${CatalogueLimits.importMaxRows.toLocaleString('en-GB')} rows. Split it into smaller files and import them one after another.`,
      );
    }
  }
  if (rows.length === 0) throw refuse('no_rows', 'The file has a header row but no measurements under it.');
  return { headers, mapping, rows };
}
