/**
 * What a Monte Carlo draw's calculation sees. Draws keep no working and no warnings, so they run
 * on plain numbers: the drawn inputs sit in a Float64Array at fixed slots (reading a slot costs
 * the same whatever else the request gave, where named properties would vary in shape from request
 * to request), and one environment per request holds the model, the H0 scale (rewritten before each
 * draw) and which inputs were given. Samplers return NaN where the working path would throw.
 */
import { SOLAR_MAGNITUDES } from '../solar-magnitudes.ts';
import type { Ctx, ModelView } from './context.ts';
import type { ZInterpolant } from './local-modulus.ts';
import type { Values } from './photometry.ts';

/** Every input a draw can vary, in slot order; H0 (from an H0 range) comes last. */
export const SLOT_NAMES = [
  'z',
  'm',
  'extinction',
  'alpha',
  'parallax_mas',
  'lookback_gyr',
  'distance_mpc',
  'm1',
  'm2',
  'delta_mag',
  'distance_1',
  'distance_2',
  'H0',
] as const;

// Slot numbers, named for the samplers (same order as SLOT_NAMES).
export const Z = 0;
export const M = 1;
export const EXTINCTION = 2;
export const ALPHA = 3;
export const PARALLAX = 4;
export const LOOKBACK = 5;
export const DISTANCE = 6;
export const M1 = 7;
export const M2 = 8;
export const DELTA_MAG = 9;
export const DISTANCE_1 = 10;
export const DISTANCE_2 = 11;
export const H0_SLOT = 12;

/**
 * The slot of an input.
 * @param name input name (or H0)
 * @returns its slot, −1 for a name that is never drawn (band)
 */
export function slotOf(name: string): number {
  return (SLOT_NAMES as readonly string[]).indexOf(name);
}

/** The state a draw reads; `h0Scale` is rewritten for every draw, nothing else changes. */
export interface SampleEnv {
  model: ModelView;
  /** Sampled H0 divided by nominal H0 (1 when H0 is not varied). */
  h0Scale: number;
  /** The Sun's absolute magnitude in the request's band (NaN when there is no usable band). */
  Msun: number;
  /** Bit i set when the input in slot i was given. */
  given: number;
  /** μ(z) over this run's redshift draws (see local-modulus.ts), or null to compute it exactly. */
  modulusAt: ZInterpolant | null;
}

/** One draw of a quantity from the inputs in x: NaN where the quantity is not defined. */
export type Sampler = (env: SampleEnv, x: Float64Array) => number;

/**
 * The environment for a request's draws.
 * @param model the resolved model
 * @param band the request's band, if any
 * @param names the inputs given
 * @returns the environment, with h0Scale = 1
 */
export function sampleEnv(model: ModelView, band: string | undefined, names: Iterable<string>): SampleEnv {
  const sun = band !== undefined && Object.hasOwn(SOLAR_MAGNITUDES, band) ? SOLAR_MAGNITUDES[band] : undefined;
  let given = 0;
  for (const name of names) if (slotOf(name) >= 0) given |= 1 << slotOf(name);
  return { model, h0Scale: 1, Msun: sun ? sun.absolute : NaN, given, modulusAt: null };
}

/**
 * Whether the request gave the input in a slot.
 * @param env the draw's environment
 * @param slot the slot
 * @returns true when given
 */
export function has(env: SampleEnv, slot: number): boolean {
  return (env.given & (1 << slot)) !== 0;
}

/**
 * The H0 in use for this draw, in km/s/Mpc (computed as the working path does, for identical results).
 * @param env the draw's environment
 * @returns nominal H0 × sampled scale
 */
export function drawnH0(env: SampleEnv): number {
  return env.model.H0 * env.h0Scale;
}

/**
 * A draw's inputs by name, as the working path reads them (given inputs only).
 * @param env the draw's environment
 * @param x the drawn values by slot
 * @returns the values by name
 */
export function valuesOf(env: SampleEnv, x: Float64Array): Values {
  const v: Values = {};
  SLOT_NAMES.forEach((name, slot) => {
    if (has(env, slot)) v[name] = x[slot];
  });
  return v;
}

/**
 * A sampler that runs a quantity's working-path calculation with no sink: for quantities whose
 * draws are dominated by root finding, where a lean copy would only add code.
 * @param compute the quantity's calculation
 * @returns the sampler (may throw for a draw outside the domain; the Monte Carlo loop counts it)
 */
export function viaCompute(compute: (ctx: Ctx, v: Values) => number): Sampler {
  return (env, x) =>
    compute(
      { model: env.model, h0Scale: env.h0Scale, inputs: {}, band: undefined, steps: null, warnings: null },
      valuesOf(env, x),
    );
}
