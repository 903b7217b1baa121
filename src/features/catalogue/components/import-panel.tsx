import { useRef, useState } from 'react';
import { IMPORT_FIELD_LABELS, IMPORT_FIELDS, type ImportDto, type ImportMapping } from '@shared/schemas/catalogue-import.ts';
import { useCommitImport, useDryRunImport } from '@/api/imports.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ImportReport } from './import-report.tsx';

/**
 * Choose a CSV file, check it (nothing changes), adjust which column is which, then import every
 * accepted row in one go.
 */
export function ImportPanel() {
  const [file, setFile] = useState<File | null>(null);
  const [checked, setChecked] = useState<ImportDto | null>(null);
  const [mapping, setMapping] = useState<ImportMapping>({});
  const dryRun = useDryRunImport();
  const commit = useCommitImport();
  // Rows the dry run asks to confirm (a negative parallax, a likely sign error) need a yes first.
  const [confirmed, setConfirmed] = useState(false);
  // One commit per dry run: a second click before React re-renders the busy button sends nothing.
  const committing = useRef<string | null>(null);
  const runCommit = (id: string) => {
    if (committing.current === id) return;
    committing.current = id;
    commit.mutate({ id, confirm: confirmed }, { onError: () => (committing.current = null) });
  };

  const check = (withMapping?: ImportMapping) => {
    if (!file) return;
    commit.reset();
    dryRun.mutate(
      { file, mapping: withMapping },
      {
        onSuccess: (result) => {
          setConfirmed(false);
          setChecked(result);
          setMapping(result.report.mapping);
        },
        onError: () => setChecked(null),
      },
    );
  };

  return (
    <div className="space-y-5">
      <section className="rounded-lg border border-rule bg-panel p-5">
        <label htmlFor="import-file" className="mb-1 block text-sm font-medium">
          CSV file (UTF-8, up to 10 MB)
        </label>
        <input
          id="import-file"
          type="file"
          accept=".csv,text/csv"
          onChange={(e) => {
            setFile(e.target.files?.[0] ?? null);
            setChecked(null);
            dryRun.reset();
            commit.reset();
          }}
          className="block text-sm file:mr-3 file:rounded-md file:border file:border-rule file:bg-wash file:px-3 file:py-1.5 file:text-sm"
        />
        <p className="mt-2 text-xs text-muted">
          Columns: object (name or designation), quantity, value, unit, band, uncertainty (or uncertainty_minus and
          uncertainty_plus), source (citation, bibcode or DOI), note. Sources must exist under Sources first.
        </p>
        <Button className="mt-3" onClick={() => check()} disabled={!file} busy={dryRun.isPending}>
          Check file
        </Button>
      </section>

      {dryRun.error && (
        <Notice tone="error" title="The file was not checked">
          {dryRun.error.message}
        </Notice>
      )}

      {checked && checked.status === 'checked' && !commit.isSuccess && (
        <section className="space-y-4" aria-label="Dry run">
          <h2 className="text-lg font-semibold">Dry run: nothing has been imported yet</h2>
          <fieldset className="rounded-lg border border-rule bg-panel p-4">
            <legend className="px-1 text-sm font-medium">Which column is which</legend>
            <div className="grid gap-3 sm:grid-cols-2">
              {IMPORT_FIELDS.map((field) => (
                <label key={field} className="text-sm">
                  <span className="mb-1 block text-muted">{IMPORT_FIELD_LABELS[field]}</span>
                  <select
                    value={mapping[field] ?? ''}
                    onChange={(e) => setMapping({ ...mapping, [field]: e.target.value || undefined })}
                    className="w-full rounded-md border border-rule bg-panel px-2 py-1.5"
                  >
                    <option value="">(not in the file)</option>
                    {checked.report.headers.map((h) => (
                      <option key={h} value={h}>
                        {h}
                      </option>
                    ))}
                  </select>
                </label>
              ))}
            </div>
            <Button variant="secondary" className="mt-3" onClick={() => check(mapping)} busy={dryRun.isPending}>
              Check again with these columns
            </Button>
          </fieldset>
          <ImportReport report={checked.report} />
          {commit.error && (
            <Notice tone="error" title="The import did not go through">
              {commit.error.message}
            </Notice>
          )}
          <div className="flex items-center gap-3">
            <Button onClick={() => runCommit(checked.id)} disabled={checked.report.acceptedCount === 0} busy={commit.isPending}>
              {commit.isPending ? 'Importing…' : `Import ${checked.report.acceptedCount.toLocaleString()} rows`}
            </Button>
            {checked.report.rejectedCount > 0 && (
              <span className="text-sm text-muted">Rejected rows are left out; fix them in the file and import them later.</span>
            )}
          </div>
        </section>
      )}

      {commit.isSuccess && (
        <Notice tone="success" title="Imported">
          {commit.data.insertedCount?.toLocaleString()} measurements were added from {commit.data.report.fileName}, each with its
          history{commit.data.alreadyCommitted ? ' (this file had already been imported once; nothing was added twice)' : ''}.
          None is preferred yet: choose preferred values on each object’s page.
        </Notice>
      )}
    </div>
  );
}
