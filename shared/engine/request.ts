/**
 * Turns an untrusted request into a checked one, or a CalcError whose message
 * names the offending field and shows the value given.
 */
import type { core } from 'zod';
import {
  CALC_QUANTITIES,
  CONTRACT_QUANTITIES,
  CalcRequestSchema,
  CustomModelSchema,
  HubbleLawModelSchema,
  PresetModelSchema,
  type CalcRequest,
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

/**
 * Validates a request.
 * @param raw the request as parsed from JSON
 * @returns the checked request
 * @throws CalcError describing the first problem
 */
export function parseRequest(raw: unknown): CalcRequest {
  if (!isRecord(raw)) throw new CalcError('invalid_request', `the request must be a JSON object (got ${shown(raw)})`);
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
