import { useState } from 'react';
import type { CalcModel } from '@shared/schemas/calc.ts';
import { SOLAR_MAGNITUDES } from '@shared/engine/solar-magnitudes.ts';
import { LOCALE_LABELS, STATEMENT_LOCALES, type StatementLocale } from '@shared/statements/locales.ts';
import { useChangeCosmology, usePreviewCosmology, useSettings, useUpdateSettings } from '@/api/settings.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { CosmologyPreviewTable } from '@/features/settings/components/cosmology-preview-table.tsx';
import { H0RangeForm } from '@/features/settings/components/h0-range-form.tsx';
import { ModelChooser } from '@/features/settings/components/model-chooser.tsx';
import { SpectralIndexDefaultsForm } from '@/features/settings/components/spectral-index-defaults.tsx';
import { ApiRequestError } from '@/lib/api-client.ts';

/** Organisation defaults: the adopted cosmology (previewed before switching), band, locale, eye-safety notice. */
export function Component() {
  const settings = useSettings();
  const preview = usePreviewCosmology();
  const change = useChangeCosmology();
  const update = useUpdateSettings();
  const [model, setModel] = useState<CalcModel | null>({ preset: 'planck18' });
  const [notice, setNotice] = useState<string>();
  if (settings.isPending) return <p className="text-sm text-muted">Loading…</p>;
  if (settings.error) return <Notice tone="error">{settings.error.message}</Notice>;
  const s = settings.data;
  // The server checks the model with the same shared schema; its field messages go on the fields.
  const modelError = [preview.error, change.error].find((e) => e instanceof ApiRequestError && e.fields);
  const serverErrors = modelError instanceof ApiRequestError ? modelError.fields : undefined;

  return (
    <>
      <PageHeader
        title="Organisation"
        description="Defaults every statement and page uses. Changing the cosmology recomputes every statement; you see what would change first."
      />
      <div className="space-y-8">
        <section aria-labelledby="cosmology-heading" className="space-y-4 rounded-lg border border-rule bg-panel p-6">
          <h2 id="cosmology-heading" className="text-lg font-semibold">
            Adopted cosmology
          </h2>
          <p className="text-sm">
            Now: <strong>{s.cosmologyLabel}</strong>
          </p>
          <ModelChooser
            serverErrors={serverErrors}
            onChange={(m) => {
              setModel(m);
              preview.reset();
              change.reset();
            }}
          />
          <div className="flex flex-wrap items-center gap-2">
            <Button
              variant="secondary"
              disabled={!model}
              busy={preview.isPending}
              onClick={() => {
                if (!model) return;
                // A new preview starts a new decision: the last switch's "Switched." no longer applies.
                change.reset();
                preview.mutate(model);
              }}
            >
              Preview the change
            </Button>
            {!model && <span className="text-sm text-broken">Correct the field marked above to preview this model.</span>}
            {preview.data && model && (
              <Button
                busy={change.isPending}
                onClick={() =>
                  change.mutate({ model, expectedVersion: preview.data.version }, { onSuccess: () => preview.reset() })
                }
              >
                Switch to {preview.data.proposedLabel}
              </Button>
            )}
          </div>
          {preview.error && !serverErrors && <Notice tone="error">{preview.error.message}</Notice>}
          {change.error && !serverErrors && <Notice tone="error">{change.error.message}</Notice>}
          {change.isSuccess && (
            <Notice tone="success">
              Switched. Every statement is being recomputed in the background; changed wording waits for a reviewer.
            </Notice>
          )}
          {preview.data && (
            <>
              <p className="text-sm text-muted">
                {preview.data.rows.length === 0
                  ? `None of the ${preview.data.checked} statements that depend on the cosmology would change their wording.`
                  : `${preview.data.rows.length} of ${preview.data.checked} statements that depend on the cosmology would change. Nothing changes until you switch.`}
              </p>
              {preview.data.rows.length > 0 && <CosmologyPreviewTable rows={preview.data.rows} />}
            </>
          )}
        </section>

        <section aria-labelledby="defaults-heading" className="space-y-4 rounded-lg border border-rule bg-panel p-6">
          <h2 id="defaults-heading" className="text-lg font-semibold">
            Band, locale and eye-safety notice
          </h2>
          <form
            className="space-y-4"
            onSubmit={(e) => {
              e.preventDefault();
              const data = new FormData(e.currentTarget);
              update.mutate(
                {
                  defaultBand: String(data.get('band')),
                  defaultLocale: String(data.get('locale')) as StatementLocale,
                  eyeSafetyNotice: String(data.get('notice')),
                },
                { onSuccess: () => setNotice('Saved.') },
              );
            }}
          >
            <div className="grid gap-4 sm:grid-cols-2">
              <SelectField label="Band for brightness statements" name="band" defaultValue={s.defaultBand}>
                {Object.values(SOLAR_MAGNITUDES).map((b) => (
                  <option key={b.band} value={b.band}>
                    {b.label} ({b.system})
                  </option>
                ))}
              </SelectField>
              <SelectField label="Locale of the staff screens" name="locale" defaultValue={s.defaultLocale}>
                {STATEMENT_LOCALES.map((l) => (
                  <option key={l} value={l}>
                    {LOCALE_LABELS[l]}
                  </option>
                ))}
              </SelectField>
            </div>
            <div>
              <label htmlFor="notice" className="mb-1 block text-sm font-medium">
                Eye-safety notice (shown on pages about the Sun, eclipses and solar observing)
              </label>
              <textarea
                id="notice"
                name="notice"
                rows={4}
                defaultValue={s.eyeSafetyNotice}
                className="block w-full rounded-md border border-rule bg-panel px-3 py-2 font-serif text-[15px]"
              />
              <p className="mt-1 text-xs text-muted">
                Write it with your venue’s safety staff; they have the last word on solar observing at your events.
              </p>
            </div>
            {update.error && <Notice tone="error">{update.error.message}</Notice>}
            {notice && update.isSuccess && <Notice tone="success">{notice}</Notice>}
            <Button type="submit" busy={update.isPending}>
              Save defaults
            </Button>
          </form>
        </section>

        <section aria-labelledby="h0-range-heading" className="space-y-4 rounded-lg border border-rule bg-panel p-6">
          <h2 id="h0-range-heading" className="text-lg font-semibold">
            H0 range (the cosmology’s own uncertainty)
          </h2>
          <p className="text-sm text-muted">
            Measurements of the expansion rate today disagree a little; distances worked out from a redshift carry that spread as
            their model uncertainty. Give the range of H0 your organisation accepts, with where it comes from.
          </p>
          <H0RangeForm settings={s} />
        </section>

        <section aria-labelledby="spectral-heading" className="space-y-4 rounded-lg border border-rule bg-panel p-6">
          <h2 id="spectral-heading" className="text-lg font-semibold">
            Default spectral indices (K-correction)
          </h2>
          <p className="text-sm text-muted">
            Far away, the light we measure in a band left the object at shorter wavelengths; the K-correction for that needs the
            object’s spectral index. Without a measured one, a brightness or light-output statement beyond the redshift where this
            matters asks for it — unless you name a default here, with its source. Statements that use a default say so in their
            working. Leave a kind empty to always ask.
          </p>
          <SpectralIndexDefaultsForm settings={s} />
        </section>
      </div>
    </>
  );
}
