/**
 * Distances and times for Monte Carlo draws: the same arithmetic as cosmic.ts and hubble.ts, in
 * the same order (so every draw gives the same number), without working steps, warnings or
 * throws. A redshift outside the model's range gives NaN, as the working path's error would.
 */
import { JULIAN_YEAR, SPEED_OF_LIGHT } from '../constants.ts';
import { ageIntegral, comovingIntegral, lookbackIntegral, transverseFromLineOfSight } from '../cosmology/distances.ts';
import { interpolate } from '../cosmology/table.ts';
import { hubbleTimeGyr, KM_PER_MPC, SECONDS_PER_GYR } from '../units.ts';
import type { Cosmology } from '../cosmology/distances.ts';
import { drawnH0, type SampleEnv } from './sample-env.ts';

const C = SPEED_OF_LIGHT.value;

/** Where checkRedshift accepts z: above −1 and below the model's bounce. */
function inRange(c: Cosmology, z: number): boolean {
  return z > -1 && !(z >= c.model.zBounce);
}

/**
 * ∫0^z dz'/E as comovingIntegral gives it; the common case (inside the table) is written out here
 * so that it compiles into the draw loop instead of being a call.
 */
function comovingIntegralAt(c: Cosmology, z: number): number {
  const t = c.table;
  if (t !== null && z >= 0) {
    const u = Math.log1p(z);
    if (u <= t.uMax) return interpolate(t.comoving, t.comovingSlope, t.h, u);
  }
  return comovingIntegral(c, z);
}

/** Line-of-sight comoving distance in Mpc, D_H ∫dz/E (as comovingDistanceSteps). */
export function sampleComoving(env: SampleEnv, z: number): number {
  const c = env.model.cosmo as Cosmology;
  if (!inRange(c, z)) return NaN;
  const dH = C / drawnH0(env);
  return dH * comovingIntegralAt(c, z);
}

/** Transverse comoving distance in Mpc; NaN beyond a closed model's antipode (as transverseSteps). */
export function sampleTransverse(env: SampleEnv, z: number): number {
  const dC = sampleComoving(env, z);
  const dH = C / drawnH0(env);
  const Ok = (env.model.cosmo as Cosmology).model.Ok0;
  const value = dH * transverseFromLineOfSight(Ok, dC / dH);
  return Ok < 0 && z > 0 && !(value > 0) ? NaN : value;
}

/** Angular-diameter distance D_M/(1+z) in Mpc. */
export const sampleAngularDiameter = (env: SampleEnv, z: number): number => sampleTransverse(env, z) / (1 + z);

/** Luminosity distance (1+z) D_M in Mpc. */
export const sampleLuminosity = (env: SampleEnv, z: number): number => (1 + z) * sampleTransverse(env, z);

/** Hubble time 1/H0 in Gyr for this draw (as hubbleTimeStep). */
function drawnHubbleTime(env: SampleEnv): number {
  return KM_PER_MPC / drawnH0(env) / SECONDS_PER_GYR;
}

/** Lookback time in Gyr (as lookbackSteps). */
export function sampleLookback(env: SampleEnv, z: number): number {
  const c = env.model.cosmo as Cosmology;
  if (!inRange(c, z)) return NaN;
  return drawnHubbleTime(env) * lookbackIntegral(c, z);
}

/** Light-travel distance c t_L in Mpc (as lightTravelSteps). */
export function sampleLightTravel(env: SampleEnv, z: number): number {
  const tL = sampleLookback(env, z);
  return (C * tL * JULIAN_YEAR.value * 1e9) / KM_PER_MPC;
}

/** Age of the universe at z in Gyr, or today (as ageSteps). */
export function sampleAge(env: SampleEnv, z: number, today: boolean): number {
  const c = env.model.cosmo as Cosmology;
  if (!today && !inRange(c, z)) return NaN;
  return drawnHubbleTime(env) * ageIntegral(c, z);
}

/** H(z) = H0 E(z) in km/s/Mpc (as hubbleParameterSteps). */
export function sampleHubbleParameter(env: SampleEnv, z: number): number {
  const c = env.model.cosmo as Cosmology;
  if (!inRange(c, z)) return NaN;
  return drawnH0(env) * Math.sqrt(c.model.e2(z));
}

/** Any distance under the Hubble law, cz/H0 in Mpc. */
export function sampleLawDistance(env: SampleEnv, z: number): number {
  return z > -1 ? (C * z) / drawnH0(env) : NaN;
}

/** Light-travel time under the Hubble law, z/H0 in Gyr. */
export function sampleLawTime(env: SampleEnv, z: number): number {
  return z > -1 ? z * hubbleTimeGyr(drawnH0(env)) : NaN;
}

/** Redshift from a distance (z = H0 d/c) or a time (z = H0 t) under the Hubble law. */
export function sampleLawRedshift(env: SampleEnv, key: 'distance_mpc' | 'lookback_gyr', x: number): number {
  if (!(x > 0)) return NaN;
  const H0 = drawnH0(env);
  return key === 'distance_mpc' ? (H0 * x) / C : x / hubbleTimeGyr(H0);
}
