import { z } from 'zod';

/** The fields a CSV column can be mapped to; `object`, `quantity` and `value` are required. */
export const IMPORT_FIELDS = [
  'object',
  'quantity',
  'value',
  'unit',
  'band',
  'uncertainty',
  'uncertaintyMinus',
  'uncertaintyPlus',
  'source',
  'note',
] as const;
export type ImportField = (typeof IMPORT_FIELDS)[number];

export const IMPORT_FIELD_LABELS: Record<ImportField, string> = {
  object: 'Object (name or designation)',
  quantity: 'Quantity',
  value: 'Value',
  unit: 'Unit',
  band: 'Band',
  uncertainty: 'Uncertainty (±)',
  uncertaintyMinus: 'Uncertainty minus',
  uncertaintyPlus: 'Uncertainty plus',
  source: 'Source (citation, bibcode or DOI)',
  note: 'Note',
};

/** Field → column header; sent as a JSON text field beside the file. Unmapped fields are left out. */
export const ImportMappingSchema = z
  .partialRecord(z.enum(IMPORT_FIELDS, { message: `Fields are ${IMPORT_FIELDS.join(', ')}` }), z.string().max(200))
  .optional();
export type ImportMapping = Partial<Record<ImportField, string>>;

/** Why a row was rejected. */
export type ImportRejectionReason =
  | 'unknown_object'
  | 'unknown_quantity'
  | 'non_numeric_value'
  | 'unit_mismatch'
  | 'band_missing'
  | 'band_not_allowed'
  | 'invalid_band'
  | 'invalid_uncertainty'
  | 'out_of_range'
  | 'missing_source'
  | 'unknown_source'
  | 'duplicate'
  | 'too_long';

/** A rejected row: its number as a spreadsheet shows it (the header is row 1) and why. */
export interface ImportRejection {
  row: number;
  reason: ImportRejectionReason;
  message: string;
}

/** What a dry run found. */
export interface ImportReport {
  fileName: string;
  encoding: 'utf-8';
  hadByteOrderMark: boolean;
  delimiter: ',' | ';' | '\t';
  headers: string[];
  mapping: ImportMapping;
  totalRows: number;
  acceptedCount: number;
  rejectedCount: number;
  /** Rejected rows in file order, up to a limit; rejectedCount is always the full count. */
  rejections: ImportRejection[];
  rejectionsByReason: Partial<Record<ImportRejectionReason, number>>;
  warnings: string[];
  /**
   * Accepted rows whose values need a yes before they are imported (a negative parallax, a likely
   * sign error), in file order, up to a limit; confirmationCount is always the full count. Reports
   * stored before these existed have neither.
   */
  confirmations?: Array<{ row: number; message: string }>;
  confirmationCount?: number;
  durationMs: number;
}

/** Committing a checked import: `confirm` once the rows needing confirmation have been read. */
export const ImportCommitSchema = z.object({
  confirm: z.boolean({ message: 'confirm must be true or false' }).optional(),
});

/** A dry run or a commit as the API shows it. */
export interface ImportDto {
  id: string;
  status: 'checked' | 'committed';
  report: ImportReport;
  committedAt: string | null;
  createdAt: string;
  /** After a commit: how many measurements this import added (once, however often it was committed). */
  insertedCount?: number;
  /** After a commit: true when an earlier commit of the same import had already added them. */
  alreadyCommitted?: boolean;
}
