/** IAU and SI constants, the Sun's magnitudes, and two examples worked by hand. */
import { describe, expect, it } from 'vitest';
import * as K from '../../../shared/engine/constants.ts';
import { SOLAR_MAGNITUDES } from '../../../shared/engine/solar-magnitudes.ts';
import { calcValue, rel } from './helpers.ts';

describe('constants against their defining resolutions', () => {
  it('speed of light: 299 792 458 m/s exactly (SI)', () => expect(K.SPEED_OF_LIGHT.value * 1000).toBe(299_792_458));
  it('astronomical unit: 149 597 870 700 m exactly (IAU 2012 Resolution B2)', () =>
    expect(K.ASTRONOMICAL_UNIT.value).toBe(149_597_870_700));
  it('parsec: 648000/π au ≈ 3.085 677 581 491 367e16 m (IAU 2015 Resolution B2)', () =>
    expect(rel(K.PARSEC.value, 3.085677581491367e16)).toBeLessThan(1e-15));
  it('light-year: c × 365.25 d = 9 460 730 472 580 800 m (IAU)', () => expect(K.LIGHT_YEAR.value).toBe(9_460_730_472_580_800));
  it('nominal solar values (IAU 2015 Resolution B3)', () => {
    expect(K.SOLAR_RADIUS.value).toBe(6.957e8);
    expect(K.SOLAR_IRRADIANCE.value).toBe(1361);
    expect(K.SOLAR_LUMINOSITY.value).toBe(3.828e26);
    expect(K.SOLAR_TEFF.value).toBe(5772);
    expect(K.SOLAR_MASS_PARAMETER.value).toBe(1.3271244e20);
  });
  it('the Sun’s absolute bolometric magnitude is 4.74 (IAU 2015 Resolution B2 zero point)', () => {
    const Mbol = -2.5 * Math.log10(K.SOLAR_LUMINOSITY.value / K.BOLOMETRIC_ZERO_POINT.value);
    expect(Mbol).toBeCloseTo(4.74, 2); // IAU 2015 B2: M_bol,☉ = 4.74
  });
});

describe('solar magnitudes (Willmer 2018, ApJS 236, 47, Table 3)', () => {
  it('V band: M☉ = 4.81 (Vega)', () => expect(SOLAR_MAGNITUDES.V.absolute).toBe(4.81)); // Willmer (2018) Table 3
  it('the Sun’s apparent magnitude follows from its absolute magnitude at 1 au', () => {
    // m = M + 5 log10(1 au / 10 pc); Willmer (2018) Table 3 lists both, each rounded to 0.01 mag.
    const auOver10pc = K.ASTRONOMICAL_UNIT.value / (10 * K.PARSEC.value);
    for (const b of Object.values(SOLAR_MAGNITUDES)) {
      const m = b.absolute + 5 * Math.log10(auOver10pc);
      expect(Math.abs(m - b.apparent), b.band).toBeLessThanOrEqual(0.011);
    }
    expect(SOLAR_MAGNITUDES.V.absolute + 5 * Math.log10(auOver10pc)).toBeCloseTo(-26.76, 2); // Willmer (2018): m☉,V = −26.76
  });
});

describe('examples worked by hand (common practice)', () => {
  it('Hubble law at low redshift: z = 0.01, H0 = 70 km/s/Mpc gives d = cz/H0 = 42.8275 Mpc', () => {
    // worked by hand: 299792.458 × 0.01 / 70 = 42.827494 Mpc (common practice for z ≪ 0.1)
    const d = calcValue({ quantity: 'luminosity_distance', inputs: { z: 0.01 }, model: { law: 'hubble', H0: 70 } });
    expect(d).toBeCloseTo(42.827494, 5);
  });

  it('absolute magnitude: m = 10 at a parallax of 10 mas with A = 0.5 gives M = 4.5 and L ≈ 1.33 L☉ in V', () => {
    // worked by hand: d = 1000/10 = 100 pc; μ = 5 log10(100/10) = 5; M = 10 − 5 − 0.5 = 4.5 (common practice)
    const M = calcValue({ quantity: 'absolute_magnitude', inputs: { m: 10, parallax_mas: 10, extinction: 0.5 } });
    expect(M).toBeCloseTo(4.5, 12);
    // worked by hand: L/L☉ = 10^(−0.4 (4.5 − 4.81)) = 10^0.124 = 1.3305
    const L = calcValue({ quantity: 'luminosity_ratio_sun', inputs: { m: 10, parallax_mas: 10, extinction: 0.5, band: 'V' } });
    expect(L).toBeCloseTo(1.3305, 4);
  });

  it('a 5-magnitude difference is a flux ratio of 100 (Pogson relation)', () => {
    expect(calcValue({ quantity: 'flux_ratio', inputs: { m1: 6, m2: 1 } })).toBeCloseTo(0.01, 14); // worked by hand
  });
});
