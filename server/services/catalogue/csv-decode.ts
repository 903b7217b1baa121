import { UnprocessableError } from '../../errors.ts';

/** A CSV file's text, ready for the parser. */
export interface DecodedCsv {
  text: string;
  hadByteOrderMark: boolean;
  delimiter: ',' | ';' | '\t';
}

const refuse = (code: string, message: string) => UnprocessableError(message, code);

/** Formats people upload by mistake, recognised by their first bytes. */
const SIGNATURES: Array<{ bytes: number[]; what: string }> = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: 'a spreadsheet workbook or ZIP archive (.xlsx, .ods, .zip)' },
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: 'an old Excel workbook (.xls)' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG image' },
  { bytes: [0x1f, 0x8b], what: 'a gzip archive' },
];

function looksBinary(buffer: Buffer): string | undefined {
  for (const s of SIGNATURES) if (s.bytes.every((b, i) => buffer[i] === b)) return s.what;
  const sample = buffer.subarray(0, 8192);
  let control = 0;
  for (const byte of sample) {
    if (byte === 0) return 'binary data';
    if (byte < 0x20 && byte !== 0x09 && byte !== 0x0a && byte !== 0x0d) control += 1;
  }
  return control > sample.length * 0.01 ? 'binary data' : undefined;
}

/** The delimiter used most in the header line, counting only outside quotes. */
export function detectDelimiter(text: string): ',' | ';' | '\t' {
  const counts = { ',': 0, ';': 0, '\t': 0 };
  let quoted = false;
  for (const ch of text) {
    if (ch === '"') quoted = !quoted;
    else if (!quoted && (ch === '\n' || ch === '\r')) break;
    else if (!quoted && ch in counts) counts[ch as keyof typeof counts] += 1;
  }
  if (counts[';'] > counts[','] && counts[';'] >= counts['\t']) return ';';
  if (counts['\t'] > counts[','] && counts['\t'] > counts[';']) return '\t';
  return ',';
}

/**
 * Turns an uploaded file into text, or refuses it with a message a person can act on.
 *
 * Encoding: only UTF-8 is read (with or without a byte-order mark). Anything else is refused rather
 * than guessed: a wrong guess between Windows-1252, Latin-2 or Mac Roman silently changes names,
 * and every row here ends up behind a published number.
 * @throws HttpError 422 (empty_file, binary_file, not_utf8)
 */
export function decodeCsv(buffer: Buffer): DecodedCsv {
  if (buffer.length === 0)
    throw refuse('empty_file', 'The file is empty. Choose a CSV file with a header row and at least one row of measurements.');
  const binary = looksBinary(buffer);
  if (binary)
    throw refuse(
      'binary_file',
      `This file is ${binary}, not CSV text. In your spreadsheet use "Save as" and choose "CSV UTF-8", then upload that file.`,
    );
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(buffer);
  } catch {
    const offset = firstInvalidUtf8(buffer);
    const line = buffer.subarray(0, offset).toString('latin1').split('\n').length;
    throw refuse(
      'not_utf8',
      `This file is not UTF-8 text (the first unreadable character is on line ${line}). It was probably saved as "CSV" in a Western or Windows encoding. Save it again as "CSV UTF-8" and upload it again; nothing was imported.`,
    );
  }
  // TextDecoder drops a UTF-8 byte-order mark by default; note that there was one.
  const hadByteOrderMark = buffer[0] === 0xef && buffer[1] === 0xbb && buffer[2] === 0xbf;
  if (text.trim() === '')
    throw refuse(
      'empty_file',
      'The file has no text in it. Choose a CSV file with a header row and at least one row of measurements.',
    );
  return { text, hadByteOrderMark, delimiter: detectDelimiter(text) };
}

/** Byte offset of the first invalid UTF-8 sequence (for the error message). */
function firstInvalidUtf8(buffer: Buffer): number {
  let i = 0;
  while (i < buffer.length) {
    const b = buffer[i];
    const length = b < 0x80 ? 1 : b >= 0xc2 && b <= 0xdf ? 2 : b >= 0xe0 && b <= 0xef ? 3 : b >= 0xf0 && b <= 0xf4 ? 4 : 0;
    if (length === 0) return i;
    for (let k = 1; k < length; k += 1) if ((buffer[i + k] & 0xc0) !== 0x80) return i;
    i += length;
  }
  return i;
}
