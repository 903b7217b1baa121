/**
 * Magnitude quantities with their working: distance modulus, absolute
 * magnitude, luminosity relative to the Sun, parallax distance and flux ratio.
 */
import { CalcError } from '../errors.ts';
import {
  absoluteMagnitude,
  distanceModulus,
  fluxRatioFromDistances,
  fluxRatioFromMagnitudes,
  kCorrection,
  luminosityRatioSun,
  parallaxDistancePc,
} from '../magnitudes.ts';
import { SOLAR_BANDS, SOLAR_MAGNITUDES } from '../solar-magnitudes.ts';
import { record } from '../working.ts';
import { type Ctx, inputValue } from './context.ts';
import { luminositySteps } from './cosmic.ts';
import { hubbleLawDistanceSteps } from './hubble.ts';

/** Input values by name, as sampled. */
export type Values = Record<string, number | undefined>;

/** Distance from a parallax, d = 1000/ϖ pc. */
export function parallaxSteps(ctx: Ctx, p: number): number {
  return record(ctx.steps, parallaxDistancePc(p), () => ({
    title: 'Distance from the parallax',
    formula: 'd [pc] = 1000 / ϖ [mas]',
    inputs: [inputValue(ctx, 'parallax_mas', p)],
    constants: [],
    result: { symbol: 'd', name: 'parallax distance', unit: 'pc' },
    note: 'The parsec is defined so that a star with a parallax of one arcsecond is one parsec away (IAU 2015 Resolution B2).',
  }));
}

/** The luminosity distance in Mpc from whichever of z, distance_mpc or parallax_mas was given. */
function luminosityDistance(ctx: Ctx, v: Values): number {
  if (v.z !== undefined) {
    return ctx.model.kind === 'hubble_law' ? hubbleLawDistanceSteps(ctx, v.z, 'luminosity distance') : luminositySteps(ctx, v.z);
  }
  if (v.distance_mpc !== undefined) {
    if (!(v.distance_mpc > 0)) throw new CalcError('out_of_range', `distance_mpc must be greater than 0 (got ${v.distance_mpc})`);
    return v.distance_mpc;
  }
  return parallaxSteps(ctx, v.parallax_mas as number) / 1e6;
}

/** μ = 5 log10(d_L / 10 pc). */
export function distanceModulusSteps(ctx: Ctx, v: Values): number {
  const dL = luminosityDistance(ctx, v);
  if (!(dL > 0)) throw new CalcError('out_of_range', `z must be greater than 0 for a distance modulus (got ${v.z})`);
  return record(ctx.steps, distanceModulus(dL), () => ({
    title: 'Distance modulus from the luminosity distance',
    formula: 'μ = 5 log10(d_L / 10 pc) = 5 log10(d_L [Mpc]) + 25',
    inputs: [
      {
        symbol: 'd_L',
        name: 'luminosity distance',
        value: dL,
        unit: 'Mpc',
        source: v.distance_mpc !== undefined ? inputValue(ctx, 'distance_mpc', dL).source : 'previous step',
      },
    ],
    constants: [],
    result: { symbol: 'μ', name: 'distance modulus', unit: 'mag' },
  }));
}

/** K-correction for a power-law spectrum, recorded when α is given. */
function kCorrectionSteps(ctx: Ctx, v: Values): number {
  if (v.alpha === undefined) return 0;
  const z = v.z as number;
  return record(ctx.steps, kCorrection(v.alpha, z), () => ({
    title: 'K-correction for a power-law spectrum f_ν ∝ ν^α',
    formula: 'K = −2.5 (1 + α) log10(1 + z)',
    inputs: [inputValue(ctx, 'alpha', v.alpha as number), inputValue(ctx, 'z', z)],
    constants: [],
    result: { symbol: 'K', name: 'K-correction', unit: 'mag' },
  }));
}

/** M = m − μ − A − K. */
export function absoluteMagnitudeSteps(ctx: Ctx, v: Values): number {
  const m = v.m as number;
  const A = v.extinction ?? 0;
  if (!(A >= 0)) throw new CalcError('out_of_range', `extinction must not be negative (got ${A})`);
  if (v.alpha !== undefined && v.z === undefined) {
    throw new CalcError('missing_input', 'alpha (K-correction) needs z: the K-correction depends on the redshift');
  }
  const mu = distanceModulusSteps(ctx, v);
  const K = kCorrectionSteps(ctx, v);
  return record(ctx.steps, absoluteMagnitude(m, mu, A, K), () => ({
    title: 'Absolute magnitude: apparent magnitude corrected for distance, extinction and redshift',
    formula: 'M = m − μ − A − K',
    inputs: [
      inputValue(ctx, 'm', m),
      { symbol: 'μ', name: 'distance modulus', value: mu, unit: 'mag', source: 'previous step' },
      v.extinction !== undefined
        ? inputValue(ctx, 'extinction', A)
        : { symbol: 'A', name: 'extinction', value: 0, unit: 'mag', source: 'not given; taken as 0' },
      {
        symbol: 'K',
        name: 'K-correction',
        value: K,
        unit: 'mag',
        source: v.alpha !== undefined ? 'previous step' : 'no spectral index given; taken as 0',
      },
    ],
    constants: [],
    result: { symbol: 'M', name: 'absolute magnitude', unit: 'mag' },
  }));
}

/**
 * The Sun's absolute magnitude in a band.
 * @param band band key
 * @returns the band entry
 * @throws CalcError for an unknown band
 */
export function solarBand(band: string | undefined) {
  if (band === undefined) throw new CalcError('missing_input', `band is required: one of ${SOLAR_BANDS.join(', ')}`);
  const entry = Object.hasOwn(SOLAR_MAGNITUDES, band) ? SOLAR_MAGNITUDES[band] : undefined;
  if (entry === undefined) {
    throw new CalcError(
      'unknown_band',
      `band "${band}" has no solar absolute magnitude here; use one of ${SOLAR_BANDS.join(', ')}`,
    );
  }
  return entry;
}

/** L/L☉ = 10^(−0.4 (M − M☉)) in the same band. */
export function luminosityRatioSteps(ctx: Ctx, v: Values): number {
  const sun = solarBand(ctx.band);
  const M = absoluteMagnitudeSteps(ctx, v);
  return record(ctx.steps, luminosityRatioSun(M, sun.absolute), () => ({
    title: `Luminosity compared with the Sun in the same band (${sun.label})`,
    formula: 'L / L☉ = 10^(−0.4 (M − M☉))',
    inputs: [{ symbol: 'M', name: 'absolute magnitude', value: M, unit: 'mag', source: 'previous step' }],
    constants: [
      {
        symbol: 'M☉',
        name: `absolute magnitude of the Sun, ${sun.label} (${sun.system})`,
        value: sun.absolute,
        unit: 'mag',
        source: sun.source,
      },
    ],
    result: { symbol: 'L/L☉', name: 'luminosity relative to the Sun', unit: '' },
  }));
}

/** Flux ratio from magnitudes (Pogson) or from two distances (inverse-square law). */
export function fluxRatioSteps(ctx: Ctx, v: Values): number {
  if (v.distance_1 !== undefined) {
    const d1 = v.distance_1;
    const d2 = v.distance_2 as number;
    if (!(d1 > 0)) throw new CalcError('out_of_range', `distance_1 must be greater than 0 (got ${d1})`);
    if (!(d2 > 0)) throw new CalcError('out_of_range', `distance_2 must be greater than 0 (got ${d2})`);
    return record(ctx.steps, fluxRatioFromDistances(d1, d2), () => ({
      title: 'Inverse-square law: the same source seen from two distances',
      formula: 'F₁ / F₂ = (d₂ / d₁)²',
      inputs: [inputValue(ctx, 'distance_1', d1), inputValue(ctx, 'distance_2', d2)],
      constants: [],
      result: { symbol: 'F₁/F₂', name: 'flux ratio', unit: '' },
    }));
  }
  const dm = v.delta_mag ?? (v.m1 as number) - (v.m2 as number);
  const inputs =
    v.delta_mag !== undefined
      ? [inputValue(ctx, 'delta_mag', dm)]
      : [inputValue(ctx, 'm1', v.m1 as number), inputValue(ctx, 'm2', v.m2 as number)];
  return record(ctx.steps, fluxRatioFromMagnitudes(dm), () => ({
    title: 'Flux ratio from a magnitude difference (Pogson relation)',
    formula: v.delta_mag !== undefined ? 'F₁ / F₂ = 10^(−0.4 Δm)' : 'F₁ / F₂ = 10^(−0.4 (m₁ − m₂))',
    inputs,
    constants: [],
    result: { symbol: 'F₁/F₂', name: 'flux ratio', unit: '' },
  }));
}
