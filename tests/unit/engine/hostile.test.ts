/** Bad input: each case returns a clear error that names the input, never a throw. */
import { describe, expect, it } from 'vitest';
import { answerLine } from '../../../shared/contract/calculate.ts';
import { calculate } from '../../../shared/engine/calculate.ts';

function errorOf(request: unknown): { code: string; message: string } {
  const r = calculate(request);
  if (!('error' in r)) throw new Error(`expected an error, got ${JSON.stringify(r).slice(0, 200)}`);
  return r.error;
}

describe('hostile requests', () => {
  it('z ≤ −1', () => {
    const e = errorOf({ quantity: 'luminosity_distance', inputs: { z: -1.5 } });
    expect(e.code).toBe('out_of_range');
    expect(e.message).toBe('z must be greater than −1 (got -1.5)');
    expect(errorOf({ quantity: 'comoving_distance', inputs: { z: -1 } }).message).toContain('z must be greater than −1');
    expect(errorOf({ quantity: 'lookback_time', inputs: { z: -3 }, model: { law: 'hubble', H0: 70 } }).message).toContain(
      'z must be',
    );
  });

  it('NaN and Infinity, as numbers or as strings from JSON', () => {
    for (const bad of [NaN, Infinity, -Infinity, 'NaN', 'Infinity', '1e999', null, '0.5']) {
      const e = errorOf({ quantity: 'luminosity_distance', inputs: { z: bad } });
      expect(e.code).toBe('invalid_input');
      expect(e.message).toMatch(/^z must be a finite number/);
    }
    const line = answerLine('{"quantity":"luminosity_distance","inputs":{"z":1e999}}');
    expect('error' in line && line.error.message).toMatch(/^z must be a finite number/);
    expect(errorOf({ quantity: 'age_now', model: { H0: 'NaN', Om0: 0.3 } }).message).toMatch(
      /^model\.H0 must be a finite number/,
    );
    expect(errorOf({ quantity: 'luminosity_distance', inputs: { z: { value: 1, sigma: NaN } } }).message).toMatch(/^z must be/);
  });

  it('negative densities and masses', () => {
    expect(errorOf({ quantity: 'age_now', model: { H0: 70, Om0: -0.3 } })).toEqual({
      code: 'negative_density',
      message: 'model.Om0 must not be negative (got -0.3)',
    });
    expect(errorOf({ quantity: 'age_now', model: { H0: 70, Om0: 0.3, Ode0: -0.7 } }).message).toContain('model.Ode0');
    expect(errorOf({ quantity: 'age_now', model: { H0: 70, Om0: 1.5 } }).message).toContain(
      'model.Om0 is too large for a flat model',
    );
    expect(errorOf({ quantity: 'age_now', model: { H0: 70, Om0: 0.3, Tcmb0: 2.7, m_nu: [0, 0, -1] } }).message).toContain(
      'model.m_nu[2]',
    );
    expect(errorOf({ quantity: 'age_now', model: { H0: -70, Om0: 0.3 } }).message).toContain('model.H0 must be greater than 0');
    expect(errorOf({ quantity: 'age_now', model: { H0: 70, Om0: 0.3, Tcmb0: 2.7, m_nu: [0.1] } }).message).toContain(
      'floor(Neff) = 3',
    );
  });

  it('a model with no big bang (it bounces: Ωm = 0.3, ΩΛ = 3)', () => {
    const model = { H0: 70, Om0: 0.3, Ode0: 3 };
    const age = errorOf({ quantity: 'age_now', model });
    expect(age.code).toBe('no_big_bang');
    expect(age.message).toContain('no big bang');
    const far = errorOf({ quantity: 'luminosity_distance', inputs: { z: 2 }, model });
    expect(far.code).toBe('no_big_bang');
    expect(far.message).toMatch(/^z must be below/);
    // Below the bounce, distances are still defined.
    expect('value' in calculate({ quantity: 'comoving_distance', inputs: { z: 0.1 }, model })).toBe(true);
    expect(errorOf({ quantity: 'z_from_lookback_time', inputs: { lookback_gyr: 50 }, model }).code).toBe('no_solution');
  });

  it('parallax ≤ 0', () => {
    expect(errorOf({ quantity: 'parallax_distance', inputs: { parallax_mas: 0 } })).toEqual({
      code: 'out_of_range',
      message: 'parallax_mas must be greater than 0 (got 0)',
    });
    expect(errorOf({ quantity: 'absolute_magnitude', inputs: { m: 5, parallax_mas: -2 } }).message).toContain('parallax_mas');
  });

  it('a band with no solar magnitude', () => {
    const e = errorOf({ quantity: 'luminosity_ratio_sun', inputs: { m: 10, parallax_mas: 10, band: 'Gaia_G' } });
    expect(e.code).toBe('unknown_band');
    expect(e.message).toContain('band "Gaia_G"');
    expect(errorOf({ quantity: 'luminosity_ratio_sun', inputs: { m: 10, parallax_mas: 10, band: '__proto__' } }).code).toBe(
      'unknown_band',
    );
    expect(errorOf({ quantity: 'luminosity_ratio_sun', inputs: { m: 10, parallax_mas: 10 } }).message).toContain(
      'band is required',
    );
  });

  it('unknown quantity, unknown fields, missing and conflicting inputs', () => {
    expect(errorOf({ quantity: 'brightness' })).toMatchObject({ code: 'unknown_quantity' });
    expect(errorOf({ quantity: 'brightness' }).message).toContain('"brightness"');
    expect(errorOf({}).code).toBe('missing_input');
    expect(errorOf([1, 2]).code).toBe('invalid_request');
    expect(errorOf(null).code).toBe('invalid_request');
    expect(errorOf({ quantity: 'luminosity_distance', inputs: { zz: 1 } }).message).toContain('"zz"');
    expect(errorOf({ quantity: 'luminosity_distance', inputs: {} }).message).toBe('z is required for luminosity_distance');
    expect(errorOf({ quantity: 'luminosity_distance', inputs: { z: 1, m: 3 } }).code).toBe('unused_input');
    expect(errorOf({ quantity: 'absolute_magnitude', inputs: { m: 3, z: 0.1, parallax_mas: 3 } }).code).toBe(
      'conflicting_inputs',
    );
    expect(errorOf({ quantity: 'flux_ratio', inputs: { m1: 3 } }).message).toContain('m2 is required');
    expect(errorOf({ quantity: 'absolute_magnitude', inputs: { m: 3, parallax_mas: 3, alpha: 0.5 } }).message).toContain('alpha');
    expect(errorOf({ quantity: 'age_now', model: { preset: 'planck13' } }).message).toContain('model.preset');
    expect(errorOf({ quantity: 'age_now', model: { law: 'hubble', H0: 70 } }).code).toBe('not_in_hubble_law');
  });

  it('impossible inverses', () => {
    const e = errorOf({ quantity: 'z_from_lookback_time', inputs: { lookback_gyr: 14 } });
    expect(e.code).toBe('no_solution');
    expect(e.message).toContain('lookback_gyr must be less than the age of the universe');
    expect(errorOf({ quantity: 'z_from_luminosity_distance', inputs: { distance_mpc: -5 } }).message).toContain('distance_mpc');
  });

  it('a luminosity distance reached at two redshifts in a closed model is refused, naming both', () => {
    // Ωm = 1, ΩΛ = 2.5 (Ωk = −2.5): D_L rises to about 4500 Mpc near z = 0.7 and falls again before the antipode.
    const model = { H0: 70, Om0: 1, Ode0: 2.5 };
    const e = errorOf({ quantity: 'z_from_luminosity_distance', inputs: { distance_mpc: 3000 }, model });
    expect(e.code).toBe('several_solutions');
    const zs = [...e.message.matchAll(/(\d+\.\d{6})/g)].map((m) => Number(m[1]));
    expect(zs).toHaveLength(2);
    // Each named redshift gives the distance back through the forward calculation.
    for (const z of zs) {
      const back = calculate({ quantity: 'luminosity_distance', inputs: { z }, model });
      expect('value' in back && back.value).toBeCloseTo(3000, 0);
    }
    // A flat model has one solution, found as before.
    expect('value' in calculate({ quantity: 'z_from_luminosity_distance', inputs: { distance_mpc: 3000 } })).toBe(true);
  });

  it('a lookback time within a hair of the age is refused as ill-conditioned; a sensitive one warns', () => {
    // Planck 2018 (astropy's Planck18): age 13.787 Gyr. 13.7868 Gyr sits 0.1 Myr short of it.
    const e = errorOf({ quantity: 'z_from_lookback_time', inputs: { lookback_gyr: 13.7868 } });
    expect(e.code).toBe('ill_conditioned');
    expect(e.message).toMatch(/condition number .*0\.1 % change of lookback_gyr would move z by over 100 %/);
    const warned = calculate({ quantity: 'z_from_lookback_time', inputs: { lookback_gyr: 13 } });
    if (!('value' in warned)) throw new Error('expected a value');
    // dz/dt = (1+z)E(z)/t_H: at z ≈ 6.8 a 1 % change of the time moves z by about 13 %.
    expect(warned.warnings.join(' ')).toMatch(/a 1 % change of lookback_gyr moves z by about 1[23] %/);
    const calm = calculate({ quantity: 'z_from_lookback_time', inputs: { lookback_gyr: 5 } });
    expect('value' in calm && calm.warnings).toEqual([]);
  });

  it('overflowing results become errors, not Infinity', () => {
    expect(errorOf({ quantity: 'flux_ratio', inputs: { delta_mag: -1e6 } }).code).toBe('non_finite_result');
    expect(errorOf({ quantity: 'luminosity_distance', inputs: { z: 1 }, model: { H0: 1e-320, Om0: 0.3 } }).code).toBe(
      'non_finite_result',
    );
  });

  it('an uncertainty reaching outside the domain names the input', () => {
    // Planck 2018 age 13.787 Gyr: 13 ± 1.5 Gyr puts about 30 % of the draws beyond it.
    const e = errorOf({ quantity: 'z_from_lookback_time', inputs: { lookback_gyr: { value: 13, sigma: 1.5 } } });
    expect(e.code).toBe('interval_outside_domain');
    expect(e.message).toContain('lookback_gyr');
  });

  it('a parallax with a fractional error above 0.2 is refused as a distance, with the reason and its source', () => {
    // Rule: Bailer-Jones 2015, PASP 127, 994 (1/ϖ is a poor distance estimator beyond f ≈ 0.2).
    const e = errorOf({ quantity: 'parallax_distance', inputs: { parallax_mas: { value: 1.0, sigma: 0.4 } } });
    expect(e.code).toBe('poor_parallax');
    expect(e.message).toMatch(/fractional error of 0\.40, above 0\.2.*Bailer-Jones 2015, PASP 127, 994/);
    expect(
      errorOf({ quantity: 'absolute_magnitude', inputs: { m: 5, parallax_mas: { value: 2, minus: 0.1, plus: 0.5 } } }).code,
    ).toBe('poor_parallax');
    // f = 0.2 exactly is accepted (the rule refuses above it); a parallax without an uncertainty cannot be judged.
    expect('value' in calculate({ quantity: 'parallax_distance', inputs: { parallax_mas: { value: 1, sigma: 0.2 } } })).toBe(
      true,
    );
    expect('value' in calculate({ quantity: 'parallax_distance', inputs: { parallax_mas: 1 } })).toBe(true);
  });

  it('extinction near zero is drawn truncated at zero, not failed', () => {
    const r = calculate({
      quantity: 'absolute_magnitude',
      inputs: { m: 10, parallax_mas: { value: 5, sigma: 0.5 }, extinction: { value: 0.05, sigma: 0.05 } },
    });
    if (!('value' in r)) throw new Error(r.error.message);
    expect(r.interval?.failed_draws).toBeUndefined();
    expect(r.working.at(-1)!.note).toMatch(/physical bound A ≥ 0: the two-piece normal is truncated there/);
    // Extinction 0 ± 0.05 draws a half-normal: A ≥ 0 in every draw, so M = m − μ − A never exceeds m − μ.
    const half = calculate({
      quantity: 'absolute_magnitude',
      inputs: { m: 10, distance_mpc: 1e-5, extinction: { value: 0, sigma: 0.05 } },
    });
    if (!('value' in half)) throw new Error(half.error.message);
    expect(half.interval!.high).toBeLessThanOrEqual(half.value + 1e-12);
    // Half-normal 16th and 84th percentiles: σ × Φ⁻¹(0.58) = 0.0101 and σ × Φ⁻¹(0.92) = 0.0703 (standard normal table).
    expect(half.value - half.interval!.low).toBeCloseTo(0.0703, 2);
    expect(half.value - half.interval!.high).toBeCloseTo(0.0101, 2);
  });

  it('failed draws below 1 % are reported in the result, a warning and the working, never dropped silently', () => {
    // 13.0 ± 0.3 Gyr: draws beyond the age (13.787 Gyr, 2.6σ) have no redshift.
    const r = calculate({ quantity: 'z_from_lookback_time', inputs: { lookback_gyr: { value: 13, sigma: 0.3 } } });
    if (!('value' in r)) throw new Error(r.error.message);
    const failed = r.interval!.failed_draws!;
    expect(failed).toBeGreaterThan(0);
    expect(failed).toBeLessThanOrEqual(40);
    expect(r.warnings.join(' ')).toContain(`${failed} of 4000 uncertainty draws fell where z_from_lookback_time is not defined`);
    expect(r.working.at(-1)!.note).toContain(`${failed} of 4000 draws fell where the result is not defined (${failed} from t_L)`);
  });

  it('malformed JSON lines give an error result', () => {
    expect(answerLine('{"quantity":')).toMatchObject({ error: { code: 'invalid_json' } });
  });

  it('echoes the id, even on errors', () => {
    expect(calculate({ id: 'x1', quantity: 'nope' })).toMatchObject({ id: 'x1', error: { code: 'unknown_quantity' } });
    expect(calculate({ id: 7, quantity: 'age_now' })).toMatchObject({ id: 7, unit: 'Gyr' });
  });
});
