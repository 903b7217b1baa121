/**
 * What a quantity's calculation sees: the resolved model, the sampled H0 scale,
 * the sources of every input, and where to record working and warnings.
 */
import type { Cosmology } from '../cosmology/distances.ts';
import type { Measurement } from '../uncertainty.ts';
import type { StepSink, WorkingValue } from '../working.ts';

/** Input names with their symbol, meaning and unit, used in the working. */
export const INPUT_INFO: Record<string, { symbol: string; name: string; unit: string }> = {
  z: { symbol: 'z', name: 'redshift', unit: '' },
  m: { symbol: 'm', name: 'apparent magnitude', unit: 'mag' },
  extinction: { symbol: 'A', name: 'extinction along the line of sight', unit: 'mag' },
  alpha: { symbol: 'α', name: 'spectral index (f_ν ∝ ν^α)', unit: '' },
  parallax_mas: { symbol: 'ϖ', name: 'parallax', unit: 'mas' },
  lookback_gyr: { symbol: 't_L', name: 'lookback time', unit: 'Gyr' },
  distance_mpc: { symbol: 'd_L', name: 'luminosity distance', unit: 'Mpc' },
  m1: { symbol: 'm₁', name: 'magnitude of the first object', unit: 'mag' },
  m2: { symbol: 'm₂', name: 'magnitude of the second object', unit: 'mag' },
  delta_mag: { symbol: 'Δm', name: 'magnitude difference m₁ − m₂', unit: 'mag' },
  distance_1: { symbol: 'd₁', name: 'first distance', unit: 'same unit as d₂' },
  distance_2: { symbol: 'd₂', name: 'second distance', unit: 'same unit as d₁' },
};

/** The model as a calculation sees it. */
export interface ModelView {
  kind: 'flrw' | 'hubble_law';
  /** Prepared FLRW model; null under the Hubble law. */
  cosmo: Cosmology | null;
  /** Nominal H0 in km/s/Mpc. */
  H0: number;
  /** Source text per model parameter. */
  sources: Record<string, string>;
}

/** Everything one evaluation needs. */
export interface Ctx {
  model: ModelView;
  /** Sampled H0 divided by nominal H0 (1 for the central value). */
  h0Scale: number;
  /** The request's inputs, for their sources in the working. */
  inputs: Record<string, Measurement>;
  band: string | undefined;
  steps: StepSink;
  warnings: Set<string> | null;
}

/**
 * An input as shown in the working.
 * @param ctx evaluation context
 * @param key input name
 * @param value the value used
 * @returns the working value
 */
export function inputValue(ctx: Ctx, key: string, value: number): WorkingValue {
  const info = INPUT_INFO[key];
  return { symbol: info.symbol, name: info.name, value, unit: info.unit, source: ctx.inputs[key]?.source ?? 'request' };
}

/**
 * The Hubble constant in use (the nominal value times the sampled scale).
 * @param ctx evaluation context
 * @returns H0 in km/s/Mpc
 */
export function currentH0(ctx: Ctx): number {
  return ctx.model.H0 * ctx.h0Scale;
}

/**
 * H0 as shown in the working.
 * @param ctx evaluation context
 * @returns the working value
 */
export function h0Value(ctx: Ctx): WorkingValue {
  return {
    symbol: 'H0',
    name: 'Hubble constant',
    value: currentH0(ctx),
    unit: 'km/s/Mpc',
    source: ctx.model.sources.H0 ?? 'model',
  };
}

/**
 * A model density parameter as shown in the working.
 * @param ctx evaluation context
 * @param key parameter name (Om0, Ode0, Ok0, Ogamma0, Onu0)
 * @param value its value
 * @returns the working value
 */
export function densityValue(ctx: Ctx, key: string, value: number): WorkingValue {
  const names: Record<string, [string, string]> = {
    Om0: ['Ω_m', 'matter density today (cold dark matter + baryons)'],
    Ode0: ['Ω_Λ', 'dark energy density today'],
    Ok0: ['Ω_k', 'curvature density today'],
    Ogamma0: ['Ω_γ', 'photon density today'],
    Onu0: ['Ω_ν', 'neutrino density today'],
  };
  const [symbol, name] = names[key];
  return { symbol, name, value, unit: '', source: ctx.model.sources[key] ?? 'model' };
}

/**
 * The prepared FLRW model, or an error for the Hubble law.
 * @param ctx evaluation context
 * @returns the cosmology
 */
export function requireCosmology(ctx: Ctx): Cosmology {
  if (ctx.model.cosmo === null) throw new Error('FLRW model expected');
  return ctx.model.cosmo;
}
