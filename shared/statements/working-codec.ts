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

// Texts seen before (names and sources repeat from statement to statement) are looked at once.
const HOLLOWED_LIMIT = 20_000;
const hollowedTexts = new Map<string, Hollowed>();
// Every distinct piece of skeleton text gets a number; a step's signature is its pieces' numbers,
// a short key however long the texts. Numbers are never reused, so two signatures are equal only
// when every piece is the same text.
const PIECE_LIMIT = 50_000;
const pieceIds = new Map<string, number>();
let nextPiece = 0;
// A step's skeleton by its signature, per id function: building and hashing the JSON happens once
// per distinct skeleton, not once per step.
const SKELETON_LIMIT = 5_000;
const skeletonsBySignature = new WeakMap<object, Map<string, { id: string; json: SkeletonJson }>>();

const remember = <K, V>(map: Map<K, V>, limit: number, key: K, value: V): V => {
  if (map.size >= limit) map.delete(map.keys().next().value as K);
  map.set(key, value);
  return value;
};

function pieceId(text: string): number {
  return pieceIds.get(text) ?? remember(pieceIds, PIECE_LIMIT, text, nextPiece++);
}

/** A text with its data taken out: the text with holes, what filled them in order, and the hollow text's piece number. */
interface Hollowed {
  text: string;
  data: string[];
  piece: number;
}

function hollowed(text: string, pattern: RegExp, cache: boolean): Hollowed {
  const hit = cache ? hollowedTexts.get(text) : undefined;
  if (hit) return hit;
  // PostgreSQL text cannot hold NUL, so no stored citation can; the engine never writes one.
  if (text.includes(HOLE)) throw new Error('A working text contains a NUL character.');
  const data: string[] = [];
  const hollow = text.replace(pattern, (found) => {
    data.push(found);
    return HOLE;
  });
  const out = { text: hollow, data, piece: pieceId(hollow) };
  // Only texts without data are kept: they are the ones that come back (a name with this
  // statement's uncertainty in it, or a source with its measurement id, would only crowd them out).
  return cache && data.length === 0 ? remember(hollowedTexts, HOLLOWED_LIMIT, text, out) : out;
}

/**
 * Packs a working for storage.
 * @param steps the working as the engine and templates wrote it
 * @param idOf names a skeleton (a stable hash of its JSON)
 * @returns what the statement stores, and every skeleton it refers to by id
 */
export function packWorking(
  steps: Step[],
  idOf: (skeleton: SkeletonJson) => string,
): { stored: StoredWorking; skeletons: Map<string, SkeletonJson> } {
  let known = skeletonsBySignature.get(idOf);
  if (!known) {
    known = new Map();
    skeletonsBySignature.set(idOf, known);
  }
  const skeletons = new Map<string, SkeletonJson>();
  const w: StoredWorking['w'] = [];
  for (const step of steps) {
    const row: [string, ...Array<number | string>] = [''];
    let signature = `${pieceId(step.title)},${pieceId(step.formula)}`;
    signature += signValues(step.inputs, row);
    signature += signValues(step.constants, row);
    const resultName = hollowed(step.result.name, NUMBER, true);
    pushAll(row, resultName.data);
    row.push(step.result.value);
    signature += `|${pieceId(step.result.symbol)},${resultName.piece},${pieceId(step.result.unit)}`;
    // Notes mostly carry this statement's numbers: split them without keeping them.
    const note = step.note === undefined ? undefined : hollowed(step.note, NUMBER, false);
    if (note) pushAll(row, note.data);
    signature += note === undefined ? '|' : `|${note.piece}`;
    const entry = known.get(signature) ?? remember(known, SKELETON_LIMIT, signature, skeletonEntry(step, idOf));
    row[0] = entry.id;
    skeletons.set(entry.id, entry.json);
    w.push(row);
  }
  return { stored: { v: 2, w }, skeletons };
}

function pushAll(row: Array<number | string>, data: string[]): void {
  for (let i = 0; i < data.length; i++) row.push(data[i]);
}

/** Adds a list of values' data to the row; returns their part of the signature. */
function signValues(list: WorkingValue[], row: Array<number | string>): string {
  let signature = `|${list.length}`;
  for (const v of list) {
    const name = hollowed(v.name, NUMBER, true);
    const source = hollowed(v.source, UUID, true);
    row.push(v.value);
    pushAll(row, name.data);
    pushAll(row, source.data);
    signature += `;${pieceId(v.symbol)},${name.piece},${typeof v.value === 'string' ? 't' : 'n'},${pieceId(v.unit)},${source.piece}`;
  }
  return signature;
}

/** The skeleton of a step (its texts hollowed as packWorking does), with its id. */
function skeletonEntry(step: Step, idOf: (skeleton: SkeletonJson) => string): { id: string; json: SkeletonJson } {
  const value = (v: WorkingValue): SkeletonValue => ({
    symbol: v.symbol,
    name: hollowed(v.name, NUMBER, true).text,
    ...(typeof v.value === 'string' ? { text: true as const } : {}),
    unit: v.unit,
    source: hollowed(v.source, UUID, true).text,
  });
  const skeleton: Skeleton = {
    title: step.title,
    formula: step.formula,
    inputs: step.inputs.map(value),
    constants: step.constants.map(value),
    result: { symbol: step.result.symbol, name: hollowed(step.result.name, NUMBER, true).text, unit: step.result.unit },
  };
  if (step.note !== undefined) skeleton.note = hollowed(step.note, NUMBER, false).text;
  const json = JSON.stringify(skeleton);
  return { id: idOf(json), json };
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
      return {
        symbol: v.symbol,
        name: fill(v.name),
        value: v.text ? String(raw) : Number(raw),
        unit: v.unit,
        source: fill(v.source),
      };
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
