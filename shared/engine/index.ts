/**
 * The Starproof astronomy engine: pure TypeScript, no I/O, runs in Node and in the browser.
 * This face holds what the client's charts use; `calculate.ts` is the contract for a calculation.
 */
export * from './constants.ts';
export * from './units.ts';
export { createModel } from './cosmology/model.ts';
export {
  prepareCosmology,
  comovingIntegral,
  lookbackIntegral,
  luminosityDistanceMpc,
  type Cosmology,
} from './cosmology/distances.ts';
export { PRESETS } from './cosmology/presets.ts';
export * from './hubble-law.ts';
export * from './magnitudes.ts';
