import { useState } from 'react';
import type { CalcModel } from '@shared/schemas/calc.ts';
import { SelectField, TextField } from '@/components/ui/field.tsx';

type Kind = 'planck18' | 'wmap9' | 'hubble' | 'custom';

/** Picks a cosmology: a preset, the classroom Hubble law, or a custom FLRW model. */
export function ModelChooser({ onChange }: { onChange: (model: CalcModel | null) => void }) {
  const [kind, setKind] = useState<Kind>('planck18');
  const [values, setValues] = useState({ H0: '70', Om0: '0.3', Ode0: '0.7', Tcmb0: '2.7255' });
  const emit = (k: Kind, v: typeof values) => {
    const num = (s: string) => (s.trim() === '' ? undefined : Number(s));
    if (k === 'planck18' || k === 'wmap9') return onChange({ preset: k });
    const H0 = num(v.H0);
    if (H0 === undefined || Number.isNaN(H0)) return onChange(null);
    if (k === 'hubble') return onChange({ law: 'hubble', H0 });
    const Om0 = num(v.Om0);
    if (Om0 === undefined || Number.isNaN(Om0)) return onChange(null);
    const Ode0 = num(v.Ode0);
    const Tcmb0 = num(v.Tcmb0);
    onChange({ H0, Om0, ...(Ode0 !== undefined ? { Ode0 } : {}), ...(Tcmb0 !== undefined ? { Tcmb0 } : {}) });
  };
  const field = (key: keyof typeof values, label: string, hint?: string) => (
    <TextField
      label={label}
      inputMode="decimal"
      value={values[key]}
      hint={hint}
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
      {(kind === 'hubble' || kind === 'custom') && field('H0', 'H0 (km/s/Mpc)')}
      {kind === 'custom' && field('Om0', 'Ωm (matter today)')}
      {kind === 'custom' && field('Ode0', 'ΩΛ (dark energy today)', 'Leave empty for a flat model.')}
      {kind === 'custom' && field('Tcmb0', 'CMB temperature (K)', 'Set to 0 to leave radiation out.')}
    </div>
  );
}
