import { describe, expect, it } from 'vitest';
import { formatMeasurement, formatNumber } from '../../../src/features/catalogue/components/format.ts';

describe('numbers for people', () => {
  it('writes powers of ten, never "e-6"', () => {
    expect(formatNumber(7e-6)).toBe('7 × 10⁻⁶');
    expect(formatNumber(-2.5e9)).toBe('−2.5 × 10⁹');
    expect(formatNumber(0.536)).toBe('0.536');
  });

  it('a redshift with a tiny uncertainty reads "± 7 × 10⁻⁶"', () => {
    const text = formatMeasurement({
      quantity: 'redshift',
      value: 0.00428,
      enteredValue: 0.00428,
      enteredUnit: '',
      uncertainty: 7e-6,
      uncertaintyMinus: null,
      uncertaintyPlus: null,
    });
    expect(text).toBe('0.00428 ± 7 × 10⁻⁶');
    expect(text).not.toMatch(/e[−-]/);
  });
});
