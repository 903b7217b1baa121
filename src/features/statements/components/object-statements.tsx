import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useCreateStatement, useStatements, useStatementTemplates } from '@/api/statements.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { VenueChoiceField } from '@/components/statements/venue-choice-field.tsx';
import { venueNightText } from '@/components/statements/venue-night.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';

/**
 * An object's checked statements, and a picker to add one from a template (with the venue, for a
 * template about tonight's sky: one statement per venue).
 */
export function ObjectStatements({ objectId, objectKind }: { objectId: string; objectKind?: string }) {
  const statements = useStatements({ objectId });
  const templates = useStatementTemplates();
  const create = useCreateStatement();
  const [templateId, setTemplateId] = useState('');
  const [venueId, setVenueId] = useState('');
  const existing = new Set(statements.data?.data.filter((s) => !s.venue).map((s) => s.template.id));
  // Only the templates valid for this kind of object; the server refuses the others with the reason.
  const available =
    templates.data?.filter((t) => (t.needsVenue || !existing.has(t.id)) && (!objectKind || t.kinds.includes(objectKind))) ?? [];
  const chosen = available.find((t) => t.id === templateId);

  return (
    <section aria-labelledby="object-statements-heading" className="space-y-3">
      <h2 id="object-statements-heading" className="text-lg font-semibold tracking-tight">
        Checked statements
      </h2>
      {statements.data && statements.data.data.length === 0 && (
        <p className="text-sm text-muted">No statements about this object yet.</p>
      )}
      <ul className="space-y-2">
        {statements.data?.data.map((s) => (
          <li key={s.id} className="rounded-lg border border-rule bg-panel px-4 py-3">
            <Link
              to={paths.statement.href(s.id)}
              className="font-serif text-[16px] leading-snug hover:text-accent hover:underline"
            >
              {s.texts?.['en-GB'] ?? s.template.title}
            </Link>
            <div className="mt-1 flex items-center gap-2 text-xs text-muted">
              <StatementStatusBadge status={s.status} />
              {s.template.title}
              {s.venue ? ` · ${venueNightText(s)}` : ''}
            </div>
          </li>
        ))}
      </ul>
      {available.length > 0 && (
        <form
          className="flex flex-wrap items-end gap-3"
          onSubmit={(e) => {
            e.preventDefault();
            if (templateId && (!chosen?.needsVenue || venueId)) {
              create.mutate(
                { objectId, templateId, ...(chosen?.needsVenue ? { venueId } : {}) },
                { onSuccess: () => setTemplateId('') },
              );
            }
          }}
        >
          <SelectField
            label="Add a statement"
            value={templateId}
            onChange={(e) => {
              setTemplateId(e.target.value);
              create.reset();
            }}
            className="min-w-80"
          >
            <option value="">Choose a template…</option>
            {available.map((t) => (
              <option key={t.id} value={t.id}>
                {t.title}
              </option>
            ))}
          </SelectField>
          {chosen?.needsVenue && (
            <VenueChoiceField
              value={venueId}
              onChange={(id) => {
                setVenueId(id);
                create.reset();
              }}
              className="min-w-64"
            />
          )}
          <Button type="submit" disabled={!templateId || (!!chosen?.needsVenue && !venueId)} busy={create.isPending}>
            Work it out
          </Button>
        </form>
      )}
      {chosen && (
        <p className="text-xs text-muted">
          Needs {chosen.needs}.
          {chosen.followsTonight
            ? ' Worked out again each night from the venue’s sky; a new night’s number needs no new sign-off.'
            : ''}
        </p>
      )}
      {create.error && <Notice tone="error">{create.error.message}</Notice>}
    </section>
  );
}
