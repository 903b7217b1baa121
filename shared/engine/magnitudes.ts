/**
 * Magnitude relations: distance modulus, K-correction, absolute magnitude,
 * luminosity relative to the Sun, flux ratios and parallax distance.
 * Plain functions of numbers; the quantity layer adds the working.
 */
import { CalcError } from './errors.ts';

/**
 * Distance modulus μ = 5 log10(d_L / 10 pc), written for d_L in Mpc.
 * @param dLMpc luminosity distance in Mpc (> 0)
 * @returns μ in mag
 */
export function distanceModulus(dLMpc: number): number {
  return 5 * Math.log10(dLMpc) + 25;
}

/**
 * K-correction for a power-law spectrum f_ν ∝ ν^α: K = −2.5 (1 + α) log10(1 + z).
 * @param alpha spectral index α
 * @param z redshift
 * @returns K in mag
 */
export function kCorrection(alpha: number, z: number): number {
  return -2.5 * (1 + alpha) * Math.log10(1 + z);
}

/**
 * Absolute magnitude from m = M + μ + A + K.
 * @param m apparent magnitude
 * @param mu distance modulus
 * @param extinction extinction A along the line of sight, mag
 * @param k K-correction, mag
 * @returns M in mag
 */
export function absoluteMagnitude(m: number, mu: number, extinction: number, k: number): number {
  return m - mu - extinction - k;
}

/**
 * Luminosity relative to the Sun in the same band: L/L☉ = 10^(−0.4 (M − M☉)).
 * @param M absolute magnitude of the object
 * @param Msun absolute magnitude of the Sun in that band
 * @returns L / L☉
 */
export function luminosityRatioSun(M: number, Msun: number): number {
  return 10 ** (-0.4 * (M - Msun));
}

/**
 * Flux ratio from a magnitude difference (Pogson's relation): F₁/F₂ = 10^(−0.4 (m₁ − m₂)).
 * @param deltaMag m₁ − m₂
 * @returns F₁ / F₂
 */
export function fluxRatioFromMagnitudes(deltaMag: number): number {
  return 10 ** (-0.4 * deltaMag);
}

/**
 * Flux ratio of one source seen from two distances (inverse-square law): F₁/F₂ = (d₂/d₁)².
 * @param d1 first distance
 * @param d2 second distance, same unit
 * @returns F₁ / F₂
 */
export function fluxRatioFromDistances(d1: number, d2: number): number {
  return (d2 / d1) ** 2;
}

/**
 * Distance from a trigonometric parallax: d [pc] = 1000 / ϖ [mas].
 * @param parallaxMas parallax in milliarcseconds (> 0)
 * @returns distance in pc
 * @throws CalcError when the parallax is not positive
 */
export function parallaxDistancePc(parallaxMas: number): number {
  if (!(parallaxMas > 0)) throw new CalcError('out_of_range', `parallax_mas must be greater than 0 (got ${parallaxMas})`);
  return 1000 / parallaxMas;
}
