import { useState } from 'react';
import type { CalcModel } from '@shared/schemas/calc.ts';
import { MODEL_FIELD_LABELS, modelProblems, type ModelField } from '@shared/schemas/cosmology-check.ts';
import { SelectField, TextField } from '@/components/ui/field.tsx';

type Kind = 'planck18' | 'wmap9' | 'hubble' | 'custom';
type Values = Record<ModelField, string>;

/** Reads a typed number ('' → none; the typographic minus and a decimal comma are accepted). */
const readField = (text: string): number | undefined | 'invalid' => {
  const t = text
    .trim()
    .replace(/\u2212/g, '-')
    .replace(',', '.');
  if (t === '') return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n : 'invalid';
};

/**
 * The model the fields describe, or the reason per field it cannot be adopted: text that is not a
 * number, then the shared check the server runs too (so the words here are the server's words).
 */
function modelOf(kind: Kind, v: Values): { model: CalcModel | null; problems: Partial<Record<ModelField, string>> } {
  if (kind === 'planck18' || kind === 'wmap9') return { model: { preset: kind }, problems: {} };
  const fields: ModelField[] = kind === 'hubble' ? ['H0'] : ['H0', 'Om0', 'Ode0', 'Tcmb0'];
  const problems: Partial<Record<ModelField, string>> = {};
  const read: Partial<Record<ModelField, number>> = {};
  for (const f of fields) {
    const n = readField(v[f]);
    if (n === 'invalid') problems[f] = `${MODEL_FIELD_LABELS[f]}: “${v[f].trim()}” is not a number; write it like 67.7 or 0.31.`;
    else if (n === undefined && (f === 'H0' || f === 'Om0')) problems[f] = `${MODEL_FIELD_LABELS[f]}: enter a value.`;
    else if (n !== undefined) read[f] = n;
  }
  if (Object.keys(problems).length > 0) return { model: null, problems };
  const model: CalcModel =
    kind === 'hubble'
      ? { law: 'hubble', H0: read.H0! }
      : {
          H0: read.H0!,
          Om0: read.Om0!,
          ...(read.Ode0 !== undefined ? { Ode0: read.Ode0 } : {}),
          ...(read.Tcmb0 !== undefined ? { Tcmb0: read.Tcmb0 } : {}),
        };
  const found = modelProblems(model);
  return Object.keys(found).length > 0 ? { model: null, problems: found } : { model, problems: {} };
}

/**
 * Picks a cosmology: a preset, the classroom Hubble law, or a custom FLRW model. A custom model that
 * cannot be adopted says which field is wrong and why, as it is typed; `serverErrors` (the API's
 * `fields`, keyed `model.H0`…) are shown on the same fields.
 */
export function ModelChooser({
  onChange,
  serverErrors,
}: {
  onChange: (model: CalcModel | null) => void;
  serverErrors?: Record<string, string>;
}) {
  const [kind, setKind] = useState<Kind>('planck18');
  const [values, setValues] = useState<Values>({ H0: '70', Om0: '0.3', Ode0: '0.7', Tcmb0: '2.7255' });
  const [problems, setProblems] = useState<Partial<Record<ModelField, string>>>({});
  const emit = (k: Kind, v: Values) => {
    const result = modelOf(k, v);
    setProblems(result.problems);
    onChange(result.model);
  };
  const field = (key: ModelField, hint?: string) => (
    <TextField
      label={MODEL_FIELD_LABELS[key]}
      inputMode="decimal"
      value={values[key]}
      hint={hint}
      error={problems[key] ?? serverErrors?.[`model.${key}`]}
      onChange={(e) => {
        const next = { ...values, [key]: e.target.value };
        setValues(next);
        emit(kind, next);
      }}
    />
  );
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <SelectField
        label="Model"
        value={kind}
        onChange={(e) => {
          const k = e.target.value as Kind;
          setKind(k);
          emit(k, values);
        }}
        className="sm:col-span-2"
      >
        <option value="planck18">Planck 2018 (flat ΛCDM)</option>
        <option value="wmap9">WMAP nine-year (flat ΛCDM)</option>
        <option value="hubble">Simple Hubble law d = cz/H0 (classroom model, small z only)</option>
        <option value="custom">Custom FLRW model</option>
      </SelectField>
      {(kind === 'hubble' || kind === 'custom') && field('H0')}
      {kind === 'custom' && field('Om0')}
      {kind === 'custom' && field('Ode0', 'Leave empty for a flat model.')}
      {kind === 'custom' && field('Tcmb0', 'Set to 0 to leave radiation out.')}
    </div>
  );
}
