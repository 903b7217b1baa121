/**
 * Magnitude quantities for Monte Carlo draws: the arithmetic of photometry.ts in the same order,
 * without working steps or throws; a draw where the working path would refuse (a distance or
 * parallax not above zero, a negative extinction) gives NaN.
 */
import {
  absoluteMagnitude,
  distanceModulus,
  fluxRatioFromDistances,
  fluxRatioFromMagnitudes,
  kCorrection,
  luminosityRatioSun,
} from '../magnitudes.ts';
import { sampleLawDistance, sampleLuminosity } from './sample-cosmic.ts';
import {
  ALPHA,
  DELTA_MAG,
  DISTANCE,
  DISTANCE_1,
  DISTANCE_2,
  EXTINCTION,
  has,
  M,
  M1,
  M2,
  PARALLAX,
  Z,
  type SampleEnv,
} from './sample-env.ts';

/** Distance in pc from a parallax in mas; NaN unless the parallax is positive. */
export const sampleParallax = (p: number): number => (p > 0 ? 1000 / p : NaN);

/** Luminosity distance in Mpc from whichever of z, distance_mpc or parallax_mas the request gave. */
function sampleLuminosityDistance(env: SampleEnv, x: Float64Array): number {
  if (has(env, Z)) return env.model.cosmo === null ? sampleLawDistance(env, x[Z]) : sampleLuminosity(env, x[Z]);
  if (has(env, DISTANCE)) return x[DISTANCE] > 0 ? x[DISTANCE] : NaN;
  return sampleParallax(x[PARALLAX]) / 1e6;
}

/** μ(z) = 5 log10(d_L(z) / 10 pc) in the draw's model, computed in full. */
export function exactModulusAt(env: SampleEnv, z: number): number {
  const dL = env.model.cosmo === null ? sampleLawDistance(env, z) : sampleLuminosity(env, z);
  return dL > 0 ? distanceModulus(dL) : NaN;
}

/**
 * μ = 5 log10(d_L / 10 pc). From z through the run's interpolant when there is one: it is built at
 * the nominal H0, and d_L scales as 1/H0 in every model (D_H = c/H0 multiplies every distance, and
 * the curvature term reads D_C/D_H), so a drawn H0 moves μ by −5 log10(H0/H0 nominal); with H0
 * not varied the scale is 1 and the term is exactly 0.
 */
export function sampleDistanceModulus(env: SampleEnv, x: Float64Array): number {
  if (has(env, Z)) return env.modulusAt !== null ? env.modulusAt(x[Z]) - 5 * Math.log10(env.h0Scale) : exactModulusAt(env, x[Z]);
  const dL = sampleLuminosityDistance(env, x);
  return dL > 0 ? distanceModulus(dL) : NaN;
}

/** M = m − μ − A − K (A and K are 0 when extinction and spectral index are not given). */
export function sampleAbsoluteMagnitude(env: SampleEnv, x: Float64Array): number {
  const A = has(env, EXTINCTION) ? x[EXTINCTION] : 0;
  if (!(A >= 0) || (has(env, ALPHA) && !has(env, Z))) return NaN;
  const mu = sampleDistanceModulus(env, x);
  const K = has(env, ALPHA) ? kCorrection(x[ALPHA], x[Z]) : 0;
  return absoluteMagnitude(x[M], mu, A, K);
}

/** L/L☉ in the request's band. */
export function sampleLuminosityRatio(env: SampleEnv, x: Float64Array): number {
  return luminosityRatioSun(sampleAbsoluteMagnitude(env, x), env.Msun);
}

/** The magnitude difference m₁ − m₂ (given, or from the two magnitudes). */
export function sampleMagnitudeDifference(env: SampleEnv, x: Float64Array): number {
  return has(env, DELTA_MAG) ? x[DELTA_MAG] : x[M1] - x[M2];
}

/** Flux ratio from magnitudes or from two distances. */
export function sampleFluxRatio(env: SampleEnv, x: Float64Array): number {
  if (has(env, DISTANCE_1)) {
    const d1 = x[DISTANCE_1];
    const d2 = x[DISTANCE_2];
    return d1 > 0 && d2 > 0 ? fluxRatioFromDistances(d1, d2) : NaN;
  }
  return fluxRatioFromMagnitudes(sampleMagnitudeDifference(env, x));
}
