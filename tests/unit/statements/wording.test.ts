import { describe, expect, it } from 'vitest';
import { choosePrecision, formatApproximate, roundToSignificant } from '../../../shared/statements/index.ts';
import { frenchCount } from '../../../shared/statements/templates/words.ts';

describe('precision follows the interval (our written rule)', () => {
  it.each([
    // [value, low, high, significant figures]
    [100, 50, 160, 1], // ±60 %: above 30 %
    [100, 70, 131, 1], // 31 %
    [100, 71, 129, 2], // 29 %
    [100, 97, 103, 2], // exactly 3 %: still two
    [100, 97.5, 102.5, 3], // 2.5 %
  ])('%d in [%d, %d] → %d significant figures', (value, low, high, n) => {
    expect(choosePrecision(value, { low, high }).significantFigures).toBe(n);
  });

  it('uses two figures and says so when the precision is unknown', () => {
    const p = choosePrecision(3.37e12, null);
    expect(p.significantFigures).toBe(2);
    expect(p.reason).toMatch(/precision is unknown/);
  });

  it('uses the wider side of an asymmetric interval', () => {
    expect(choosePrecision(100, { low: 99, high: 140 }).significantFigures).toBe(1);
  });
});

describe('numbers in words', () => {
  it('matches Intl.NumberFormat below a million in each locale', () => {
    for (const locale of ['en-GB', 'en-US', 'fr-FR'] as const) {
      expect(formatApproximate(4321, 2, locale).text).toBe(
        new Intl.NumberFormat(locale, { maximumSignificantDigits: 2 }).format(4300),
      );
    }
  });

  // Hand-worked cases (common practice: short scale in English, long scale in French).
  it.each([
    [3.37e12, 1, 'en-GB', '3 trillion'],
    [3.37e12, 2, 'en-US', '3.4 trillion'],
    [3.37e12, 2, 'fr-FR', '3,4 billions'],
    [4.08e9, 2, 'en-GB', '4.1 billion'],
    [4.08e9, 2, 'fr-FR', '4,1 milliards'],
    [2.5e15, 2, 'en-GB', '2.5 quadrillion'],
    [2.5e15, 2, 'fr-FR', '2,5 billiards'],
    [1.2e18, 2, 'en-GB', '1.2 quintillion'],
    [0.004567, 2, 'en-GB', '0.0046'],
    [25.04, 2, 'en-GB', '25'],
  ] as const)('%d to %d figures in %s reads “%s”', (value, n, locale, text) => {
    expect(formatApproximate(value, n, locale).text).toBe(text);
  });

  it('never shows more digits than asked for', () => {
    for (let i = 0; i < 500; i++) {
      const value = 10 ** (Math.random() * 20 - 3) * (1 + Math.random());
      const n = 1 + (i % 3);
      const { text, shown } = formatApproximate(value, n, 'en-GB');
      expect(shown).toBe(roundToSignificant(value, n));
      const digits = text
        .replace(/[^0-9]/g, '')
        .replace(/^0+/, '')
        .replace(/0+$/, '');
      expect(digits.length).toBeLessThanOrEqual(n);
    }
  });

  // Issue 14 point 5: the working claims 3 figures, so the page shows 3, zeros included.
  it.each([
    [2.2e9, 3, 'en-GB', '2.20 billion'],
    [8.6, 3, 'en-GB', '8.60'],
    [8.6, 3, 'fr-FR', '8,60'],
    [2.2e9, 3, 'fr-FR', '2,20 milliards'],
    [2.5e15, 3, 'en-GB', '2.50 quadrillion'],
    [0.5, 2, 'en-GB', '0.50'],
  ] as const)('keeps trailing zeros: %d to %d figures in %s reads “%s”', (value, n, locale, text) => {
    expect(formatApproximate(value, n, locale).text).toBe(text);
  });

  it('puts “de” after a French scale noun only', () => {
    expect(frenchCount('3,4 milliards', 'kilomètres')).toBe('3,4 milliards de kilomètres');
    expect(frenchCount('2,2 milliards', 'années-lumière')).toBe('2,2 milliards d’années-lumière');
    expect(frenchCount('640', 'fois')).toBe('640 fois');
  });
});
