/**
 * Turns an untrusted request into a checked one, or a CalcError whose message
 * names the offending field and shows the value given.
 */
import type { core } from 'zod';
import {
  CALC_NUMERIC_INPUTS,
  CALC_QUANTITIES,
  CONTRACT_QUANTITIES,
  CalcRequestSchema,
  CustomModelSchema,
  HubbleLawModelSchema,
  PresetModelSchema,
  SOURCE_LABEL_MAX,
  type CalcRequest,
  type MeasuredInput,
} from '../schemas/calc.ts';
import { CalcError, shown } from './errors.ts';

function isRecord(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let cur: unknown = root;
  for (const key of path) {
    if (!isRecord(cur) && !Array.isArray(cur)) return undefined;
    cur = (cur as Record<PropertyKey, unknown>)[key];
  }
  return cur;
}

function fieldName(path: readonly PropertyKey[]): string {
  const parts = path.map(String);
  if (parts[0] === 'inputs' && parts.length >= 2) return parts.slice(1).join('.');
  return parts.join('.');
}

/**
 * Describes a zod issue as a sentence naming the field and the value given.
 * @param issue the first zod issue
 * @param raw the raw request
 * @param prefix path prefix for nested parses (e.g. ["model"])
 * @returns the message
 */
function describe(issue: core.$ZodIssue, raw: unknown, prefix: PropertyKey[] = []): string {
  const path = [...prefix, ...issue.path];
  const name = fieldName(path);
  const got = valueAt(raw, path);
  if (issue.code === 'unrecognized_keys') {
    const where = path.length === 0 ? 'the request' : name;
    return `${issue.keys.map((k) => `"${k}"`).join(', ')} ${issue.keys.length > 1 ? 'are' : 'is'} not a known field of ${where}`;
  }
  if (path[0] === 'inputs' && path.length === 2 && path[1] !== 'band') {
    return `${name} must be a finite number, or { "value": number, "sigma": number } or { "value": number, "minus": number, "plus": number } (got ${shown(got)})`;
  }
  if (issue.code === 'too_small') return `${name} must not be negative (got ${shown(got)})`;
  if (issue.code === 'invalid_type' && issue.expected === 'number') return `${name} must be a finite number (got ${shown(got)})`;
  if (got === undefined) return `${name} is required`;
  return `${name} is not valid: ${issue.message} (got ${shown(got)})`;
}

const isPlain = (x: unknown): x is Record<string, unknown> =>
  typeof x === 'object' && x !== null && Object.getPrototypeOf(x) === Object.prototype;
// zod's number: finite only.
const isNumber = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);
const isSigma = (x: unknown): x is number => isNumber(x) && x >= 0;
const hasOnly = (o: Record<string, unknown>, allowed: readonly string[]): boolean => {
  for (const k in o) if (!allowed.includes(k) || o[k] === undefined) return false;
  return true;
};
const INPUT_KEYS: readonly string[] = [...CALC_NUMERIC_INPUTS, 'band'];
const QUANTITIES: readonly string[] = CALC_QUANTITIES;

/** A measured input as the schema gives it back (keys in its order), or null unless it plainly fits. */
function plainInput(x: unknown): MeasuredInput | null {
  if (isNumber(x)) return x;
  if (
    !isPlain(x) ||
    !isNumber(x.value) ||
    (x.source !== undefined && !(typeof x.source === 'string' && x.source.length <= SOURCE_LABEL_MAX))
  )
    return null;
  const source = x.source === undefined ? {} : { source: x.source };
  if (hasOnly(x, ['value', 'sigma', 'source'])) {
    if (x.sigma !== undefined && !isSigma(x.sigma)) return null;
    return { value: x.value, ...(x.sigma === undefined ? {} : { sigma: x.sigma }), ...source };
  }
  if (hasOnly(x, ['value', 'minus', 'plus', 'source']) && isSigma(x.minus) && isSigma(x.plus))
    return { value: x.value, minus: x.minus, plus: x.plus, ...source };
  return null;
}

/**
 * The checked request without zod, for one that plainly fits the contract (numbers finite,
 * uncertainties not negative, texts within their lengths, a preset model): exactly what zod gives
 * back (a copy, keys in the schema's order), or null for anything else, which zod then checks and
 * words. Why: statements send thousands of such requests per recompute, and zod's parse of each
 * was 4 % of the recompute's time.
 * @param raw the request
 * @returns the request as zod would give it, or null
 */
export function plainRequest(raw: Record<string, unknown>): CalcRequest | null {
  if (!isPlain(raw) || !hasOnly(raw, ['quantity', 'inputs', 'model', 'H0_range'])) return null;
  if (typeof raw.quantity !== 'string' || !QUANTITIES.includes(raw.quantity)) return null;
  const out: Record<string, unknown> = { quantity: raw.quantity };
  if (raw.inputs !== undefined) {
    const given = raw.inputs;
    if (!isPlain(given) || !hasOnly(given, INPUT_KEYS)) return null;
    const inputs: Record<string, unknown> = {};
    for (const k of CALC_NUMERIC_INPUTS) {
      if (given[k] === undefined) continue;
      const input = plainInput(given[k]);
      if (input === null) return null;
      inputs[k] = input;
    }
    if (given.band !== undefined) {
      if (!(typeof given.band === 'string' && given.band.length <= 40)) return null;
      inputs.band = given.band;
    }
    out.inputs = inputs;
  }
  if (raw.model !== undefined) {
    const m = raw.model;
    if (!isPlain(m) || !hasOnly(m, ['preset']) || (m.preset !== 'planck18' && m.preset !== 'wmap9')) return null;
    out.model = { preset: m.preset };
  }
  if (raw.H0_range !== undefined) {
    const r = raw.H0_range;
    if (!isPlain(r) || !hasOnly(r, ['low', 'high']) || !isNumber(r.low) || !isNumber(r.high)) return null;
    out.H0_range = { low: r.low, high: r.high };
  }
  return out as CalcRequest;
}

/**
 * Validates a request.
 * @param raw the request as parsed from JSON
 * @returns the checked request
 * @throws CalcError describing the first problem
 */
export function parseRequest(raw: unknown): CalcRequest {
  if (!isRecord(raw)) throw new CalcError('invalid_request', `the request must be a JSON object (got ${shown(raw)})`);
  const plain = plainRequest(raw);
  if (plain !== null) return plain;
  if (raw.quantity === undefined) {
    throw new CalcError('missing_input', `quantity is required: one of ${CONTRACT_QUANTITIES.join(', ')}`);
  }
  if (typeof raw.quantity !== 'string' || !(CALC_QUANTITIES as readonly string[]).includes(raw.quantity)) {
    throw new CalcError('unknown_quantity', `quantity ${shown(raw.quantity)} is not one of ${CONTRACT_QUANTITIES.join(', ')}`);
  }
  if (raw.model !== undefined) {
    const m = raw.model;
    if (!isRecord(m)) throw new CalcError('invalid_model', `model must be an object (got ${shown(m)})`);
    // Pick the branch from its keys so the message is about that branch, not a generic union failure.
    const schema = 'preset' in m ? PresetModelSchema : 'law' in m ? HubbleLawModelSchema : CustomModelSchema;
    const parsed = schema.safeParse(m);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      const message =
        'preset' in m && issue.path[0] === 'preset'
          ? `model.preset must be "planck18" or "wmap9" (got ${shown(m.preset)})`
          : 'law' in m && issue.path[0] === 'law'
            ? `model.law must be "hubble" (got ${shown(m.law)})`
            : describe(issue, raw, ['model']);
      throw new CalcError('invalid_model', message);
    }
  }
  const parsed = CalcRequestSchema.safeParse(raw);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const code = issue.path[0] === 'model' || issue.path[0] === 'H0_range' ? 'invalid_model' : 'invalid_input';
    throw new CalcError(code, describe(issue, raw));
  }
  return parsed.data;
}

/**
 * The request's id, if it has a usable one, so even a rejected request is answered with it.
 * @param raw the raw request
 * @returns the id or undefined
 */
export function requestId(raw: unknown): string | number | undefined {
  if (!isRecord(raw)) return undefined;
  const id = raw.id;
  if (typeof id === 'string' && id.length <= 200) return id;
  if (typeof id === 'number' && Number.isFinite(id)) return id;
  return undefined;
}
