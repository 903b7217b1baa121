import type { Step, WorkingValue } from '../engine/working.ts';

/**
 * How a statement's working is stored. Each step splits into its skeleton (title, formula, names,
 * units, sources and notes with their numbers taken out) and its data (the numbers, and the
 * measurement ids in sources). Skeletons come from the code and repeat across thousands of
 * statements, so they are stored once, by id, in a table of their own; a statement stores only
 * [skeleton id, ...data] per step. Lossless:
 * unpackWorking(packWorking(w).stored, …) deep-equals w.
 */
export interface StoredWorking {
  v: 2;
  /** Per step: its skeleton's id, then its data in reading order. */
  w: Array<[string, ...Array<number | string>]>;
}

/** A step with its data replaced by holes, as JSON text (what a skeleton id names). */
export type SkeletonJson = string;

interface SkeletonValue {
  symbol: string;
  name: string;
  /** True when the value is text rather than a number. */
  text?: true;
  unit: string;
  source: string;
}

interface Skeleton {
  title: string;
  formula: string;
  inputs: SkeletonValue[];
  constants: SkeletonValue[];
  result: { symbol: string; name: string; unit: string };
  note?: string;
}

// Numbers in free text (notes and names) and measurement ids in sources are data; titles, formulas,
// symbols and units are code's own and stay in the skeleton.
const NUMBER = /[-−]?\d+(?:\.\d+)?(?:e[+-]?\d+)?/g;
const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi;
/** Marks where data was taken out of a text; never part of the working's own text. */
const HOLE = '\u0000';

/**
 * Packs a working for storage.
 * @param steps the working as the engine and templates wrote it
 * @param idOf names a skeleton (a stable hash of its JSON)
 * @returns what the statement stores, and every skeleton it refers to by id
 */
export function packWorking(steps: Step[], idOf: (skeleton: SkeletonJson) => string): { stored: StoredWorking; skeletons: Map<string, SkeletonJson> } {
  const skeletons = new Map<string, SkeletonJson>();
  const w = steps.map((step) => {
    const data: Array<number | string> = [];
    const hollow = (text: string, pattern: RegExp): string => {
      // PostgreSQL text cannot hold NUL, so no stored citation can; the engine never writes one.
      if (text.includes(HOLE)) throw new Error('A working text contains a NUL character.');
      return text.replace(pattern, (found) => {
        data.push(found);
        return HOLE;
      });
    };
    const value = (v: WorkingValue): SkeletonValue => {
      data.push(v.value);
      return {
        symbol: v.symbol,
        name: hollow(v.name, NUMBER),
        ...(typeof v.value === 'string' ? { text: true as const } : {}),
        unit: v.unit,
        source: hollow(v.source, UUID),
      };
    };
    const skeleton: Skeleton = {
      title: step.title,
      formula: step.formula,
      inputs: step.inputs.map(value),
      constants: step.constants.map(value),
      result: { symbol: step.result.symbol, name: hollow(step.result.name, NUMBER), unit: step.result.unit },
    };
    data.push(step.result.value);
    if (step.note !== undefined) skeleton.note = hollow(step.note, NUMBER);
    const json = JSON.stringify(skeleton);
    const id = idOf(json);
    skeletons.set(id, json);
    return [id, ...data] as [string, ...Array<number | string>];
  });
  return { stored: { v: 2, w }, skeletons };
}

/** The skeleton ids a stored working refers to (none for a working stored in full). */
export function skeletonIds(stored: unknown): string[] {
  return isStored(stored) ? [...new Set(stored.w.map(([id]) => id))] : [];
}

const isStored = (stored: unknown): stored is StoredWorking =>
  typeof stored === 'object' && stored !== null && !Array.isArray(stored) && (stored as StoredWorking).v === 2;

/**
 * Reads a stored working back into steps. Workings stored in full (plain step arrays, from before
 * packing) are returned as they are.
 * @param stored the column's value
 * @param skeletonOf each skeleton's JSON by id
 * @returns the steps (an empty list when nothing is stored)
 * @throws Error when a skeleton is missing (the working cannot be shown faithfully)
 */
export function unpackWorking(stored: unknown, skeletonOf: (id: string) => SkeletonJson | undefined): Step[] {
  if (Array.isArray(stored)) return stored as Step[];
  if (!isStored(stored)) return [];
  return stored.w.map(([id, ...data]) => {
    const json = skeletonOf(id);
    if (json === undefined) throw new Error(`The working refers to a step layout (${id}) that is not stored.`);
    const skeleton = JSON.parse(json) as Skeleton;
    let next = 0;
    const take = () => data[next++];
    const fill = (text: string): string => (text.includes(HOLE) ? text.replaceAll(HOLE, () => String(take())) : text);
    const value = (v: SkeletonValue): WorkingValue => {
      const raw = take();
      return { symbol: v.symbol, name: fill(v.name), value: v.text ? String(raw) : Number(raw), unit: v.unit, source: fill(v.source) };
    };
    // The same reading order as packWorking: inputs, constants, result name, result, note.
    const inputs = skeleton.inputs.map(value);
    const constants = skeleton.constants.map(value);
    const resultName = fill(skeleton.result.name);
    const resultValue = Number(take());
    const step: Step = {
      title: skeleton.title,
      formula: skeleton.formula,
      inputs,
      constants,
      result: { symbol: skeleton.result.symbol, name: resultName, value: resultValue, unit: skeleton.result.unit },
    };
    if (skeleton.note !== undefined) step.note = fill(skeleton.note);
    return step;
  });
}
