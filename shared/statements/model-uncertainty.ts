/**
 * The adopted model's own uncertainty, added to what the catalogue says, so the public figures do
 * not claim more than the model allows:
 * - H0: the organisation's settings carry a range with its source; by default one that spans the
 *   current disagreement between methods (early universe vs distance ladder). Distances and times
 *   are drawn over it with the density parameters held fixed.
 * - Peculiar velocity: a galaxy's own motion adds to its redshift, (1 + z_obs) = (1 + z_flow)(1 + v/c),
 *   so σ_z = (1 + z) σ_v / c is added in quadrature to the catalogue's σ_z. Common practice takes
 *   σ_v ≈ 300 km/s; at z = 0.015 that alone is about 7 % of the distance, at z = 1 it is negligible.
 */
import { SPEED_OF_LIGHT } from '../engine/constants.ts';
import { resolveModel } from '../engine/model-resolve.ts';
import type { Step } from '../engine/working.ts';
import type { CalcModel, MeasuredInput } from '../schemas/calc.ts';
import type { H0Range } from '../schemas/settings.ts';

/**
 * The default H0 range: from the CMB value to the distance-ladder value, the two ends of the
 * current disagreement between methods.
 */
export const DEFAULT_H0_RANGE: H0Range = {
  low: 67.4,
  high: 73.04,
  source:
    'Planck 2018 VI (A&A 641, A6, 2020): H0 = 67.4 ± 0.5 km/s/Mpc (CMB); SH0ES 2022 (ApJ Letters 934, L7): H0 = 73.04 ± 1.04 km/s/Mpc (Cepheid–supernova distance ladder). The range spans both central values.',
};

/** A galaxy's peculiar velocity, 68 % (common practice: about 300 km/s). */
export const PECULIAR_VELOCITY_KMS = 300;

/** The H0 range a statement uses: the organisation's, widened to hold the adopted model's own H0. */
export function h0RangeFor(model: CalcModel, range: H0Range | null | undefined): H0Range & { widened: boolean } {
  const r = range ?? DEFAULT_H0_RANGE;
  const H0 = resolveModel(model).view.H0;
  const low = Math.min(r.low, H0);
  const high = Math.max(r.high, H0);
  return { low, high, source: r.source, widened: low !== r.low || high !== r.high };
}

/**
 * A redshift input with the peculiar-velocity term added in quadrature to each side.
 * @param z the catalogue's redshift as an engine input
 */
export function withPeculiarVelocity(z: MeasuredInput): { input: MeasuredInput; sigmaPec: number } {
  const value = typeof z === 'number' ? z : z.value;
  const sigmaPec = ((1 + value) * PECULIAR_VELOCITY_KMS) / SPEED_OF_LIGHT.value;
  const add = (s: number) => Math.hypot(s, sigmaPec);
  if (typeof z === 'number') return { input: { value, sigma: sigmaPec, source: 'peculiar velocity only' }, sigmaPec };
  const source = `${z.source ?? 'request'}, with a peculiar velocity of ${PECULIAR_VELOCITY_KMS} km/s`;
  if ('minus' in z) return { input: { value, minus: add(z.minus), plus: add(z.plus), source }, sigmaPec };
  return { input: { value, sigma: add(z.sigma ?? 0), source }, sigmaPec };
}

/**
 * The working step that shows each contribution to the interval: the catalogue's σ_z, the
 * peculiar velocity, and the H0 range (with its exact effect on a distance or time, which scale as 1/H0).
 */
export function budgetStep(args: {
  z: MeasuredInput;
  sigmaPec: number;
  range: H0Range & { widened: boolean };
  H0: number;
}): Step {
  const { z, sigmaPec, range, H0 } = args;
  const zValue = typeof z === 'number' ? z : z.value;
  const catalogue = typeof z === 'number' ? null : 'minus' in z ? Math.max(z.minus, z.plus) : (z.sigma ?? null);
  return {
    title: 'Uncertainty budget: the catalogue, the object’s own motion, and the model',
    formula: 'σ_z² = σ_z,catalogue² + ((1 + z) σ_v / c)²;  H0 drawn over [H0_low, H0_high]',
    inputs: [
      {
        symbol: 'σ_z,cat',
        name: catalogue === null ? 'catalogue uncertainty of z (none stated)' : 'catalogue uncertainty of z',
        value: catalogue ?? 0,
        unit: '',
        source: typeof z === 'number' ? 'the catalogue' : (z.source ?? 'the catalogue'),
      },
      {
        symbol: 'σ_v',
        name: 'peculiar velocity of a galaxy (68 %)',
        value: PECULIAR_VELOCITY_KMS,
        unit: 'km/s',
        source: 'common practice',
      },
      { symbol: 'σ_z,pec', name: 'its share of the redshift, (1 + z) σ_v / c', value: sigmaPec, unit: '', source: 'this step' },
      { symbol: 'H0_low', name: 'lower end of the H0 range', value: range.low, unit: 'km/s/Mpc', source: range.source },
      { symbol: 'H0_high', name: 'upper end of the H0 range', value: range.high, unit: 'km/s/Mpc', source: range.source },
    ],
    constants: [],
    result: {
      symbol: 'σ_z,pec / z',
      name: 'peculiar velocity as a fraction of the redshift',
      value: zValue > 0 ? sigmaPec / zValue : 0,
      unit: '',
    },
    note: `Each contribution: the catalogue's σ_z ${catalogue === null ? 'is not stated' : `is ${catalogue}`}; the peculiar velocity adds σ_z = ${sigmaPec.toPrecision(2)} (${zValue > 0 ? ((100 * sigmaPec) / zValue).toPrecision(2) : '—'} % of z); the H0 range alone moves a distance or a time by −${(100 * (1 - H0 / range.high)).toPrecision(2)} % / +${(100 * (H0 / range.low - 1)).toPrecision(2)} % (they scale as 1/H0, here H0 = ${H0}).${range.widened ? ' The range was widened to hold the adopted model’s own H0.' : ''} All three are drawn together in the Monte Carlo, whose interval sets the public figures.`,
  };
}
