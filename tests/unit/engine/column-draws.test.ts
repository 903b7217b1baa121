import { describe, expect, it } from 'vitest';
import { drawColumn, fillAbsoluteMagnitude, fillScaledInZ, type ColumnRun } from '../../../shared/engine/column-draws.ts';
import { resolveModel } from '../../../shared/engine/model-resolve.ts';
import { localDistance, localModulus } from '../../../shared/engine/quantities/local-modulus.ts';
import { sampleAge, sampleLookback } from '../../../shared/engine/quantities/sample-cosmic.ts';
import { H0_SLOT, M, sampleEnv, Z } from '../../../shared/engine/quantities/sample-env.ts';
import { exactModulusAt, sampleAbsoluteMagnitude } from '../../../shared/engine/quantities/sample-photometry.ts';
import { SAMPLES, seededDeviates, type Measurement } from '../../../shared/engine/uncertainty.ts';

// The column fills must give every draw exactly (Object.is) as the one-draw-at-a-time loop of
// monte-carlo.ts computes it; these references repeat that loop's arithmetic for each draw.
const view = resolveModel({ preset: 'wmap9' }).view;
const h0: Measurement = { value: view.H0, minus: view.H0 - 67.4, plus: 73.04 - view.H0, source: 'test range', lower: 0 };
const measured = (value: number, sigma: number): Measurement => ({ value, minus: sigma, plus: sigma, source: 'test' });

/** Draw i of the input at position j of n, as drawAll writes it into the input's slot. */
function drawn(m: Measurement, n: number, j: number, i: number): number {
  const d = seededDeviates(SAMPLES * n)[i * n + j];
  return m.value + d * (d < 0 ? m.minus : m.plus);
}

describe('Monte Carlo draws a column at a time', () => {
  it('an input’s column holds the value the draw loop puts in its slot, draw by draw', () => {
    const out = new Float64Array(SAMPLES);
    const m = { value: 0.7, minus: 0.02, plus: 0.05, source: 'test' };
    drawColumn(out, 3, 1, m);
    for (let i = 0; i < SAMPLES; i++) expect(Object.is(out[i], drawn(m, 3, 1, i))).toBe(true);
  });

  it('a distance or time over z and H0 is the interpolant at each z divided by that draw’s H0 scale, to the bit', () => {
    const env = sampleEnv(view, undefined, ['z']);
    for (const [name, sample] of [
      ['lookback', (z: number) => sampleLookback(env, z)],
      ['age', (z: number) => sampleAge(env, z, false)],
    ] as const) {
      for (const [zValue, sigma] of [
        [0.05, 0.001],
        [1.3, 0.02],
        [4.5, 0.2],
      ]) {
        const z = measured(zValue, sigma);
        const inZ = localDistance(sample, zValue - 5 * sigma, zValue + 5 * sigma)!;
        expect(inZ, `${name} at z=${zValue}`).not.toBeNull();
        const run: ColumnRun = {
          varied: [
            { name: 'z', m: z },
            { name: 'H0', m: h0 },
          ],
          nominalH0: view.H0,
        };
        const out = new Float64Array(SAMPLES);
        expect(fillScaledInZ(run, inZ, out)).toBe(true);
        for (let i = 0; i < SAMPLES; i++) {
          const scale = drawn(h0, 2, 1, i) / view.H0;
          const expected = inZ(drawn(z, 2, 0, i)) / scale;
          if (!Object.is(out[i], expected)) expect.fail(`${name} at z=${zValue}, draw ${i}: ${out[i]} ≠ ${expected}`);
        }
      }
    }
  });

  it('an absolute magnitude over m, z and H0 is what sampleAbsoluteMagnitude gives for each draw, to the bit', () => {
    const env = sampleEnv(view, 'V', ['m', 'z', 'H0']);
    const m = measured(18.2, 0.08);
    for (const [zValue, sigma] of [
      [0.03, 0.0005],
      [2.2, 0.03],
    ]) {
      const z = measured(zValue, sigma);
      env.modulusAt = localModulus((zz) => exactModulusAt(env, zz), zValue - 5 * sigma, zValue + 5 * sigma);
      expect(env.modulusAt).not.toBeNull();
      // The run's inputs in request order (m before z), as interval.ts hands them over.
      const run: ColumnRun = {
        varied: [
          { name: 'm', m },
          { name: 'z', m: z },
          { name: 'H0', m: h0 },
        ],
        nominalH0: view.H0,
      };
      const out = new Float64Array(SAMPLES);
      expect(fillAbsoluteMagnitude(run, env.modulusAt!, out)).toBe(true);
      const x = new Float64Array(H0_SLOT + 1);
      for (let i = 0; i < SAMPLES; i++) {
        x[M] = drawn(m, 3, 0, i);
        x[Z] = drawn(z, 3, 1, i);
        x[H0_SLOT] = drawn(h0, 3, 2, i);
        env.h0Scale = x[H0_SLOT] / view.H0;
        const expected = sampleAbsoluteMagnitude(env, x);
        if (!Object.is(out[i], expected)) expect.fail(`z=${zValue}, draw ${i}: ${out[i]} ≠ ${expected}`);
      }
    }
  });

  it('gives up, so the loop draws and counts the failures, when a draw is not finite', () => {
    const env = sampleEnv(view, undefined, ['z']);
    const inZ = localDistance((z) => sampleLookback(env, z), 0.9, 1.1)!;
    const out = new Float64Array(SAMPLES);
    // Some H0 draws at or below zero (no bound given): the loop fails those draws.
    const wild = { value: 70, minus: 60, plus: 5, source: 'test' };
    const z = measured(1, 0.01);
    expect(
      fillScaledInZ(
        {
          varied: [
            { name: 'z', m: z },
            { name: 'H0', m: wild },
          ],
          nominalH0: 70,
        },
        inZ,
        out,
      ),
    ).toBe(false);
    const modulus = localModulus((zz) => exactModulusAt(env, zz), 0.9, 1.1)!;
    const noMagnitude = measured(Number.NaN, 0.1);
    expect(
      fillAbsoluteMagnitude(
        {
          varied: [
            { name: 'm', m: noMagnitude },
            { name: 'z', m: z },
            { name: 'H0', m: h0 },
          ],
          nominalH0: view.H0,
        },
        modulus,
        out,
      ),
    ).toBe(false);
  });
});

describe('an interpolant over a column of redshifts', () => {
  it('gives each value exactly as a call at that redshift, for every node count', () => {
    const env = sampleEnv(view, undefined, ['z']);
    // Narrow to wide ranges: 8, 12 and 24 nodes (the unrolled one and the loop).
    for (const [lo, hi] of [
      [1.0, 1.01],
      [0.9, 1.1],
      [0.5, 1.5],
    ]) {
      const at = localModulus((z) => exactModulusAt(env, z), lo, hi)!;
      expect(at).not.toBeNull();
      const z = Float64Array.from({ length: 1001 }, (_, i) => lo + ((hi - lo) * i) / 1000);
      const out = new Float64Array(z.length);
      at.evaluateInto(z, out);
      z.forEach((zz, i) => {
        if (!Object.is(out[i], at(zz))) expect.fail(`[${lo}, ${hi}] at z=${zz}: ${out[i]} ≠ ${at(zz)}`);
      });
    }
  });
});
