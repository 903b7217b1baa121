import { useState } from 'react';
import type { StatementDto, StatementTemplateDto } from '@shared/schemas/statement.ts';
import type { StatementLocale } from '@shared/statements/locales.ts';
import { useCreateStatement, useStatementTemplates } from '@/api/statements.ts';
import { VenueChoiceField } from '@/components/statements/venue-choice-field.tsx';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ObjectPicker } from './object-picker.tsx';
import { fitPhrase, type PhraseFit, type ReplacingContext } from './phrase-fit.ts';

const needsLine = (t: StatementTemplateDto) =>
  `Needs ${t.needs}${t.usesCosmology ? ' · uses the adopted cosmology' : ''}${t.followsTonight ? ' · follows the venue’s night' : ''}`;

/** Phrase forms first when replacing a number inside a sentence (they fit it); otherwise sentences only first. */
function orderForReplacing(templates: StatementTemplateDto[], replacing: boolean) {
  if (!replacing) return templates;
  return [...templates.filter((t) => t.phraseOf), ...templates.filter((t) => !t.phraseOf)];
}

/**
 * Inserts a checked statement: choose the object (the page's, by default), then a template, and for
 * a template about tonight's sky the venue. The server works it out at once; when it cannot, the
 * reason is shown (which measurement is missing, or that the object is not a planet). Replacing a
 * hand-typed number inside a sentence, the phrase forms come first, and the paragraph as it will
 * read is shown before anything is replaced.
 */
export function StatementPicker({
  defaultObject,
  locale,
  replacing,
  onPick,
  onClose,
}: {
  defaultObject: { id: string; name: string; kind?: string };
  locale: StatementLocale;
  replacing?: ReplacingContext;
  onPick: (statementId: string, fit?: PhraseFit) => void;
  onClose: () => void;
}) {
  // The statement worked out for a replacement, waiting for the writer to accept the preview.
  const [pending, setPending] = useState<StatementDto | null>(null);
  const [objectId, setObjectId] = useState(defaultObject.id);
  const [objectName, setObjectName] = useState(defaultObject.name);
  const [objectKind, setObjectKind] = useState(defaultObject.kind);
  const [changingObject, setChangingObject] = useState(false);
  // The template waiting for its venue, and the venue chosen for it.
  const [venueFor, setVenueFor] = useState<StatementTemplateDto | null>(null);
  const [venueId, setVenueId] = useState('');
  const templates = useStatementTemplates();
  const create = useCreateStatement();
  const work = (templateId: string, venue?: string) =>
    create.mutate(
      { objectId, templateId, ...(venue ? { venueId: venue } : {}) },
      { onSuccess: (s) => (replacing ? setPending(s) : onPick(s.id)) },
    );
  const words = pending?.texts?.[locale] ?? null;
  const fit = replacing && words ? fitPhrase(replacing, words) : null;
  if (replacing && pending)
    return (
      <div
        role="dialog"
        aria-label="Check the sentence"
        className="space-y-4 rounded-lg border border-accent/40 bg-panel p-4 shadow-lg"
      >
        <h2 className="font-semibold">Your sentence will read</h2>
        {fit ? (
          <p
            className="rounded-md border border-rule bg-wash p-3 font-serif text-base [overflow-wrap:anywhere]"
            data-testid="replace-preview"
          >
            {fit.preview.before}
            <mark className="rounded bg-accent/15 px-0.5 text-ink">{fit.preview.statement}</mark>
            {fit.preview.after}
          </p>
        ) : (
          <Notice tone="warning" title="No wording yet">
            This statement has no wording in this page’s language: {pending.statusReason ?? 'it cannot be worked out now'}.
          </Notice>
        )}
        <p className="text-xs text-muted">
          The highlighted words are a checked statement: they are recomputed when the data changes and reviewed like any other.{' '}
          {pending.template.title}.
        </p>
        <div className="flex flex-wrap gap-2">
          <Button disabled={!fit} onClick={() => onPick(pending.id, fit ?? undefined)}>
            Replace “{replacing.text}”
          </Button>
          <Button variant="secondary" onClick={() => setPending(null)}>
            Choose another
          </Button>
        </div>
      </div>
    );
  return (
    <div
      role="dialog"
      aria-label="Insert a statement"
      className="space-y-4 rounded-lg border border-accent/40 bg-panel p-4 shadow-lg"
    >
      <div className="flex items-start justify-between gap-3">
        <div>
          <h2 className="font-semibold">{replacing ? `Replace “${replacing.text}” with a statement` : 'Insert a statement'}</h2>
          <p className="text-xs text-muted">
            The number is worked out by the server from the catalogue and stays correct when the data changes.
          </p>
        </div>
        <Button variant="quiet" onClick={onClose} aria-label="Close">
          Close
        </Button>
      </div>
      <div className="text-sm">
        About <strong>{objectName}</strong>{' '}
        <button type="button" className="text-accent hover:underline" onClick={() => setChangingObject((v) => !v)}>
          {changingObject ? 'keep this object' : 'choose another object'}
        </button>
      </div>
      {changingObject && (
        <ObjectPicker
          value={objectId}
          valueLabel={objectName}
          onChange={(id, name, kind) => {
            setObjectId(id);
            setObjectName(name.split(' · ')[0]);
            setObjectKind(kind);
            create.reset();
          }}
        />
      )}
      <fieldset className="space-y-1.5">
        <legend className="mb-1 text-sm font-medium">Statement</legend>
        {/* Only the templates valid for this kind of object (the server refuses the others, saying why). */}
        {orderForReplacing(templates.data ?? [], !!replacing)
          // Phrase forms only replace a number inside a sentence; a new statement of its own is a sentence.
          .filter((t) => (!objectKind || t.kinds.includes(objectKind)) && (replacing || !t.phraseOf))
          .map((t) =>
            venueFor?.id === t.id ? (
              <form
                key={t.id}
                className="space-y-2 rounded-md border border-accent px-3 py-2"
                onSubmit={(e) => {
                  e.preventDefault();
                  if (venueId) work(t.id, venueId);
                }}
              >
                <span className="block text-sm font-medium">{t.title}</span>
                <span className="block text-xs text-muted">{needsLine(t)}</span>
                <div className="flex flex-wrap items-end gap-2">
                  <VenueChoiceField
                    value={venueId}
                    onChange={(id) => {
                      setVenueId(id);
                      create.reset();
                    }}
                    className="min-w-64"
                  />
                  <Button type="submit" disabled={!venueId} busy={create.isPending}>
                    Work it out
                  </Button>
                  <Button type="button" variant="quiet" onClick={() => setVenueFor(null)}>
                    Back
                  </Button>
                </div>
              </form>
            ) : (
              <button
                key={t.id}
                type="button"
                disabled={create.isPending}
                onClick={() => {
                  create.reset();
                  if (t.needsVenue) setVenueFor(t);
                  else work(t.id);
                }}
                className="block w-full rounded-md border border-rule px-3 py-2 text-left text-sm hover:border-accent disabled:opacity-60"
              >
                <span className="font-medium">{t.title}</span>
                {replacing && (
                  <span className={`ml-2 text-xs ${t.phraseOf ? 'text-ok' : 'text-muted'}`}>
                    {t.phraseOf ? 'fits inside your sentence' : 'a whole sentence'}
                  </span>
                )}
                <span className="block text-xs text-muted">
                  {needsLine(t)}
                  {t.needsVenue ? ' · choose the venue next' : ''}
                </span>
              </button>
            ),
          )}
      </fieldset>
      {create.error && (
        <Notice tone="warning" title="This statement cannot be worked out">
          {create.error.message}
        </Notice>
      )}
    </div>
  );
}
