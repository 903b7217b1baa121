import { useFormContext, useWatch } from 'react-hook-form';
import { PRESETS } from '@shared/engine/cosmology/presets.ts';
import { TextField } from '@/components/ui/field.tsx';
import type { CalcFormValues, ModelChoice } from '../form-request.ts';

const presetLine = (name: 'planck18' | 'wmap9') => {
  const p = PRESETS[name].params;
  return `Flat ΛCDM · H₀ ${p.H0} km/s/Mpc · Ω_m ${p.Om0}`;
};

const CHOICES: ReadonlyArray<{ value: ModelChoice; title: string; line: string }> = [
  { value: 'planck18', title: 'Planck 2018', line: `${presetLine('planck18')} · Planck Collaboration (2020)` },
  { value: 'wmap9', title: 'WMAP nine-year', line: `${presetLine('wmap9')} · Hinshaw et al. (2013)` },
  { value: 'custom', title: 'Custom FLRW model', line: 'Your own H₀ and densities, with radiation and neutrinos if wanted' },
  {
    value: 'hubble',
    title: 'Simple Hubble law',
    line: 'd = cz/H₀ · a classroom model that holds only for small redshifts (within 3 % below z ≈ 0.024)',
  },
];

/**
 * Chooses the cosmology model: a preset, a custom FLRW model, or the simple
 * Hubble law; and an optional 68 % range of H0.
 * @param props.flrwOnly the quantity is not defined under the simple Hubble law
 */
export function ModelPicker({ flrwOnly }: { flrwOnly: boolean }) {
  const { register, control, formState } = useFormContext<CalcFormValues>();
  const model = useWatch({ control, name: 'model' });
  const e = formState.errors;
  return (
    <fieldset className="space-y-4">
      <legend className="mb-2 text-sm font-semibold text-ink">Cosmology model</legend>
      <div className="grid gap-2 sm:grid-cols-2">
        {CHOICES.map((c) => {
          const disabled = flrwOnly && c.value === 'hubble';
          return (
            <label
              key={c.value}
              className={`flex gap-3 rounded-md border px-3 py-2.5 text-sm ${
                model === c.value ? 'border-accent bg-accent/5' : 'border-rule bg-panel'
              } ${disabled ? 'cursor-not-allowed opacity-60' : 'cursor-pointer hover:border-accent'}`}
            >
              <input type="radio" value={c.value} disabled={disabled} className="mt-1 accent-accent" {...register('model')} />
              <span>
                <span className="block font-medium text-ink">{c.title}</span>
                <span className="block text-xs leading-5 text-muted">
                  {disabled ? 'Not available: this quantity needs a cosmology model.' : c.line}
                </span>
              </span>
            </label>
          );
        })}
      </div>

      {model === 'custom' && (
        <div className="grid gap-3 rounded-md border border-rule bg-wash/60 p-3 sm:grid-cols-4">
          <TextField
            label="Name"
            hint="Optional; shown in the working."
            autoComplete="off"
            className="sm:col-span-2"
            {...register('custom.name')}
          />
          <TextField label="H₀ (km/s/Mpc)" inputMode="decimal" error={e.custom?.H0?.message} {...register('custom.H0')} />
          <TextField label="Ω_m, matter" inputMode="decimal" error={e.custom?.Om0?.message} {...register('custom.Om0')} />
          <TextField
            label="Ω_Λ, dark energy"
            inputMode="decimal"
            hint="Empty: flat model."
            error={e.custom?.Ode0?.message}
            {...register('custom.Ode0')}
          />
          <TextField
            label="T_CMB (K)"
            inputMode="decimal"
            hint="Empty or 0: no radiation."
            error={e.custom?.Tcmb0?.message}
            {...register('custom.Tcmb0')}
          />
          <TextField
            label="N_eff"
            inputMode="decimal"
            hint="Empty: 3.04."
            error={e.custom?.Neff?.message}
            {...register('custom.Neff')}
          />
          <TextField
            label="m_ν (eV)"
            hint="One mass per species, e.g. 0, 0, 0.06."
            autoComplete="off"
            error={e.custom?.m_nu?.message}
            {...register('custom.m_nu')}
          />
        </div>
      )}
      {model === 'hubble' && (
        <div className="grid gap-3 sm:grid-cols-4">
          <TextField
            label="H₀ for the Hubble law (km/s/Mpc)"
            inputMode="decimal"
            className="sm:col-span-2"
            error={e.hubbleH0?.message}
            {...register('hubbleH0')}
          />
        </div>
      )}

      <div>
        <p className="mb-1 text-sm font-medium text-ink">
          Range of H₀ <span className="font-normal text-muted">(optional, 68 %, km/s/Mpc)</span>
        </p>
        <div className="flex items-start gap-2">
          <TextField label="Lowest H₀" inputMode="decimal" className="w-32" error={e.h0Low?.message} {...register('h0Low')} />
          <TextField label="Highest H₀" inputMode="decimal" className="w-32" error={e.h0High?.message} {...register('h0High')} />
        </div>
        <p className="mt-1 text-xs text-muted">
          Widens the interval for the uncertainty in the Hubble constant; the model’s H₀ must lie inside it.
        </p>
      </div>
    </fieldset>
  );
}
