import { describe, expect, it } from 'vitest';
import { decodeCsv, detectDelimiter } from '../../../server/services/catalogue/csv-decode.ts';
import { readCsvRows } from '../../../server/services/catalogue/csv-rows.ts';
import { safeCell } from '../../../server/services/catalogue/csv-safe.ts';

describe('reading CSV files', () => {
  it('finds the delimiter from the header, ignoring quoted text', () => {
    expect(detectDelimiter('a;b;c\n1;2;3')).toBe(';');
    expect(detectDelimiter('"x;y;z",b\n')).toBe(',');
    expect(detectDelimiter('a\tb\tc\n')).toBe('\t');
  });

  it('notes a byte-order mark and keeps quoted commas and line breaks in one cell', async () => {
    const decoded = decodeCsv(
      Buffer.from(
        '\uFEFFobject,quantity,value,note\n"Gamma, the Comma Galaxy",redshift,0.1,"two\nlines"\n\nDelta,redshift,0.2,\n',
        'utf8',
      ),
    );
    expect(decoded.hadByteOrderMark).toBe(true);
    const { rows } = await readCsvRows(decoded, undefined);
    expect(rows.map((r) => [r.row, r.cells.object, r.cells.note])).toEqual([
      [2, 'Gamma, the Comma Galaxy', 'two\nlines'],
      [4, 'Delta', ''],
    ]);
  });

  it('refuses what is not UTF-8 CSV text, saying why', async () => {
    expect(() => decodeCsv(Buffer.alloc(0))).toThrow(/empty/);
    expect(() => decodeCsv(Buffer.from('  \n \n'))).toThrow(/no text/);
    expect(() => decodeCsv(Buffer.from([0x25, 0x50, 0x44, 0x46, 0x2d]))).toThrow(/a PDF/);
    expect(() => decodeCsv(Buffer.from('name\nabc\u0000def'))).toThrow(/binary data/);
    expect(() => decodeCsv(Buffer.from([0x61, 0x0a, 0x62, 0xe9, 0x0a]))).toThrow(/line 2/);
    await expect(readCsvRows(decodeCsv(Buffer.from('object,quantity,value\n"open,redshift,1\n')), undefined)).rejects.toThrow(
      /could not be read as CSV/,
    );
  });
});

describe('writing CSV cells', () => {
  it('defuses formulas but leaves plain numbers alone (OWASP CSV injection guidance)', () => {
    expect(safeCell('=HYPERLINK("http://x")')).toBe('\'=HYPERLINK("http://x")');
    expect(safeCell('+1+2')).toBe("'+1+2");
    expect(safeCell('-2+3')).toBe("'-2+3");
    expect(safeCell('@SUM(A1)')).toBe("'@SUM(A1)");
    expect(safeCell('\t=1')).toBe("'\t=1");
    expect(safeCell(-1.46)).toBe('-1.46');
    expect(safeCell('-26.74')).toBe('-26.74');
    expect(safeCell('1e-3')).toBe('1e-3');
    expect(safeCell('Sirius')).toBe('Sirius');
    expect(safeCell(null)).toBe('');
  });
});
