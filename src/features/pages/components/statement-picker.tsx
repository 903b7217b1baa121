import { useState } from 'react';
import type { StatementTemplateDto } from '@shared/schemas/statement.ts';
import { useCreateStatement, useStatementTemplates } from '@/api/statements.ts';
import { VenueChoiceField } from '@/components/statements/venue-choice-field.tsx';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ObjectPicker } from './object-picker.tsx';

const needsLine = (t: StatementTemplateDto) =>
  `Needs ${t.needs}${t.usesCosmology ? ' · uses the adopted cosmology' : ''}${t.followsTonight ? ' · follows the venue’s night' : ''}`;

/**
 * Inserts a checked statement: choose the object (the page's, by default), then a template, and for
 * a template about tonight's sky the venue. The server works it out at once; when it cannot, the
 * reason is shown (which measurement is missing, or that the object is not a planet).
 */
export function StatementPicker({
  defaultObject,
  replacing,
  onPick,
  onClose,
}: {
  defaultObject: { id: string; name: string; kind?: string };
  replacing?: string;
  onPick: (statementId: string) => void;
  onClose: () => void;
}) {
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
    create.mutate({ objectId, templateId, ...(venue ? { venueId: venue } : {}) }, { onSuccess: (s) => onPick(s.id) });
  return (
    <div
      role="dialog"
      aria-label="Insert a statement"
      className="space-y-4 rounded-lg border border-accent/40 bg-panel p-4 shadow-lg"
    >
      <div className="flex items-start justify-between gap-3">
        <div>
          <h2 className="font-semibold">{replacing ? `Replace “${replacing}” with a statement` : 'Insert a statement'}</h2>
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
        {(templates.data ?? [])
          .filter((t) => !objectKind || t.kinds.includes(objectKind))
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
