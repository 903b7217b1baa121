import { describe, expect, it } from 'vitest';
import { LOCAL_MODULUS_TOLERANCE, localDistance, localModulus } from '../../../shared/engine/quantities/local-modulus.ts';
import { sampleAge, sampleComoving, sampleLookback, sampleLuminosity } from '../../../shared/engine/quantities/sample-cosmic.ts';
import { exactModulusAt } from '../../../shared/engine/quantities/sample-photometry.ts';
import { sampleEnv } from '../../../shared/engine/quantities/sample-env.ts';
import { resolveModel } from '../../../shared/engine/model-resolve.ts';

const envFor = (model: object) => sampleEnv(resolveModel(model as never).view, undefined, ['z', 'm']);

describe('the distance modulus interpolated over a run’s redshift draws', () => {
  it('agrees with the exact modulus everywhere on the range, in open, closed, flat and Hubble-law models', () => {
    for (const model of [
      { preset: 'planck18' },
      { preset: 'wmap9' },
      { H0: 68, Om0: 0.3, Ode0: 0.6 },
      { H0: 72, Om0: 0.45, Ode0: 0.75 },
      { law: 'hubble', H0: 70 },
    ]) {
      const env = envFor(model);
      for (const [z, sigma] of [
        [0.02, 0.0002],
        [0.3, 0.003],
        [2.1, 0.02],
        [6, 0.06],
      ]) {
        const lo = z - 4 * sigma;
        const hi = z + 4 * sigma;
        const at = localModulus((x) => exactModulusAt(env, x), lo, hi);
        expect(at, `${JSON.stringify(model)} z=${z}`).not.toBeNull();
        for (let i = 0; i <= 500; i++) {
          const x = lo + ((hi - lo) * i) / 500;
          expect(Math.abs(at!(x) - exactModulusAt(env, x))).toBeLessThanOrEqual(LOCAL_MODULUS_TOLERANCE);
        }
      }
    }
  });

  it('declines where it cannot be trusted: draws reaching z ≤ 0, or a range too wide to converge', () => {
    const env = envFor({ preset: 'planck18' });
    expect(localModulus((x) => exactModulusAt(env, x), -0.001, 0.02)).toBeNull();
    expect(localModulus((x) => exactModulusAt(env, x), 0.001, 5)).toBeNull();
    expect(localModulus((x) => exactModulusAt(env, x), 0.5, 0.5)).toBeNull();
  });
});

describe('a distance or time interpolated over a run’s redshift draws, at the nominal H0', () => {
  const samplers = {
    comoving: sampleComoving,
    luminosity: sampleLuminosity,
    lookback: sampleLookback,
    age: (env: ReturnType<typeof envFor>, z: number) => sampleAge(env, z, false),
  };

  it('agrees with the exact value to 1e-10 of it everywhere on the range, in open, closed and flat models', () => {
    for (const model of [
      { preset: 'planck18' },
      { preset: 'wmap9' },
      { H0: 68, Om0: 0.3, Ode0: 0.6 },
      { H0: 72, Om0: 0.45, Ode0: 0.75 },
    ]) {
      const env = envFor(model);
      for (const [name, sample] of Object.entries(samplers)) {
        for (const [z, sigma] of [
          [0.02, 0.0003],
          [0.3, 0.003],
          [2.1, 0.02],
          [6, 0.06],
        ]) {
          const lo = z - 4 * sigma;
          const hi = z + 4 * sigma;
          const at = localDistance((x) => sample(env, x), lo, hi);
          expect(at, `${name} ${JSON.stringify(model)} z=${z}`).not.toBeNull();
          for (let i = 0; i <= 500; i++) {
            const x = lo + ((hi - lo) * i) / 500;
            const exact = sample(env, x);
            expect(Math.abs(at!(x) - exact), `${name} at z=${x}`).toBeLessThanOrEqual(LOCAL_MODULUS_TOLERANCE * exact);
          }
        }
      }
    }
  });

  it('declines where it cannot be trusted: draws reaching z ≤ 0, or a range too wide to converge', () => {
    const env = envFor({ preset: 'planck18' });
    expect(localDistance((x) => sampleComoving(env, x), -0.001, 0.02)).toBeNull();
    expect(localDistance((x) => sampleComoving(env, x), 0.001, 5)).toBeNull();
  });
});
