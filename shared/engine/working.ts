/**
 * The step-by-step working attached to every result: what a reviewer follows
 * with a calculator. Each step names what it does in words, gives the formula
 * in symbols, lists its inputs and constants with units and sources, and its result.
 */
import type { Constant } from './constants.ts';

/** One value shown in a step: an input, a constant or an intermediate result. */
export interface WorkingValue {
  symbol: string;
  name: string;
  value: number | string;
  unit: string;
  source: string;
}

/** The result of one step. */
export interface StepResult {
  symbol: string;
  name: string;
  value: number;
  unit: string;
}

/** One step of the working. */
export interface Step {
  title: string;
  formula: string;
  inputs: WorkingValue[];
  constants: WorkingValue[];
  result: StepResult;
  note?: string;
}

/** Where steps are recorded; null while sampling for uncertainties, when no working is kept. */
export type StepSink = Step[] | null;

/**
 * Shows a constant from constants.ts as a working value.
 * @param c the constant
 * @returns the working value
 */
export function fromConstant(c: Constant): WorkingValue {
  return { symbol: c.symbol, name: c.name, value: c.value, unit: c.unit, source: c.source };
}

/**
 * An intermediate value computed in an earlier step.
 * @param r the earlier step's result
 * @returns the value as an input to a later step
 */
export function fromStep(r: StepResult): WorkingValue {
  return { symbol: r.symbol, name: r.name, value: r.value, unit: r.unit, source: 'previous step' };
}

/**
 * Records a step when a sink is present; a no-op while sampling.
 * @param sink where to record
 * @param step the step, built lazily so sampling pays nothing
 * @returns the step's result value
 */
export function record(
  sink: StepSink,
  value: number,
  step: () => Omit<Step, 'result'> & { result: Omit<StepResult, 'value'> },
): number {
  if (sink !== null) {
    // The step is built fresh by the closure, so its result can take the value in place.
    const s = step() as Step;
    s.result.value = value;
    sink.push(s);
  }
  return value;
}
