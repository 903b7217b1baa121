/**
 * Turns the calculator form into a calculation request, and finds the field a server
 * message is about (the message itself is put in words by shared/contract/words.ts). Which inputs a quantity takes comes from the
 * engine's own QUANTITY_SPECS, so the form never offers an input the engine would refuse.
 */
import { QUANTITY_SPECS } from '@shared/engine/quantities/registry.ts';
import {
  CALC_NUMERIC_INPUTS,
  CalcRequestSchema,
  type CalcModel,
  type CalcNumericInput,
  type CalcQuantity,
  type CalcRequest,
  type MeasuredInput,
} from '@shared/schemas/calc.ts';
import { INPUT_LABELS } from '@shared/contract/words.ts';

/** One numeric input as typed: a value and an optional symmetric or asymmetric uncertainty. */
export interface MeasuredField {
  value: string;
  sigma: string;
  minus: string;
  plus: string;
  asymmetric: boolean;
}

/** The models offered. */
export type ModelChoice = 'planck18' | 'wmap9' | 'custom' | 'hubble';

/** Everything the calculator form holds, as strings while typed. */
export interface CalcFormValues {
  quantity: CalcQuantity;
  /** Index of the chosen group of alternative inputs, when the quantity has some. */
  group: string;
  inputs: Record<CalcNumericInput, MeasuredField>;
  band: string;
  model: ModelChoice;
  custom: { name: string; H0: string; Om0: string; Ode0: string; Tcmb0: string; Neff: string; m_nu: string };
  hubbleH0: string;
  h0Low: string;
  h0High: string;
}

/** A form field path with a message, for react-hook-form's setError. */
export interface FieldProblem {
  path: string;
  message: string;
}

const emptyField = (): MeasuredField => ({ value: '', sigma: '', minus: '', plus: '', asymmetric: false });

/** The form's starting values: luminosity distance with Planck 2018. */
export function defaultFormValues(): CalcFormValues {
  return {
    quantity: 'luminosity_distance',
    group: '0',
    inputs: Object.fromEntries(CALC_NUMERIC_INPUTS.map((k) => [k, emptyField()])) as Record<CalcNumericInput, MeasuredField>,
    band: 'V',
    model: 'planck18',
    custom: { name: '', H0: '70', Om0: '0.3', Ode0: '0.7', Tcmb0: '', Neff: '', m_nu: '' },
    hubbleH0: '70',
    h0Low: '',
    h0High: '',
  };
}

/** The inputs a quantity takes with the chosen group of alternatives. */
export interface QuantityFields {
  required: CalcNumericInput[];
  optional: CalcNumericInput[];
  groups: CalcNumericInput[][];
  band: boolean;
  usesModel: boolean;
  flrwOnly: boolean;
}

/**
 * Derives the form's fields from the engine's specification of a quantity.
 * @param quantity the quantity
 * @param group index of the chosen group of alternatives
 * @returns the numeric inputs to show, whether a band and a model are needed
 */
export function fieldsFor(quantity: CalcQuantity, group: number): QuantityFields {
  const spec = QUANTITY_SPECS[quantity];
  const groups = (spec.oneOf ?? []) as CalcNumericInput[][];
  const chosen = groups[Math.min(Math.max(group, 0), Math.max(groups.length - 1, 0))] ?? [];
  const required = [...(spec.required as CalcNumericInput[]), ...chosen];
  return {
    required,
    optional: (spec.optional ?? []) as CalcNumericInput[],
    groups,
    band: spec.band === true,
    usesModel: spec.usesModel(new Set(required)),
    flrwOnly: spec.flrwOnly === true,
  };
}

/**
 * Parses a typed number; accepts a typographic minus and exponents ("1e-3").
 * @returns the number, undefined when empty, or NaN when it is not a number
 */
export function parseNumber(text: string): number | undefined {
  const t = text.trim().replace(/^[−–]/, '-');
  if (t === '') return undefined;
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? Number(t) : NaN;
}

const NOT_A_NUMBER = 'Enter a number, for example 1.5 or 2e-3.';

function readMeasured(
  key: CalcNumericInput,
  f: MeasuredField,
  required: boolean,
  problems: FieldProblem[],
): MeasuredInput | undefined {
  const base = `inputs.${key}`;
  const value = parseNumber(f.value);
  if (value === undefined) {
    if (required) problems.push({ path: `${base}.value`, message: `Enter ${INPUT_LABELS[key].label.toLowerCase()}.` });
    return undefined;
  }
  if (Number.isNaN(value)) return void problems.push({ path: `${base}.value`, message: NOT_A_NUMBER });
  const pos = (path: string, text: string): number | undefined => {
    const x = parseNumber(text);
    if (x === undefined) return undefined;
    if (Number.isNaN(x)) return void problems.push({ path, message: NOT_A_NUMBER });
    if (x < 0) return void problems.push({ path, message: 'An uncertainty cannot be negative.' });
    return x;
  };
  if (f.asymmetric) {
    const minus = pos(`${base}.minus`, f.minus);
    const plus = pos(`${base}.plus`, f.plus);
    if (minus === undefined && plus === undefined) return value;
    if (minus === undefined || plus === undefined) {
      problems.push({
        path: `${base}.${minus === undefined ? 'minus' : 'plus'}`,
        message: 'Give both the lower and the upper uncertainty, or neither.',
      });
      return undefined;
    }
    return { value, minus, plus };
  }
  const sigma = pos(`${base}.sigma`, f.sigma);
  return sigma === undefined || sigma === 0 ? value : { value, sigma };
}

function readNumber(path: string, text: string, problems: FieldProblem[], label: string): number | undefined {
  const x = parseNumber(text);
  if (x === undefined) return undefined;
  if (Number.isNaN(x)) problems.push({ path, message: `${label}: ${NOT_A_NUMBER}` });
  return Number.isNaN(x) ? undefined : x;
}

function readModel(v: CalcFormValues, problems: FieldProblem[]): CalcModel | undefined {
  if (v.model === 'planck18' || v.model === 'wmap9') return { preset: v.model };
  if (v.model === 'hubble') {
    const H0 = readNumber('hubbleH0', v.hubbleH0, problems, 'H₀');
    if (H0 === undefined && !problems.some((p) => p.path === 'hubbleH0'))
      problems.push({ path: 'hubbleH0', message: 'Enter the Hubble constant H₀.' });
    return H0 === undefined ? undefined : { law: 'hubble', H0 };
  }
  const c = v.custom;
  const num = (k: 'H0' | 'Om0' | 'Ode0' | 'Tcmb0' | 'Neff') => readNumber(`custom.${k}`, c[k], problems, k);
  const H0 = num('H0');
  const Om0 = num('Om0');
  if (c.H0.trim() === '') problems.push({ path: 'custom.H0', message: 'Enter the Hubble constant H₀.' });
  if (c.Om0.trim() === '') problems.push({ path: 'custom.Om0', message: 'Enter the matter density Ω_m.' });
  const masses =
    c.m_nu.trim() === ''
      ? undefined
      : c.m_nu
          .split(/[,\s]+/)
          .filter(Boolean)
          .map((t) => parseNumber(t) ?? NaN);
  if (masses?.some(Number.isNaN))
    problems.push({
      path: 'custom.m_nu',
      message: 'List the neutrino masses in eV separated by commas, for example 0, 0, 0.06.',
    });
  if (H0 === undefined || Om0 === undefined) return undefined;
  const optional = { Ode0: num('Ode0'), Tcmb0: num('Tcmb0'), Neff: num('Neff') };
  return {
    ...(c.name.trim() ? { name: c.name.trim() } : {}),
    H0,
    Om0,
    ...Object.fromEntries(Object.entries(optional).filter(([, x]) => x !== undefined)),
    ...(masses && !masses.some(Number.isNaN) ? { m_nu: masses } : {}),
  };
}

/**
 * Builds a request from the form, checking what the browser can check.
 * @param v the form's values
 * @returns the request, or the problems to show on the fields
 */
export function buildRequest(v: CalcFormValues): { request: CalcRequest } | { problems: FieldProblem[] } {
  const problems: FieldProblem[] = [];
  const f = fieldsFor(v.quantity, Number(v.group));
  const inputs: Record<string, MeasuredInput | string> = {};
  for (const key of f.required) {
    const x = readMeasured(key, v.inputs[key], true, problems);
    if (x !== undefined) inputs[key] = x;
  }
  for (const key of f.optional) {
    const x = readMeasured(key, v.inputs[key], false, problems);
    if (x !== undefined) inputs[key] = x;
  }
  if (f.band) inputs.band = v.band;
  const model = f.usesModel ? readModel(v, problems) : undefined;
  let H0_range: CalcRequest['H0_range'];
  if (f.usesModel && (v.h0Low.trim() !== '' || v.h0High.trim() !== '')) {
    const low = readNumber('h0Low', v.h0Low, problems, 'Lowest H₀');
    const high = readNumber('h0High', v.h0High, problems, 'Highest H₀');
    if (low !== undefined && high !== undefined) H0_range = { low, high };
    else if (!problems.some((p) => p.path === 'h0Low' || p.path === 'h0High')) {
      problems.push({ path: low === undefined ? 'h0Low' : 'h0High', message: 'Give both ends of the H₀ range, or neither.' });
    }
  }
  if (problems.length > 0) return { problems };
  const candidate = { quantity: v.quantity, inputs, ...(model ? { model } : {}), ...(H0_range ? { H0_range } : {}) };
  const parsed = CalcRequestSchema.safeParse(candidate);
  if (!parsed.success)
    return { problems: [{ path: 'root', message: parsed.error.issues[0]?.message ?? 'The request is not valid.' }] };
  return { request: parsed.data };
}

/**
 * Finds the form field a server message is about, from the key it names.
 * @param message the engine's message
 * @param v the form's values (to know which model fields are on screen)
 * @returns a field path, or undefined when the message is about the request as a whole
 */
export function fieldForMessage(message: string, v: CalcFormValues): string | undefined {
  const uncertain = /uncertainty on (\w+)/.exec(message)?.[1];
  if (uncertain && (CALC_NUMERIC_INPUTS as readonly string[]).includes(uncertain)) {
    return `inputs.${uncertain}.${v.inputs[uncertain as CalcNumericInput].asymmetric ? 'minus' : 'sigma'}`;
  }
  const first = /^([\w.[\]]+)/.exec(message)?.[1] ?? '';
  if ((CALC_NUMERIC_INPUTS as readonly string[]).includes(first)) return `inputs.${first}.value`;
  if (first === 'band') return 'band';
  if (first.startsWith('H0_range')) return 'h0Low';
  const modelKey = /^model\.(\w+)/.exec(first)?.[1];
  if (modelKey && v.model === 'hubble') return 'hubbleH0';
  if (modelKey && v.model === 'custom') return `custom.${modelKey === 'Ob0' ? 'Om0' : modelKey}`;
  return undefined;
}
