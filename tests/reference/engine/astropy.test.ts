/**
 * The engine against astropy (Debian python3-astropy; version recorded in the
 * fixture), across flat, open, closed, radiation-bearing and massive-neutrino
 * models for 0 < z ≤ 20. Tolerance: relative 1e-6 without radiation, 1e-5 with.
 */
import { describe, expect, it } from 'vitest';
import { calculate } from '../../../shared/engine/calculate.ts';
import fixture from './astropy-fixture.json';

const QUANTITIES = [
  'comoving_distance',
  'transverse_comoving_distance',
  'angular_diameter_distance',
  'luminosity_distance',
  'lookback_time',
  'age_at_z',
  'hubble_parameter',
  'distance_modulus',
] as const;

function resultValue(result: ReturnType<typeof calculate>): number {
  if ('error' in result) throw new Error(`${result.error.code}: ${result.error.message}`);
  return result.value;
}

describe(`astropy ${fixture.astropy_version} reference fixture`, () => {
  it('holds several hundred cases', () => {
    const n = fixture.models.reduce((s, m) => s + m.cases.length * QUANTITIES.length, 0);
    expect(n).toBeGreaterThanOrEqual(300);
  });

  for (const m of fixture.models) {
    const tol = m.radiation ? 1e-5 : 1e-6;
    it(`${m.description} (tolerance ${tol})`, () => {
      let worst = 0;
      for (const c of m.cases) {
        for (const q of QUANTITIES) {
          const ours = resultValue(calculate({ quantity: q, inputs: { z: c.z }, model: m.model }));
          const ref = c[q];
          const rel = Math.abs(ours - ref) / Math.abs(ref);
          worst = Math.max(worst, rel);
          expect(rel, `${q} at z = ${c.z}: ours ${ours}, astropy ${ref}`).toBeLessThanOrEqual(tol);
        }
      }
      const age = resultValue(calculate({ quantity: 'age_now', model: m.model }));
      expect(Math.abs(age - m.age_now) / m.age_now).toBeLessThanOrEqual(tol);
      expect(worst).toBeLessThanOrEqual(tol);
    });
  }
});
