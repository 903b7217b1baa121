/**
 * Distances and times in an FLRW model, each recording its working step.
 * Step formulas follow Hogg (1999), arXiv:astro-ph/9905116.
 */
import { JULIAN_YEAR, PARSEC, SPEED_OF_LIGHT } from '../constants.ts';
import {
  ageIntegral,
  comovingIntegral,
  expansionRate,
  lookbackIntegral,
  transverseFromLineOfSight,
} from '../cosmology/distances.ts';
import { CalcError } from '../errors.ts';
import { fromConstant, fromStep, record } from '../working.ts';
import { type Ctx, currentH0, densityValue, h0Value, inputValue, requireCosmology } from './context.ts';

const METHOD =
  'Integral evaluated numerically: 8-point Gauss–Legendre quadrature on panels of 0.005 in ln(1+z), cubic Hermite interpolation between panels (exact derivatives), direct adaptive quadrature beyond z = 10⁴; relative accuracy better than 1e-9.';

/** E(z) recorded as a check point a reviewer can evaluate by hand. */
export function expansionRateStep(ctx: Ctx, z: number): number {
  const c = requireCosmology(ctx);
  const m = c.model;
  return record(ctx.steps, expansionRate(c, z), () => ({
    title: 'Expansion rate at the redshift, relative to today (first Friedmann equation)',
    formula: 'E(z) = √(Ω_r(z)(1+z)⁴ + Ω_m(1+z)³ + Ω_k(1+z)² + Ω_Λ)',
    inputs: [
      inputValue(ctx, 'z', z),
      densityValue(ctx, 'Om0', m.Om0),
      densityValue(ctx, 'Ode0', m.Ode0),
      densityValue(ctx, 'Ok0', m.Ok0),
      densityValue(ctx, 'Ogamma0', m.Ogamma0),
      densityValue(ctx, 'Onu0', m.Onu0),
    ],
    constants: [],
    result: { symbol: 'E(z)', name: 'dimensionless Hubble parameter', unit: '' },
    note: m.m_nu.some((x) => x > 0)
      ? 'Ω_r(z) = Ω_γ(1 + 0.2271 N_eff/N_ν Σ f(m_ν a/T_ν0)) with the Komatsu et al. (2011) fitting function f for the massive neutrinos; Ω_r(0) = Ω_γ + Ω_ν.'
      : 'Ω_r = Ω_γ + Ω_ν (photons and massless neutrinos).',
  }));
}

/** D_H = c/H0 in Mpc. */
export function hubbleDistanceStep(ctx: Ctx): number {
  return record(ctx.steps, SPEED_OF_LIGHT.value / currentH0(ctx), () => ({
    title: 'Hubble distance',
    formula: 'D_H = c / H0',
    inputs: [h0Value(ctx)],
    constants: [fromConstant(SPEED_OF_LIGHT)],
    result: { symbol: 'D_H', name: 'Hubble distance', unit: 'Mpc' },
  }));
}

/** t_H = 1/H0 in Gyr. */
export function hubbleTimeStep(ctx: Ctx): number {
  const kmPerMpc = (PARSEC.value * 1e6) / 1000;
  const value = kmPerMpc / currentH0(ctx) / (JULIAN_YEAR.value * 1e9);
  return record(ctx.steps, value, () => ({
    title: 'Hubble time',
    formula: 't_H = 1 / H0 = (km per Mpc) / (H0 × seconds per Gyr)',
    inputs: [h0Value(ctx)],
    constants: [fromConstant(PARSEC), fromConstant(JULIAN_YEAR)],
    result: { symbol: 't_H', name: 'Hubble time', unit: 'Gyr' },
  }));
}

/** Line-of-sight comoving distance in Mpc (Hogg 1999 eq. 15). */
export function comovingDistanceSteps(ctx: Ctx, z: number): number {
  const c = requireCosmology(ctx);
  expansionRateStep(ctx, z);
  const dH = hubbleDistanceStep(ctx);
  const integral = comovingIntegral(c, z);
  return record(ctx.steps, dH * integral, () => ({
    title: 'Line-of-sight comoving distance (Hogg 1999, eq. 15)',
    formula: 'D_C = D_H ∫₀^z dz′ / E(z′)',
    inputs: [inputValue(ctx, 'z', z), fromStep({ symbol: 'D_H', name: 'Hubble distance', value: dH, unit: 'Mpc' })],
    constants: [],
    result: { symbol: 'D_C', name: 'line-of-sight comoving distance', unit: 'Mpc' },
    note: `∫₀^z dz′/E(z′) = ${integral}. ${METHOD}`,
  }));
}

/** Transverse comoving distance in Mpc (Hogg 1999 eq. 16). */
export function transverseSteps(ctx: Ctx, z: number): number {
  const c = requireCosmology(ctx);
  const dC = comovingDistanceSteps(ctx, z);
  const dH = SPEED_OF_LIGHT.value / currentH0(ctx);
  const Ok = c.model.Ok0;
  const value = dH * transverseFromLineOfSight(Ok, dC / dH);
  if (Ok < 0 && z > 0 && !(value > 0)) {
    throw new CalcError(
      'out_of_range',
      `z = ${z} lies beyond the antipode of this closed model, where the transverse comoving distance is not positive`,
    );
  }
  const formula =
    Ok > 0
      ? 'D_M = (D_H/√Ω_k) sinh(√Ω_k D_C/D_H)'
      : Ok < 0
        ? 'D_M = (D_H/√|Ω_k|) sin(√|Ω_k| D_C/D_H)'
        : 'D_M = D_C (flat: Ω_k = 0)';
  return record(ctx.steps, value, () => ({
    title: 'Transverse comoving distance (Hogg 1999, eq. 16)',
    formula,
    inputs: [
      { symbol: 'D_C', name: 'line-of-sight comoving distance', value: dC, unit: 'Mpc', source: 'previous step' },
      { symbol: 'D_H', name: 'Hubble distance', value: dH, unit: 'Mpc', source: 'previous step' },
      densityValue(ctx, 'Ok0', Ok),
    ],
    constants: [],
    result: { symbol: 'D_M', name: 'transverse comoving distance', unit: 'Mpc' },
  }));
}

/** Angular-diameter distance D_A = D_M/(1+z) (Hogg 1999 eq. 18). */
export function angularDiameterSteps(ctx: Ctx, z: number): number {
  const dM = transverseSteps(ctx, z);
  return record(ctx.steps, dM / (1 + z), () => ({
    title: 'Angular-diameter distance (Hogg 1999, eq. 18)',
    formula: 'D_A = D_M / (1 + z)',
    inputs: [
      inputValue(ctx, 'z', z),
      { symbol: 'D_M', name: 'transverse comoving distance', value: dM, unit: 'Mpc', source: 'previous step' },
    ],
    constants: [],
    result: { symbol: 'D_A', name: 'angular-diameter distance', unit: 'Mpc' },
  }));
}

/** Luminosity distance D_L = (1+z) D_M (Hogg 1999 eq. 21). */
export function luminositySteps(ctx: Ctx, z: number): number {
  const dM = transverseSteps(ctx, z);
  return record(ctx.steps, (1 + z) * dM, () => ({
    title: 'Luminosity distance (Hogg 1999, eq. 21)',
    formula: 'D_L = (1 + z) D_M',
    inputs: [
      inputValue(ctx, 'z', z),
      { symbol: 'D_M', name: 'transverse comoving distance', value: dM, unit: 'Mpc', source: 'previous step' },
    ],
    constants: [],
    result: { symbol: 'D_L', name: 'luminosity distance', unit: 'Mpc' },
  }));
}

/** Lookback time in Gyr (Hogg 1999 eq. 30). */
export function lookbackSteps(ctx: Ctx, z: number): number {
  const c = requireCosmology(ctx);
  expansionRateStep(ctx, z);
  const tH = hubbleTimeStep(ctx);
  const integral = lookbackIntegral(c, z);
  return record(ctx.steps, tH * integral, () => ({
    title: 'Lookback time: how long ago the light set out (Hogg 1999, eq. 30)',
    formula: 't_L = t_H ∫₀^z dz′ / ((1+z′) E(z′))',
    inputs: [inputValue(ctx, 'z', z), { symbol: 't_H', name: 'Hubble time', value: tH, unit: 'Gyr', source: 'previous step' }],
    constants: [],
    result: { symbol: 't_L', name: 'lookback time', unit: 'Gyr' },
    note: `∫₀^z dz′/((1+z′)E(z′)) = ${integral}. ${METHOD}`,
  }));
}

/** Light-travel distance c × t_L in Mpc. */
export function lightTravelSteps(ctx: Ctx, z: number): number {
  const tL = lookbackSteps(ctx, z);
  const kmPerMpc = (PARSEC.value * 1e6) / 1000;
  const value = (SPEED_OF_LIGHT.value * tL * JULIAN_YEAR.value * 1e9) / kmPerMpc;
  return record(ctx.steps, value, () => ({
    title: 'Light-travel distance: the lookback time multiplied by the speed of light',
    formula: 'D_lt = c t_L = c [km/s] × t_L [Gyr] × (seconds per Gyr) / (km per Mpc)',
    inputs: [{ symbol: 't_L', name: 'lookback time', value: tL, unit: 'Gyr', source: 'previous step' }],
    constants: [fromConstant(SPEED_OF_LIGHT), fromConstant(JULIAN_YEAR), fromConstant(PARSEC)],
    result: { symbol: 'D_lt', name: 'light-travel distance', unit: 'Mpc' },
  }));
}

/** Age of the universe at redshift z in Gyr (or today for z = 0). */
export function ageSteps(ctx: Ctx, z: number, today: boolean): number {
  const c = requireCosmology(ctx);
  if (!today) expansionRateStep(ctx, z);
  const tH = hubbleTimeStep(ctx);
  const integral = ageIntegral(c, z);
  return record(ctx.steps, tH * integral, () => ({
    title: today ? 'Age of the universe today' : 'Age of the universe when the light set out',
    formula: today ? 't₀ = t_H ∫₀^∞ dz′ / ((1+z′) E(z′))' : 't(z) = t_H ∫_z^∞ dz′ / ((1+z′) E(z′))',
    inputs: [
      ...(today ? [] : [inputValue(ctx, 'z', z)]),
      { symbol: 't_H', name: 'Hubble time', value: tH, unit: 'Gyr', source: 'previous step' },
    ],
    constants: [],
    result: {
      symbol: today ? 't₀' : 't(z)',
      name: today ? 'age of the universe today' : 'age of the universe at z',
      unit: 'Gyr',
    },
    note: `Integral = ${integral}. Evaluated with the substitution a = s² (a = 1/(1+z)), which keeps the integrand smooth down to the big bang; adaptive Gauss–Legendre quadrature.`,
  }));
}

/** H(z) = H0 E(z) in km/s/Mpc. */
export function hubbleParameterSteps(ctx: Ctx, z: number): number {
  const e = expansionRateStep(ctx, z);
  return record(ctx.steps, currentH0(ctx) * e, () => ({
    title: 'Hubble parameter at the redshift',
    formula: 'H(z) = H0 E(z)',
    inputs: [
      h0Value(ctx),
      { symbol: 'E(z)', name: 'dimensionless Hubble parameter', value: e, unit: '', source: 'previous step' },
    ],
    constants: [],
    result: { symbol: 'H(z)', name: 'Hubble parameter', unit: 'km/s/Mpc' },
  }));
}
