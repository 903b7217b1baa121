import type { Step, WorkingValue } from '../engine/working.ts';
import { findQuantity } from '../catalogue/quantities.ts';
import type { UsedInput } from './types.ts';

// How the engine and templates mark which stored measurement a value came from (kept in the stored
// working so a statement can be traced; never shown to people).
const MEASUREMENT_REF = /\s*\(measurement ([0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}|[^)\s]+)\)/gi;

/** "M 87: redshift" / "Vega: apparent magnitude, V band": how a person knows a measurement. */
export function measurementName(objectName: string, input: Pick<UsedInput, 'quantity' | 'band'>): string {
  const quantity = (findQuantity(input.quantity)?.label ?? input.quantity.replaceAll('_', ' ')).toLowerCase();
  return `${objectName}: ${quantity}${input.band ? `, ${input.band} band` : ''}`;
}

/**
 * The working as people read it: each "(measurement <id>)" in a source becomes the object's name and
 * the quantity ("Smith 2020 (M 87: redshift)"); an id that names none of the statement's inputs is
 * left out rather than shown.
 * @param steps the working as stored
 * @param inputs the statement's inputs (which measurement each id is)
 * @param objectName the object the statement is about
 */
export function workingForPeople(steps: Step[], inputs: readonly UsedInput[], objectName: string): Step[] {
  const byId = new Map(inputs.map((i) => [i.measurementId, i]));
  const source = (text: string) =>
    text.replace(MEASUREMENT_REF, (_found, id: string) => {
      const input = byId.get(id);
      return input ? ` (${measurementName(objectName, input)})` : '';
    });
  const value = (v: WorkingValue): WorkingValue => (v.source.includes('(measurement ') ? { ...v, source: source(v.source) } : v);
  return steps.map((step) => ({
    ...step,
    inputs: step.inputs.map(value),
    constants: step.constants.map(value),
    ...(step.note !== undefined ? { note: source(step.note) } : {}),
  }));
}
