/**
 * The model's own uncertainty in the public figures (issue 14 point 6). Check values: H0 = 67.4
 * (Planck 2018 VI, A&A 641, A6) and 73.04 km/s/Mpc (SH0ES 2022, ApJ Letters 934, L7); a peculiar
 * velocity of 300 km/s (common practice); c = 299792.458 km/s (SI, exact).
 */
import { describe, expect, it } from 'vitest';
import { evaluateStatement, type TemplateContext, type TemplateSuccess } from '../../../shared/statements/index.ts';
import {
  DEFAULT_H0_RANGE,
  h0RangeFor,
  PECULIAR_VELOCITY_KMS,
  withPeculiarVelocity,
} from '../../../shared/statements/model-uncertainty.ts';

const redshift = (value: number, sigma: number) => ({
  id: 'm-z',
  quantity: 'redshift',
  value,
  unit: '',
  band: null,
  sigma,
  source: { id: 's', citation: 'Corrie Vale demo catalogue (demo)' },
});
const ctx = (z: number, sigma: number, extra: Partial<TemplateContext> = {}): TemplateContext => ({
  object: { id: 'o', name: 'Demo galaxy', kind: 'galaxy' },
  measurements: [redshift(z, sigma)],
  model: { preset: 'planck18' },
  band: 'V',
  ...extra,
});
function ok(template: string, c: TemplateContext): TemplateSuccess {
  const r = evaluateStatement(template, c);
  if (!r.ok) throw new Error(r.reason);
  return r;
}

describe('model uncertainty in the public figures', () => {
  it('the default H0 range spans the CMB and distance-ladder values, with both sources', () => {
    expect(DEFAULT_H0_RANGE).toMatchObject({ low: 67.4, high: 73.04 });
    expect(DEFAULT_H0_RANGE.source).toMatch(/Planck 2018 VI \(A&A 641, A6.*SH0ES 2022 \(ApJ Letters 934, L7\)/);
    // Widened to hold the adopted model's own H0 (a custom model at 75).
    expect(h0RangeFor({ H0: 75, Om0: 0.3 }, null)).toMatchObject({ low: 67.4, high: 75, widened: true });
    expect(h0RangeFor({ preset: 'planck18' }, null)).toMatchObject({ widened: false });
  });

  it('the peculiar velocity adds (1 + z) σ_v / c in quadrature', () => {
    // z = 0.015: σ_z = 1.015 × 300 / 299792.458 = 0.0010157 (hand-worked).
    const { input, sigmaPec } = withPeculiarVelocity({ value: 0.015, sigma: 0.0004 });
    expect(PECULIAR_VELOCITY_KMS).toBe(300);
    expect(sigmaPec).toBeCloseTo(0.0010157, 7);
    expect(input).toMatchObject({ value: 0.015, sigma: Math.hypot(0.0004, 0.0010157026698783729) });
  });

  it('a precise redshift no longer gives three figures: H0 and the peculiar velocity limit them', () => {
    // z = 2.22 ± 0.00001: the catalogue alone would allow three figures; H0 alone is −7.4 % (67.66/73.04 − 1).
    const far = ok('distance-today', ctx(2.22, 0.00001));
    expect(far.significantFigures).toBe(2);
    expect(far.working.at(-1)!.note).toMatch(/Relative uncertainty 7\.\d % \(3–30 %\): 2 significant figures/);
    // z = 0.015: the peculiar velocity alone is 6.8 % of z, with H0 about 11 % in all.
    const near = ok('distance-today', ctx(0.015, 0.00001));
    expect(near.significantFigures).toBe(2);
    const budget = near.working[0];
    expect(budget.title).toBe('Uncertainty budget: the catalogue, the object’s own motion, and the model');
    expect(budget.inputs.find((i) => i.symbol === 'σ_v')).toMatchObject({ value: 300, source: 'common practice' });
    expect(budget.result.value).toBeCloseTo(0.0677, 3);
    expect(budget.note).toMatch(/the H0 range alone moves a distance or a time by −7\.4 % \/ \+0\.39 %/);
  });

  it('the organisation’s own H0 range is used and named', () => {
    const narrow = { low: 67.0, high: 68.0, source: 'Corrie Vale demo choice: the CMB value only (demo)' };
    const r = ok('distance-today', ctx(2.22, 0.00001, { h0Range: narrow }));
    expect(r.working[0].inputs.find((i) => i.symbol === 'H0_low')).toMatchObject({ value: 67, source: narrow.source });
    // 67.66/67 − 1 = 1.0 %: below 3 %, three figures again.
    expect(r.significantFigures).toBe(3);
  });
});
