/**
 * The numbers behind the distance–redshift chart, computed in the browser with
 * the engine: luminosity, proper (comoving) and light-travel distance for each
 * model on a logarithmic grid of redshifts, and the simple Hubble law d = cz/H0.
 */
import {
  PRESETS,
  comovingIntegral,
  createModel,
  hubbleLawDistanceMpc,
  lookbackIntegral,
  luminosityDistanceMpc,
  prepareCosmology,
  type Cosmology,
} from '@shared/engine/index.ts';
import type { CalcModel } from '@shared/schemas/calc.ts';

/** The distance measures drawn for each cosmology model. */
export const MEASURES = ['luminosity', 'proper', 'lightTravel'] as const;
export type Measure = (typeof MEASURES)[number];

/** Words for each measure, for the legend, tooltip and table. */
export const MEASURE_LABELS: Record<Measure, string> = {
  luminosity: 'Luminosity distance',
  proper: 'Proper distance today (comoving)',
  lightTravel: 'Light-travel distance',
};

/** Where the chart starts: below this the curves are indistinguishable from the Hubble law. */
export const Z_MIN = 0.01;
/** Points per curve: smooth on a log axis and cheap (a few ms per model). */
export const POINTS = 200;
/** Key of the Hubble-law series in chart rows. */
export const HUBBLE_KEY = 'hubble';

/** A model ready to draw: an FLRW cosmology, or the Hubble law (no curves of its own). */
export interface ChartModel {
  key: string;
  label: string;
  H0: number;
  cosmo: Cosmology | null;
  /** Why the model cannot be drawn, in words (an invalid custom model). */
  problem?: string;
}

function labelFor(model: CalcModel): string {
  if ('preset' in model) return model.preset === 'planck18' ? 'Planck 2018' : 'WMAP nine-year';
  if ('law' in model) return `Simple Hubble law (H₀ ${model.H0})`;
  if (model.name) return model.name;
  return `Custom (H₀ ${model.H0}, Ω_m ${model.Om0}${model.Ode0 !== undefined ? `, Ω_Λ ${model.Ode0}` : ', flat'})`;
}

/**
 * Prepares a request's model for drawing.
 * @param model a model from the calculation contract
 * @param index its position (keys stay unique when two custom models are shown)
 * @returns the prepared model; `problem` says why it cannot be drawn
 */
export function chartModel(model: CalcModel, index: number): ChartModel {
  const key = 'preset' in model ? model.preset : `${'law' in model ? 'law' : 'custom'}-${index}`;
  const label = labelFor(model);
  if ('law' in model) return { key, label, H0: model.H0, cosmo: null };
  const params = 'preset' in model ? PRESETS[model.preset].params : { ...model, name: model.name ?? 'custom' };
  try {
    return { key, label, H0: params.H0, cosmo: prepareCosmology(createModel(params)) };
  } catch (e) {
    return { key, label, H0: params.H0, cosmo: null, problem: e instanceof Error ? e.message : String(e) };
  }
}

/**
 * The three distances of a model at one redshift, in Mpc; null where the model
 * is not defined (beyond a bounce) so the line breaks rather than lies.
 */
export function distancesAt(cosmo: Cosmology, z: number): Record<Measure, number | null> {
  const dH = cosmo.model.hubbleDistance;
  const safe = (f: () => number): number | null => {
    try {
      const x = f();
      return Number.isFinite(x) && x > 0 ? x : null;
    } catch {
      return null;
    }
  };
  return {
    luminosity: safe(() => luminosityDistanceMpc(cosmo, z)),
    proper: safe(() => comovingIntegral(cosmo, z) * dH),
    // Light-travel distance is c times the lookback time: D_H times the lookback integral.
    lightTravel: safe(() => lookbackIntegral(cosmo, z) * dH),
  };
}

/**
 * Where the chart starts: Z_MIN, or lower for a very nearby object so its point is on the chart.
 * @param z the object's redshift
 * @returns the first redshift of the grid, a power of ten
 */
export const chartZMin = (z: number): number => (z > 0 && z < Z_MIN ? 10 ** Math.floor(Math.log10(z)) : Z_MIN);

/**
 * Redshifts spaced evenly in log z.
 * @param zMin the first redshift
 * @param zMax the last redshift
 * @param n how many
 * @returns the grid, from zMin to zMax
 */
export function redshiftGrid(zMin: number, zMax: number, n = POINTS): number[] {
  const lo = Math.log10(zMin);
  const hi = Math.log10(zMax);
  return Array.from({ length: n }, (_, i) => 10 ** (lo + ((hi - lo) * i) / (n - 1)));
}

/** The series key of one model's measure in chart rows. */
export const seriesKey = (modelKey: string, measure: Measure): string => `${modelKey}:${measure}`;

/** One row of the chart: z and every series' distance in Mpc. */
export type ChartRow = { z: number } & Record<string, number | null>;

/**
 * Evaluates every curve on the grid.
 * @param models prepared models (those without a cosmology add no curves)
 * @param hubbleH0 H0 of the Hubble-law line
 * @param zs the redshifts
 * @returns one row per redshift
 */
export function chartRows(models: ChartModel[], hubbleH0: number, zs: number[]): ChartRow[] {
  return zs.map((z) => {
    const row: ChartRow = { z, [HUBBLE_KEY]: hubbleLawDistanceMpc(z, hubbleH0) };
    for (const m of models) {
      if (!m.cosmo) continue;
      const d = distancesAt(m.cosmo, z);
      for (const measure of MEASURES) row[seriesKey(m.key, measure)] = d[measure];
    }
    return row;
  });
}
