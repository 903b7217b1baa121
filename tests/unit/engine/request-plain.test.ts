import { describe, expect, it } from 'vitest';
import { plainRequest } from '../../../shared/engine/request.ts';
import { CalcRequestSchema, SOURCE_LABEL_MAX } from '../../../shared/schemas/calc.ts';
import { calcCases } from './mc-regression.cases.ts';

/** Every key of every level, in order: the engine draws inputs in their key order, so it must match zod's. */
function shape(x: unknown): unknown {
  if (typeof x !== 'object' || x === null) return x;
  return Object.entries(x).map(([k, v]) => [k, shape(v)]);
}

// What a statement sends (shared/statements/inputs.ts): inputs in the template's order, not the schema's.
const statementLike = [
  {
    quantity: 'luminosity_ratio_sun',
    inputs: {
      m: { value: 18.2, sigma: 0.08, source: 'Invented survey (measurement 1)' },
      band: 'V',
      z: { value: 2.1, minus: 0.011, plus: 0.012, source: 'Invented survey, with a peculiar velocity of 300 km/s' },
    },
    model: { preset: 'wmap9' },
    H0_range: { low: 67.4, high: 73.04 },
  },
  {
    quantity: 'lookback_time',
    inputs: { z: { value: 0.3, sigma: 0.002 } },
    model: { preset: 'planck18' },
    H0_range: { low: 67.4, high: 73.04 },
  },
  { quantity: 'parallax_distance', inputs: { parallax_mas: { value: 379.2, sigma: 1.6, source: 'Invented catalogue' } } },
  { quantity: 'flux_ratio', inputs: { m2: 1, m1: 3 } },
];

describe('requests that plainly fit the contract, checked without zod', () => {
  it('come back exactly as zod gives them: the same values, keys in the schema’s order', () => {
    for (const request of statementLike) {
      const plain = plainRequest(request);
      expect(plain, JSON.stringify(request)).not.toBeNull();
      expect(shape(plain)).toEqual(shape(CalcRequestSchema.parse(request)));
    }
  });

  it('never accept what zod refuses, and agree with it on every frozen regression case', () => {
    const hostile: unknown[] = [
      { quantity: 'lookback_time', inputs: { z: Number.NaN } },
      { quantity: 'lookback_time', inputs: { z: Number.POSITIVE_INFINITY } },
      { quantity: 'lookback_time', inputs: { z: { value: 1, sigma: -0.1 } } },
      { quantity: 'lookback_time', inputs: { z: { value: 1, sigma: 0.1, minus: 0.1, plus: 0.1 } } },
      { quantity: 'lookback_time', inputs: { z: { value: 1, minus: 0.1 } } },
      { quantity: 'lookback_time', inputs: { z: { value: 1, sigma: 0.1, source: 'x'.repeat(SOURCE_LABEL_MAX + 1) } } },
      { quantity: 'lookback_time', inputs: { z: 1, band: 'V'.repeat(41) } },
      { quantity: 'lookback_time', inputs: { z: 1, redshift: 1 } },
      { quantity: 'lookback_time', inputs: { z: 1 }, model: { preset: 'planck15' } },
      { quantity: 'lookback_time', inputs: { z: 1 }, H0_range: { low: 67, high: 73, mid: 70 } },
      { quantity: 'lookback_time', inputs: { z: 1 }, extra: true },
      { quantity: 'lookback', inputs: { z: 1 } },
      { quantity: 'lookback_time', inputs: { z: { value: '1' } } },
    ];
    for (const request of [...hostile, ...calcCases()]) {
      const plain = plainRequest(request as Record<string, unknown>);
      const parsed = CalcRequestSchema.safeParse(request);
      if (plain === null) continue;
      expect(parsed.success, JSON.stringify(request)).toBe(true);
      expect(shape(plain)).toEqual(shape(parsed.data));
    }
    for (const request of hostile) expect(plainRequest(request as Record<string, unknown>)).toBeNull();
  });

  it('leave anything beyond them to zod: custom models, the Hubble law, an id', () => {
    for (const request of [
      { quantity: 'lookback_time', inputs: { z: 1 }, model: { H0: 70, Om0: 0.3 } },
      { quantity: 'lookback_time', inputs: { z: 1 }, model: { law: 'hubble', H0: 70 } },
      { id: 'a', quantity: 'lookback_time', inputs: { z: 1 } },
    ])
      expect(plainRequest(request)).toBeNull();
  });
});
