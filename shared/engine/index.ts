/**
 * The Starproof astronomy engine: pure TypeScript, no I/O, runs in Node and in the browser.
 * `calculate` is the contract; the rest is exported for statements, previews and tests.
 */
export { calculate, calculateLine } from './calculate.ts';
export * from './constants.ts';
export * from './units.ts';
export { CalcError, type CalcErrorCode } from './errors.ts';
export { createModel, photonDensity, type CosmologyParams, type FlrwModel } from './cosmology/model.ts';
export {
  prepareCosmology,
  comovingIntegral,
  lookbackIntegral,
  ageIntegral,
  expansionRate,
  luminosityDistanceMpc,
  transverseFromLineOfSight,
  type Cosmology,
} from './cosmology/distances.ts';
export { PRESETS, PLANCK18, WMAP9, type Preset, type PresetName } from './cosmology/presets.ts';
export * from './hubble-law.ts';
export * from './magnitudes.ts';
export { SOLAR_MAGNITUDES, SOLAR_BANDS, type SolarBand } from './solar-magnitudes.ts';
export { monteCarlo } from './monte-carlo.ts';
export { mulberry32, type Measurement } from './uncertainty.ts';
export type { Step, WorkingValue, StepResult } from './working.ts';
export { QUANTITY_SPECS } from './quantities/registry.ts';
export { CALC_QUANTITIES, CalcRequestSchema, CalcResultSchema, type CalcRequest, type CalcResult } from '../schemas/calc.ts';
