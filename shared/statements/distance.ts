import type { ResolvedModel } from '../schemas/calc.ts';
import type { Step } from '../engine/working.ts';
import { derivedStep, mapInterval } from './compose.ts';
import { asInput, requireDistance, run, runWithModel, used, type DistanceBasis } from './inputs.ts';
import type { TemplateContext, UsedInput } from './types.ts';

/** A distance today with everything a statement needs to show its working. */
export interface DistanceToday {
  mpc: number;
  interval: { low: number; high: number } | null;
  working: Step[];
  warnings: string[];
  inputs: UsedInput[];
  model: ResolvedModel | null;
  basis: DistanceBasis['kind'];
}

function intervalOf(m: { value: number; sigma?: number | null; minus?: number | null; plus?: number | null }) {
  if (m.minus != null && m.plus != null) return { low: m.value - m.minus, high: m.value + m.plus };
  if (m.sigma != null) return { low: m.value - m.sigma, high: m.value + m.sigma };
  return undefined;
}

// The distance-today and scale-model statements about one object read the same distance: it is
// worked out once per context (a recompute hands all of an object's statements one context, which
// nothing changes) and only read afterwards.
const worked = new WeakMap<TemplateContext, DistanceToday>();

/**
 * How far away the object is today: the proper distance from a redshift in the Hubble flow (the
 * comoving distance, which is what "now" means in an expanding universe), else a stored distance,
 * else the inverse of the parallax.
 * @returns the distance, shared by every caller with this context (do not change it)
 */
export function distanceToday(ctx: TemplateContext): DistanceToday {
  let d = worked.get(ctx);
  if (d === undefined) {
    d = workOutDistanceToday(ctx);
    worked.set(ctx, d);
  }
  return d;
}

function workOutDistanceToday(ctx: TemplateContext): DistanceToday {
  const basis = requireDistance(ctx);
  const m = basis.measurement;
  if (basis.kind === 'z') {
    const r = runWithModel(ctx, { quantity: 'proper_distance', inputs: { z: asInput(m) }, model: ctx.model });
    return {
      mpc: r.value,
      interval: r.interval ?? null,
      working: r.working,
      warnings: r.warnings,
      inputs: [used(m)],
      model: r.model,
      basis: 'z',
    };
  }
  if (basis.kind === 'parallax') {
    const r = run({ quantity: 'parallax_distance', inputs: { parallax_mas: asInput(m) } });
    return {
      mpc: r.value * 1e-6,
      interval: mapInterval(r.interval, (pc) => pc * 1e-6),
      working: r.working,
      warnings: r.warnings,
      inputs: [used(m)],
      model: null,
      basis: 'parallax',
    };
  }
  const step = derivedStep({
    title: 'Distance from the catalogue',
    formula: 'd [Mpc] = d [pc] × 10⁻⁶',
    inputs: [
      {
        symbol: 'd',
        name: 'preferred distance',
        value: m.value,
        unit: 'pc',
        source: `${m.source.citation} (measurement ${m.id})`,
      },
    ],
    result: { symbol: 'd', name: 'distance', value: m.value * 1e-6, unit: 'Mpc' },
    note: 'A directly measured distance; no cosmology is involved at this range.',
  });
  return {
    mpc: m.value * 1e-6,
    interval: mapInterval(intervalOf(m), (pc) => pc * 1e-6),
    working: [step],
    warnings: [],
    inputs: [used(m)],
    model: null,
    basis: 'distance',
  };
}
