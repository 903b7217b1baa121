/**
 * What each quantity needs and how it is computed: its unit, its inputs
 * (required, one group of alternatives, optional) and its calculation.
 */
import type { CalcQuantity } from '../../schemas/calc.ts';
import { CalcError } from '../errors.ts';
import { record } from '../working.ts';
import type { Ctx } from './context.ts';
import {
  ageSteps,
  angularDiameterSteps,
  comovingDistanceSteps,
  hubbleParameterSteps,
  lightTravelSteps,
  lookbackSteps,
  luminositySteps,
  transverseSteps,
} from './cosmic.ts';
import { hubbleLawDistanceSteps, hubbleLawRedshiftSteps, hubbleLawTimeSteps } from './hubble.ts';
import { zFromLookbackSteps, zFromLuminosityDistanceSteps } from './inverse.ts';
import {
  absoluteMagnitudeSteps,
  distanceModulusSteps,
  fluxRatioSteps,
  luminosityRatioSteps,
  parallaxSteps,
  type Values,
} from './photometry.ts';
import {
  sampleAge,
  sampleAngularDiameter,
  sampleComoving,
  sampleHubbleParameter,
  sampleLawDistance,
  sampleLawRedshift,
  sampleLawTime,
  sampleLightTravel,
  sampleLookback,
  sampleLuminosity,
  sampleTransverse,
} from './sample-cosmic.ts';
import { DISTANCE, LOOKBACK, PARALLAX, Z, viaCompute, type SampleEnv, type Sampler } from './sample-env.ts';
import {
  sampleAbsoluteMagnitude,
  sampleDistanceModulus,
  sampleFluxRatio,
  sampleLuminosityRatio,
  sampleMagnitudeDifference,
  sampleParallax,
} from './sample-photometry.ts';
import { fluxRatioFromMagnitudes, luminosityRatioSun } from '../magnitudes.ts';

/** Units of results. */
export type ResultUnit = 'Mpc' | 'Gyr' | 'mag' | 'km/s/Mpc' | 'pc' | '';

/** A quantity's definition. */
export interface QuantitySpec {
  unit: ResultUnit;
  required: string[];
  /** Exactly one of these groups of inputs must be given. */
  oneOf?: string[][];
  optional?: string[];
  band?: boolean;
  /** Not defined under the simple Hubble law. */
  flrwOnly?: boolean;
  /** Whether a cosmology model enters, given the inputs present. */
  usesModel: (present: Set<string>) => boolean;
  compute: (ctx: Ctx, v: Values) => number;
  /** The same calculation for one Monte Carlo draw: no working, NaN outside the domain. */
  sample: Sampler;
  /**
   * For quantities that end in a monotonic step (a power of ten of a magnitude): the draw up to
   * that step, and the step itself, so that only the percentile draws pay for it.
   */
  split?: SplitSample;
  /**
   * Set when the quantity is monotonic in z in every model it accepts (an integral of a positive
   * integrand, or cz/H0): when z is the only input varied, only the percentile draws are computed.
   */
  monotoneInZ?: 'increasing' | 'decreasing';
  /** Set when a draw computes the distance modulus μ(z): a run that varies z may interpolate it. */
  modulusInZ?: true;
  /**
   * Set when a draw is a function of z alone divided by H0's scale (every distance and time here:
   * each is the Hubble distance or time times an integral over z): a run that varies z and H0 may
   * interpolate the part in z.
   */
  inverseH0InZ?: true;
}

/** A draw split before a monotonic last step; `applies` says for which inputs it holds. */
export interface SplitSample {
  applies: (present: Set<string>) => boolean;
  before: Sampler;
  last: (env: SampleEnv, x: number) => number;
  decreasing: boolean;
}

const always = (): boolean => true;
const never = (): boolean => false;
const DISTANCE_SOURCES = [['z'], ['distance_mpc'], ['parallax_mas']];
const z = (v: Values): number => v.z as number;
const isLaw = (ctx: Ctx): boolean => ctx.model.kind === 'hubble_law';
const drawIsLaw = (env: SampleEnv): boolean => env.model.kind === 'hubble_law';

function distance(
  measure: string,
  flrw: (ctx: Ctx, z: number) => number,
  sample: (env: SampleEnv, z: number) => number,
  monotoneInZ?: 'increasing',
): QuantitySpec {
  return {
    monotoneInZ,
    inverseH0InZ: true,
    unit: 'Mpc',
    required: ['z'],
    usesModel: always,
    compute: (ctx, v) => (isLaw(ctx) ? hubbleLawDistanceSteps(ctx, z(v), measure) : flrw(ctx, z(v))),
    sample: (env, x) => (drawIsLaw(env) ? sampleLawDistance(env, x[Z]) : sample(env, x[Z])),
  };
}

function properDistanceSteps(ctx: Ctx, zz: number): number {
  const dC = comovingDistanceSteps(ctx, zz);
  return record(ctx.steps, dC, () => ({
    title: 'Proper distance today',
    formula: 'd_p(t₀) = D_C',
    inputs: [{ symbol: 'D_C', name: 'line-of-sight comoving distance', value: dC, unit: 'Mpc', source: 'previous step' }],
    constants: [],
    result: { symbol: 'd_p', name: 'proper distance today', unit: 'Mpc' },
    note: 'Comoving coordinates are scaled to match proper distances at the present epoch, so the proper distance today equals the line-of-sight comoving distance.',
  }));
}

// Root finding dominates these draws, so they reuse the working path with no sink.
const lookbackInverse = viaCompute((ctx, v) => zFromLookbackSteps(ctx, v.lookback_gyr as number));
const luminosityDistanceInverse = viaCompute((ctx, v) => zFromLuminosityDistanceSteps(ctx, v.distance_mpc as number));

const magnitudeInputs = { required: ['m'], oneOf: DISTANCE_SOURCES, optional: ['extinction', 'alpha'] };

/** Every quantity's definition. */
export const QUANTITY_SPECS: Record<CalcQuantity, QuantitySpec> = {
  comoving_distance: distance('comoving distance', comovingDistanceSteps, sampleComoving, 'increasing'),
  transverse_comoving_distance: distance('transverse comoving distance', transverseSteps, sampleTransverse),
  angular_diameter_distance: distance('angular-diameter distance', angularDiameterSteps, sampleAngularDiameter),
  luminosity_distance: distance('luminosity distance', luminositySteps, sampleLuminosity),
  light_travel_distance: distance('light-travel distance', lightTravelSteps, sampleLightTravel, 'increasing'),
  proper_distance: distance('proper distance', properDistanceSteps, sampleComoving, 'increasing'),
  lookback_time: {
    unit: 'Gyr',
    required: ['z'],
    usesModel: always,
    compute: (ctx, v) => (isLaw(ctx) ? hubbleLawTimeSteps(ctx, z(v)) : lookbackSteps(ctx, z(v))),
    sample: (env, x) => (drawIsLaw(env) ? sampleLawTime(env, x[Z]) : sampleLookback(env, x[Z])),
    monotoneInZ: 'increasing',
    inverseH0InZ: true,
  },
  age_at_z: {
    unit: 'Gyr',
    required: ['z'],
    flrwOnly: true,
    usesModel: always,
    compute: (ctx, v) => ageSteps(ctx, z(v), false),
    sample: (env, x) => sampleAge(env, x[Z], false),
    monotoneInZ: 'decreasing',
    inverseH0InZ: true,
  },
  age_now: {
    unit: 'Gyr',
    required: [],
    flrwOnly: true,
    usesModel: always,
    compute: (ctx) => ageSteps(ctx, 0, true),
    sample: (env) => sampleAge(env, 0, true),
  },
  hubble_parameter: {
    unit: 'km/s/Mpc',
    required: ['z'],
    flrwOnly: true,
    usesModel: always,
    compute: (ctx, v) => hubbleParameterSteps(ctx, z(v)),
    sample: (env, x) => sampleHubbleParameter(env, x[Z]),
  },
  distance_modulus: {
    unit: 'mag',
    required: [],
    oneOf: DISTANCE_SOURCES,
    usesModel: (p) => p.has('z'),
    compute: distanceModulusSteps,
    sample: sampleDistanceModulus,
    modulusInZ: true,
  },
  absolute_magnitude: {
    unit: 'mag',
    ...magnitudeInputs,
    usesModel: (p) => p.has('z'),
    compute: absoluteMagnitudeSteps,
    sample: sampleAbsoluteMagnitude,
    modulusInZ: true,
  },
  luminosity_ratio_sun: {
    unit: '',
    ...magnitudeInputs,
    band: true,
    usesModel: (p) => p.has('z'),
    compute: luminosityRatioSteps,
    sample: sampleLuminosityRatio,
    split: {
      applies: always,
      before: sampleAbsoluteMagnitude,
      last: (env, M) => luminosityRatioSun(M, env.Msun),
      decreasing: true,
    },
    modulusInZ: true,
  },
  z_from_lookback_time: {
    unit: '',
    required: ['lookback_gyr'],
    usesModel: always,
    compute: (ctx, v) =>
      isLaw(ctx)
        ? hubbleLawRedshiftSteps(ctx, 'lookback_gyr', v.lookback_gyr as number)
        : zFromLookbackSteps(ctx, v.lookback_gyr as number),
    sample: (env, x) => (drawIsLaw(env) ? sampleLawRedshift(env, 'lookback_gyr', x[LOOKBACK]) : lookbackInverse(env, x)),
  },
  z_from_luminosity_distance: {
    unit: '',
    required: ['distance_mpc'],
    usesModel: always,
    compute: (ctx, v) =>
      isLaw(ctx)
        ? hubbleLawRedshiftSteps(ctx, 'distance_mpc', v.distance_mpc as number)
        : zFromLuminosityDistanceSteps(ctx, v.distance_mpc as number),
    sample: (env, x) =>
      drawIsLaw(env) ? sampleLawRedshift(env, 'distance_mpc', x[DISTANCE]) : luminosityDistanceInverse(env, x),
  },
  parallax_distance: {
    unit: 'pc',
    required: ['parallax_mas'],
    usesModel: never,
    compute: (ctx, v) => parallaxSteps(ctx, v.parallax_mas as number),
    sample: (_env, x) => sampleParallax(x[PARALLAX]),
  },
  flux_ratio: {
    unit: '',
    required: [],
    oneOf: [['delta_mag'], ['m1', 'm2'], ['distance_1', 'distance_2']],
    usesModel: never,
    compute: fluxRatioSteps,
    sample: sampleFluxRatio,
    split: {
      applies: (p) => !p.has('distance_1'),
      before: sampleMagnitudeDifference,
      last: (_env, dm) => fluxRatioFromMagnitudes(dm),
      decreasing: true,
    },
  },
};

/**
 * Checks that the inputs present fit the quantity: required ones given, exactly
 * one alternative group, nothing the quantity would ignore.
 * @param quantity the quantity
 * @param present names of the inputs given (band included)
 * @throws CalcError naming the missing, conflicting or unused input
 */
export function checkInputs(quantity: CalcQuantity, present: Set<string>): void {
  const spec = QUANTITY_SPECS[quantity];
  for (const k of spec.required) {
    if (!present.has(k)) throw new CalcError('missing_input', `${k} is required for ${quantity}`);
  }
  const allowed = new Set([...spec.required, ...(spec.optional ?? []), ...(spec.band ? ['band'] : [])]);
  if (spec.oneOf) {
    const touched = spec.oneOf.filter((g) => g.some((k) => present.has(k)));
    const names = spec.oneOf.map((g) => g.join(' and ')).join(', or ');
    if (touched.length === 0) throw new CalcError('missing_input', `${quantity} needs ${names}`);
    if (touched.length > 1) {
      throw new CalcError(
        'conflicting_inputs',
        `${quantity} takes only one of ${names} (got ${touched.map((g) => g.filter((k) => present.has(k)).join(' and ')).join(' and ')})`,
      );
    }
    const missing = touched[0].find((k) => !present.has(k));
    if (missing)
      throw new CalcError(
        'missing_input',
        `${missing} is required with ${touched[0].filter((k) => present.has(k)).join(', ')} for ${quantity}`,
      );
    for (const k of touched[0]) allowed.add(k);
  }
  if (spec.band && !present.has('band')) throw new CalcError('missing_input', `band is required for ${quantity}`);
  for (const k of present) {
    if (!allowed.has(k)) throw new CalcError('unused_input', `${k} is not used by ${quantity}; remove it`);
  }
}
