import { useState } from 'react';
import type { SettingsDto, SpectralIndexDefaults } from '@shared/schemas/settings.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { useUpdateSettings } from '@/api/settings.ts';

/** The kinds met at redshifts where the K-correction matters (stars and nebulae are never that far). */
const KINDS = [
  { kind: 'quasar', label: 'Quasars' },
  { kind: 'galaxy', label: 'Galaxies' },
] as const;

const text = (n: number | null | undefined) => (n === null || n === undefined ? '' : String(n));

/**
 * Default spectral index per object kind, each with its source. A statement about an object with no
 * measured spectral index, at a redshift where the K-correction moves the result by more than its own
 * uncertainty, uses the default as a stated assumption (the working shows it); without a default it
 * asks for the measurement. Saving recomputes every statement.
 */
export function SpectralIndexDefaultsForm({ settings }: { settings: SettingsDto }) {
  const update = useUpdateSettings();
  const [saved, setSaved] = useState(false);
  const [problem, setProblem] = useState<string>();
  return (
    <form
      className="space-y-4"
      aria-label="Default spectral indices"
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(false);
        setProblem(undefined);
        const data = new FormData(e.currentTarget);
        const defaults: SpectralIndexDefaults = {};
        for (const { kind, label } of KINDS) {
          const value = String(data.get(`${kind}-value`) ?? '')
            .trim()
            .replace('−', '-');
          const sigma = String(data.get(`${kind}-sigma`) ?? '').trim();
          const source = String(data.get(`${kind}-source`) ?? '').trim();
          if (value === '' && source === '') continue;
          if (value === '' || Number.isNaN(Number(value)))
            return setProblem(`${label}: enter the spectral index as a number, e.g. −0.44.`);
          if (source.length < 5) return setProblem(`${label}: name the source of the default (a paper or handbook).`);
          defaults[kind] = { value: Number(value), sigma: sigma === '' ? null : Number(sigma), source };
        }
        update.mutate({ spectralIndexDefaults: defaults }, { onSuccess: () => setSaved(true) });
      }}
    >
      {KINDS.map(({ kind, label }) => {
        const d = settings.spectralIndexDefaults[kind];
        return (
          <fieldset key={kind} className="grid gap-3 sm:grid-cols-[9rem_11rem_1fr] sm:items-end">
            <legend className="mb-1 text-sm font-medium">{label}</legend>
            <TextField label="α (f_ν ∝ ν^α)" name={`${kind}-value`} inputMode="decimal" defaultValue={text(d?.value)} />
            <TextField label="Spread (1σ, optional)" name={`${kind}-sigma`} inputMode="decimal" defaultValue={text(d?.sigma)} />
            <TextField label="Source" name={`${kind}-source`} defaultValue={d?.source ?? ''} placeholder="Paper or handbook" />
          </fieldset>
        );
      })}
      {problem && <Notice tone="error">{problem}</Notice>}
      {update.error && <Notice tone="error">{update.error.message}</Notice>}
      {saved && update.isSuccess && <Notice tone="success">Saved. Every statement is being recomputed.</Notice>}
      <Button type="submit" busy={update.isPending}>
        Save spectral indices
      </Button>
    </form>
  );
}
