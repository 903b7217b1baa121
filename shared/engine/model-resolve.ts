/**
 * Resolves a request's model into a prepared cosmology (or the Hubble law) and
 * the description returned with results. Prepared models are cached, because
 * set-up (a ~1,000-node table) costs more than a single evaluation.
 */
import type { CalcModel, ResolvedModel } from '../schemas/calc.ts';
import { prepareCosmology } from './cosmology/distances.ts';
import { createModel, type CosmologyParams } from './cosmology/model.ts';
import { PRESETS } from './cosmology/presets.ts';
import { CalcError } from './errors.ts';
import type { ModelView } from './quantities/context.ts';

/** A resolved model: what calculations use and what results report. */
export interface Resolved {
  view: ModelView;
  description: ResolvedModel;
}

const CACHE_LIMIT = 64;
const cache = new Map<string, Resolved>();

const DERIVED: Record<string, string> = {
  Ok0: 'Ω_k = 1 − Ω_m − Ω_Λ − Ω_γ − Ω_ν',
  Ogamma0: 'from Tcmb0: Ω_γ = (4σT⁴/c³) / (3H0²/8πG), with CODATA 2018 G and σ',
  Onu0: 'from Neff, m_nu and Tcmb0: Ω_ν = 0.2271 Ω_γ N_eff/N_ν Σ f(m_ν/T_ν0) (Komatsu et al. 2011 fitting function for massive species)',
};

function resolveFlrw(params: CosmologyParams, label: string, sources: Record<string, string>): Resolved {
  const model = createModel(params);
  const cosmo = prepareCosmology(model);
  const allSources = { ...DERIVED, ...sources };
  return {
    view: { kind: 'flrw', cosmo, H0: model.H0, sources: allSources },
    description: {
      name: model.name,
      label,
      kind: 'flrw',
      H0: model.H0,
      Om0: model.Om0,
      Ode0: model.Ode0,
      Ok0: model.Ok0,
      Ogamma0: model.Ogamma0,
      Onu0: model.Onu0,
      Tcmb0: model.Tcmb0,
      Neff: model.Neff,
      m_nu: model.m_nu,
      ...(model.Ob0 !== undefined ? { Ob0: model.Ob0 } : {}),
      flat: model.flat,
      sources: allSources,
    },
  };
}

function resolveUncached(model: CalcModel): Resolved {
  if ('preset' in model) {
    const preset = PRESETS[model.preset];
    return resolveFlrw(preset.params, preset.label, preset.sources);
  }
  if ('law' in model) {
    if (!(model.H0 > 0)) throw new CalcError('invalid_model', `model.H0 must be greater than 0 (got ${model.H0})`);
    const sources = { H0: 'request' };
    return {
      view: { kind: 'hubble_law', cosmo: null, H0: model.H0, sources },
      description: {
        name: model.name ?? 'hubble_law',
        label: 'simple Hubble law d = cz/H0 (classroom model, small z only)',
        kind: 'hubble_law',
        H0: model.H0,
        sources,
      },
    };
  }
  const flat = model.Ode0 === undefined;
  const sources: Record<string, string> = {
    H0: 'request',
    Om0: 'request',
    Ode0: flat ? 'flat model: Ω_Λ = 1 − Ω_m − Ω_γ − Ω_ν' : 'request',
  };
  if (model.Tcmb0 !== undefined) sources.Tcmb0 = 'request';
  if (model.Neff !== undefined) sources.Neff = 'request';
  if (model.m_nu !== undefined) sources.m_nu = 'request';
  const name = model.name ?? 'custom';
  return resolveFlrw({ ...model, name }, `custom FLRW model "${name}"`, sources);
}

function deepFreeze(o: object): void {
  for (const v of Object.values(o)) if (typeof v === 'object' && v !== null) deepFreeze(v);
  Object.freeze(o);
}

/**
 * Resolves (and caches) a model.
 * @param model the request's model (Planck 2018 when omitted)
 * @returns the resolved model
 * @throws CalcError for invalid parameters
 */
export function resolveModel(model: CalcModel | undefined): Resolved {
  const m = model ?? { preset: 'planck18' as const };
  const key = JSON.stringify(m);
  const hit = cache.get(key);
  if (hit) return hit;
  const resolved = resolveUncached(m);
  // Every result under this model shares one description: frozen, so none can change it for the others.
  deepFreeze(resolved.description);
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(key, resolved);
  return resolved;
}
