import { describe, expect, it } from 'vitest';
import {
  formatDeclination,
  formatRightAscension,
  parseDeclination,
  parseRightAscension,
} from '../../../shared/catalogue/coordinates.ts';

const deg = (r: ReturnType<typeof parseRightAscension>) => (r.ok ? r.deg : Number.NaN);

describe('coordinates as people type them', () => {
  it('reads right ascension in hours or degrees', () => {
    // 05h 35m 17.3s = (5 + 35/60 + 17.3/3600) × 15 = 83.822083° (arithmetic).
    for (const text of ['05h 35m 17.3s', '5 35 17.3', '05:35:17.3'])
      expect(deg(parseRightAscension(text))).toBeCloseTo(83.822083, 6);
    expect(deg(parseRightAscension('83.822'))).toBe(83.822);
    expect(deg(parseRightAscension('5.5h'))).toBe(82.5);
    expect(parseRightAscension('24 00 00')).toMatchObject({ ok: false });
    expect(parseRightAscension('-1')).toMatchObject({ ok: false, message: expect.stringMatching(/negative/) });
    expect(parseRightAscension('soon')).toMatchObject({ ok: false, message: expect.stringMatching(/Write right ascension/) });
  });

  it('reads declination with either minus sign', () => {
    // −05° 23′ 28″ = −(5 + 23/60 + 28/3600) = −5.391111° (arithmetic).
    for (const text of ['−05° 23′ 28″', '-05 23 28', '-5:23:28', '−5d23m28s'])
      expect(deg(parseDeclination(text))).toBeCloseTo(-5.391111, 6);
    expect(deg(parseDeclination('+89.264'))).toBe(89.264);
    expect(parseDeclination('-90.5')).toMatchObject({ ok: false });
    expect(parseDeclination('12 60 00')).toMatchObject({ ok: false, message: expect.stringMatching(/less than 60/) });
  });

  it('formats back to sexagesimal, rounding without 60s', () => {
    expect(formatRightAscension(83.822083)).toBe('05h 35m 17.3s');
    expect(formatRightAscension(359.99999)).toBe('00h 00m 00.0s');
    expect(formatDeclination(-5.391111)).toBe('−05° 23′ 28″');
    expect(formatDeclination(7.4069)).toBe('+07° 24′ 25″');
  });
});
