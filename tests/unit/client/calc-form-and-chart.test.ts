import { describe, expect, it } from 'vitest';
import { calculate } from '../../../shared/engine/calculate.ts';
import type { CalcSuccess } from '../../../shared/schemas/calc.ts';
import { formatSig } from '../../../src/components/working/format-number.ts';
import { engineMessageInWords } from '../../../shared/contract/words.ts';
import { buildRequest, defaultFormValues, fieldForMessage, fieldsFor } from '../../../src/features/calc/form-request.ts';
import { HUBBLE_KEY, chartModel, chartRows, seriesKey } from '../../../src/features/charts/distance-curves.ts';

describe('the calculator form', () => {
  it('offers only the inputs the engine takes for each quantity', () => {
    expect(fieldsFor('lookback_time', 0)).toMatchObject({ required: ['z'], optional: [], band: false, usesModel: true });
    expect(fieldsFor('luminosity_ratio_sun', 2)).toMatchObject({
      required: ['m', 'parallax_mas'],
      optional: ['extinction', 'alpha'],
      band: true,
      usesModel: false,
    });
    expect(fieldsFor('flux_ratio', 1).required).toEqual(['m1', 'm2']);
    expect(fieldsFor('age_now', 0)).toMatchObject({ required: [], flrwOnly: true });
  });

  it('builds a request with symmetric and asymmetric uncertainties and a custom model', () => {
    const v = defaultFormValues();
    v.quantity = 'absolute_magnitude';
    v.inputs.m = { value: '−1.5', sigma: '', minus: '0.1', plus: '0.2', asymmetric: true };
    v.inputs.z = { value: '0.3', sigma: '0.01', minus: '', plus: '', asymmetric: false };
    v.model = 'custom';
    v.custom = { name: '', H0: '70', Om0: '0.3', Ode0: '', Tcmb0: '2.7255', Neff: '3.046', m_nu: '0, 0, 0.06' };
    const built = buildRequest(v);
    expect(built).toEqual({
      request: {
        quantity: 'absolute_magnitude',
        inputs: { m: { value: -1.5, minus: 0.1, plus: 0.2 }, z: { value: 0.3, sigma: 0.01 } },
        model: { H0: 70, Om0: 0.3, Tcmb0: 2.7255, Neff: 3.046, m_nu: [0, 0, 0.06] },
      },
    });
  });

  it('names the field when the browser can already tell what is wrong', () => {
    const v = defaultFormValues();
    v.inputs.z.value = 'far';
    v.inputs.z.sigma = '-1';
    v.h0Low = '60';
    expect(buildRequest(v)).toEqual({
      problems: [
        { path: 'inputs.z.value', message: 'Enter a number, for example 1.5 or 2e-3.' },
        { path: 'h0High', message: 'Give both ends of the H₀ range, or neither.' },
      ],
    });
  });

  it('puts a server message on its field, in words', () => {
    const v = defaultFormValues();
    expect(fieldForMessage('parallax_mas must be greater than 0 (got -1)', v)).toBe('inputs.parallax_mas.value');
    expect(fieldForMessage('the uncertainty on z reaches values where lookback_time is not defined (3.0 % of draws)', v)).toBe(
      'inputs.z.sigma',
    );
    expect(engineMessageInWords('parallax_mas must be greater than 0 (got -1)')).toBe(
      'Parallax (mas) must be greater than 0 (the value is −1)',
    );
  });
});

describe('the chart’s curves', () => {
  it('agree with the engine’s contract at the same redshift', () => {
    const planck = chartModel({ preset: 'planck18' }, 0);
    const [row] = chartRows([planck], planck.H0, [1.5]);
    for (const [quantity, key] of [
      ['luminosity_distance', 'luminosity'],
      ['proper_distance', 'proper'],
      ['light_travel_distance', 'lightTravel'],
    ] as const) {
      const r = calculate({ quantity, inputs: { z: 1.5 }, model: { preset: 'planck18' } }) as CalcSuccess;
      expect(row[seriesKey('planck18', key)]).toBeCloseTo(r.value, 6);
    }
    // d = cz/H0 (common practice: the Hubble law worked by hand).
    expect(row[HUBBLE_KEY]).toBeCloseTo((299792.458 * 1.5) / 67.66, 9);
  });

  it('says why a model cannot be drawn instead of drawing nonsense', () => {
    const bad = chartModel({ H0: 70, Om0: -0.3 }, 1);
    expect(bad.cosmo).toBeNull();
    expect(bad.problem).toMatch(/Om0 must not be negative/);
  });
});

describe('numbers in the working', () => {
  it('shows six significant digits, a proper minus and powers of ten', () => {
    expect(formatSig(9.518041606551169)).toBe('9.51804');
    expect(formatSig(-26.76)).toBe('−26.76');
    expect(formatSig(5.4020151369636465e-5)).toBe('5.40202 × 10⁻⁵');
    expect(formatSig(30856775814913670, 16)).toBe('3.085677581491367 × 10¹⁶');
    expect(formatSig(0)).toBe('0');
  });

  it('writes a seven-digit value in plain figures, rounded, never as "e+6"', () => {
    expect(formatSig(2_495_104.7)).toBe('2495100');
    expect(formatSig(-1_234_567.89)).toBe('−1234570');
    expect(formatSig(299_792.458, 16)).toBe('299792.458');
  });
});
