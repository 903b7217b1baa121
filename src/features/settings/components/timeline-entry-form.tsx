import { useState } from 'react';
import { TimelineEntryCreateSchema, type TimelineEntryCreateInput, type TimelineEntryDto } from '@shared/schemas/timeline.ts';
import { LOCALE_LABELS, STATEMENT_LOCALES, type StatementLocale } from '@shared/statements/locales.ts';
import { useCreateTimelineEntry, useUpdateTimelineEntry } from '@/api/timeline.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ApiRequestError } from '@/lib/api-client.ts';
import { yearsAgoInWords } from './timeline-years.ts';

type Draft = Record<'label' | 'yearsAgo' | 'uncertaintyYears' | 'sourceCitation' | 'sourceUrl' | 'note', string> & {
  relation: 'around' | 'before';
  phrases: Record<StatementLocale, string>;
};

const empty: Draft = {
  label: '',
  yearsAgo: '',
  uncertaintyYears: '',
  relation: 'around',
  phrases: { 'en-GB': '', 'en-US': '', 'fr-FR': '' },
  sourceCitation: '',
  sourceUrl: '',
  note: '',
};

const fromEntry = (e: TimelineEntryDto): Draft => ({
  label: e.label,
  yearsAgo: String(e.yearsAgo),
  uncertaintyYears: String(e.uncertaintyYears),
  relation: e.relation,
  phrases: { ...empty.phrases, ...e.phrases },
  sourceCitation: e.sourceCitation,
  sourceUrl: e.sourceUrl ?? '',
  note: e.note ?? '',
});

const asNumber = (s: string) => Number(s.replaceAll(/[\s,_]/g, ''));

/**
 * Adds or changes a timeline entry: its date and uncertainty in years, how the sentence relates to
 * it, its wording in every language and its published source. The server's messages appear under
 * the field they are about.
 */
export function TimelineEntryForm({ entry, onDone }: { entry?: TimelineEntryDto; onDone: () => void }) {
  const [draft, setDraft] = useState<Draft>(entry ? fromEntry(entry) : empty);
  const create = useCreateTimelineEntry();
  const update = useUpdateTimelineEntry();
  const mutation = entry ? update : create;
  // The shared schema checks the form here first (the server checks it again), so mistakes show at once.
  const [local, setLocal] = useState<Record<string, string>>({});
  const error = mutation.error;
  const fields = { ...(error instanceof ApiRequestError ? (error.fields ?? {}) : {}), ...local };
  const set = (patch: Partial<Draft>) => {
    mutation.reset();
    setLocal({});
    setDraft((d) => ({ ...d, ...patch }));
  };
  const years = asNumber(draft.yearsAgo);
  const spread = asNumber(draft.uncertaintyYears);
  const submit = (e: React.FormEvent) => {
    e.preventDefault();
    const input: TimelineEntryCreateInput = {
      label: draft.label,
      yearsAgo: draft.yearsAgo as unknown as number,
      uncertaintyYears: draft.uncertaintyYears as unknown as number,
      relation: draft.relation,
      phrases: draft.phrases,
      sourceCitation: draft.sourceCitation,
      sourceUrl: draft.sourceUrl || null,
      note: draft.note || null,
    };
    const checked = TimelineEntryCreateSchema.safeParse(input);
    if (!checked.success) {
      const found: Record<string, string> = {};
      for (const issue of checked.error.issues) found[issue.path.join('.')] ??= issue.message;
      setLocal(found);
      return;
    }
    if (entry) update.mutate({ id: entry.id, input }, { onSuccess: onDone });
    else create.mutate(input, { onSuccess: onDone });
  };
  return (
    <form
      onSubmit={submit}
      className="space-y-4 rounded-lg border border-accent/40 bg-panel p-4"
      aria-label={entry ? 'Change the entry' : 'New entry'}
    >
      <TextField
        label="Short name (for staff)"
        value={draft.label}
        error={fields.label}
        onChange={(e) => set({ label: e.target.value })}
      />
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Date (years ago)"
          inputMode="decimal"
          value={draft.yearsAgo}
          error={fields.yearsAgo}
          hint={Number.isFinite(years) && years > 0 ? `${yearsAgoInWords(years)} ago` : 'For example 66000000 or 4.5673e9'}
          onChange={(e) => set({ yearsAgo: e.target.value })}
        />
        <TextField
          label="Uncertainty (± years, as the source gives it)"
          inputMode="decimal"
          value={draft.uncertaintyYears}
          error={fields.uncertaintyYears}
          hint={Number.isFinite(spread) && spread > 0 ? `± ${yearsAgoInWords(spread)}` : undefined}
          onChange={(e) => set({ uncertaintyYears: e.target.value })}
        />
      </div>
      <SelectField
        label="The light set out …"
        value={draft.relation}
        error={fields.relation}
        onChange={(e) => set({ relation: e.target.value as Draft['relation'] })}
      >
        <option value="around">around the time of this event (the dates must overlap)</option>
        <option value="before">before this event (the whole light-travel interval is older)</option>
      </SelectField>
      <fieldset className="space-y-3">
        <legend className="text-sm font-medium">Wording after the time, in each language (no full stop)</legend>
        {STATEMENT_LOCALES.map((l) => (
          <TextField
            key={l}
            label={LOCALE_LABELS[l]}
            value={draft.phrases[l]}
            error={fields[`phrases.${l}`]}
            hint={
              l === 'fr-FR'
                ? '« … est partie il y a environ 2,5 millions d’années, <votre texte>. »'
                : '“… set out about 2.5 million years ago, <your words>.”'
            }
            onChange={(e) => set({ phrases: { ...draft.phrases, [l]: e.target.value } })}
          />
        ))}
      </fieldset>
      <TextField
        label="Published source of the date"
        value={draft.sourceCitation}
        error={fields.sourceCitation}
        hint="A chart with its version, or a paper: journal, volume, page, year."
        onChange={(e) => set({ sourceCitation: e.target.value })}
      />
      <TextField
        label="Source address (optional)"
        value={draft.sourceUrl}
        error={fields.sourceUrl}
        onChange={(e) => set({ sourceUrl: e.target.value })}
      />
      <TextField
        label="Note (optional)"
        value={draft.note}
        error={fields.note}
        hint="How the value was taken from the source, e.g. the middle of a range."
        onChange={(e) => set({ note: e.target.value })}
      />
      {error && !Object.keys(fields).length && <Notice tone="error">{error.message}</Notice>}
      {Object.keys(fields).length > 0 && <Notice tone="error">Check the fields marked above.</Notice>}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={mutation.isPending}>
          {entry ? 'Save the entry' : 'Add the entry'}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
      <p className="text-xs text-muted">
        Saving recomputes every “when the light set out” statement; changed wording goes to a reviewer.
      </p>
    </form>
  );
}
