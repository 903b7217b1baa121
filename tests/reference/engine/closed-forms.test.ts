/**
 * Closed-form distances and ages from Hogg (1999), "Distance measures in
 * cosmology", arXiv:astro-ph/9905116, and the Planck 2018 age.
 */
import { describe, expect, it } from 'vitest';
import { calculate } from '../../../shared/engine/calculate.ts';
import { calcValue, rel } from './helpers.ts';

const c = 299_792.458; // km/s, exact (SI)
const H0 = 70;
const DH = c / H0; // Hubble distance, Mpc
const TH = 977.7922216807891 / H0; // Hubble time in Gyr for H0 in km/s/Mpc: (km per Mpc)/(s per Gyr) = 977.792...
const ZS = [0.01, 0.1, 0.5, 1, 2, 5, 10, 20];

describe('Hogg (1999) closed forms', () => {
  it('Einstein–de Sitter (Ωm = 1): D_C = 2 D_H (1 − 1/√(1+z))', () => {
    for (const z of ZS) {
      const expected = 2 * DH * (1 - 1 / Math.sqrt(1 + z)); // Hogg (1999), Einstein–de Sitter
      expect(rel(calcValue({ quantity: 'comoving_distance', inputs: { z }, model: { H0, Om0: 1 } }), expected)).toBeLessThan(
        1e-9,
      );
    }
  });

  it('Einstein–de Sitter age: t0 = 2/(3 H0)', () => {
    const expected = (2 / 3) * TH; // Hogg (1999), age of an Ωm = 1 universe
    expect(rel(calcValue({ quantity: 'age_now', model: { H0, Om0: 1 } }), expected)).toBeLessThan(1e-9);
  });

  it('empty (Milne) universe (Ωm = ΩΛ = 0): D_L = D_H z (1 + z/2)', () => {
    for (const z of ZS) {
      const expected = DH * z * (1 + z / 2); // Hogg (1999), empty universe
      expect(
        rel(calcValue({ quantity: 'luminosity_distance', inputs: { z }, model: { H0, Om0: 0, Ode0: 0 } }), expected),
      ).toBeLessThan(1e-9);
    }
  });

  it('de Sitter (ΩΛ = 1): D_C = cz/H0, and no big bang so no age', () => {
    for (const z of ZS) {
      const expected = (c * z) / H0; // Hogg (1999), de Sitter
      expect(rel(calcValue({ quantity: 'comoving_distance', inputs: { z }, model: { H0, Om0: 0 } }), expected)).toBeLessThan(
        1e-9,
      );
    }
    const r = calculate({ quantity: 'age_now', model: { H0, Om0: 0 } });
    expect('error' in r && r.error.code).toBe('no_big_bang');
  });

  it('flat ΛCDM age: t0 = (2/(3 H0 √ΩΛ)) asinh(√(ΩΛ/Ωm))', () => {
    for (const Om0 of [0.1, 0.3, 0.7]) {
      const Ode0 = 1 - Om0;
      const expected = ((2 / 3) * TH * Math.asinh(Math.sqrt(Ode0 / Om0))) / Math.sqrt(Ode0); // closed form for flat ΛCDM without radiation
      expect(rel(calcValue({ quantity: 'age_now', model: { H0, Om0 } }), expected)).toBeLessThan(1e-9);
    }
  });
});

describe('Planck 2018 preset', () => {
  it('age today agrees with Planck 2018 VI Table 2: 13.787 ± 0.020 Gyr', () => {
    // Planck Collaboration (2020), A&A 641, A6, Table 2, TT,TE,EE+lowE+lensing+BAO: age = 13.787 ± 0.020 Gyr
    const age = calcValue({ quantity: 'age_now', model: { preset: 'planck18' } });
    expect(Math.abs(age - 13.787)).toBeLessThanOrEqual(0.02);
  });
});
