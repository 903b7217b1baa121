/** Small helpers shared by the reference tests. */
import { calculate } from '../../../shared/engine/calculate.ts';

/**
 * Runs a request and returns its value, failing loudly on an error result.
 * @param request the calculation request
 * @returns the result's value
 */
export function calcValue(request: unknown): number {
  const r = calculate(request);
  if ('error' in r) throw new Error(`${r.error.code}: ${r.error.message}`);
  return r.value;
}

/** Relative difference |a − b| / |b|. */
export const rel = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
