import { useState } from 'react';
import { LOCALE_LABELS } from '@shared/statements/locales.ts';
import { useDeleteTimelineEntry, useTimeline } from '@/api/timeline.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { TimelineEntryForm } from '@/features/settings/components/timeline-entry-form.tsx';
import { yearsAgoInWords } from '@/features/settings/components/timeline-years.ts';
import { formatDateTime } from '@/lib/format-date.ts';

/**
 * Earth's timeline: the events "when the light set out" statements may compare a light-travel time
 * with, each with its date, uncertainty and published source. Admins edit; everyone reads.
 */
export function Component() {
  const timeline = useTimeline();
  const remove = useDeleteTimelineEntry();
  const [editing, setEditing] = useState<string | 'new' | null>(null);
  const entries = timeline.data ?? [];
  const canAdd = entries.length === 0 || entries.some((e) => e.can.update);
  return (
    <>
      <PageHeader
        title="Earth’s timeline"
        description="Events a light-travel time is compared with in “when the light set out” statements. An event is named only when its date (± uncertainty) and the light-travel time’s own interval agree; otherwise the sentence makes no comparison."
        actions={canAdd && editing !== 'new' ? <Button onClick={() => setEditing('new')}>Add an entry</Button> : undefined}
      />
      {timeline.error && <Notice tone="error">{timeline.error.message}</Notice>}
      {editing === 'new' && (
        <div className="mb-6">
          <TimelineEntryForm onDone={() => setEditing(null)} />
        </div>
      )}
      {remove.error && <Notice tone="error">{remove.error.message}</Notice>}
      {timeline.data && entries.length === 0 && (
        <p className="text-sm text-muted">The timeline is empty: statements make no comparison.</p>
      )}
      <ol className="space-y-3">
        {entries.map((e) =>
          editing === e.id ? (
            <li key={e.id}>
              <TimelineEntryForm entry={e} onDone={() => setEditing(null)} />
            </li>
          ) : (
            <li key={e.id} className="rounded-lg border border-rule bg-panel p-4 text-sm [overflow-wrap:anywhere]">
              <div className="flex flex-wrap items-baseline justify-between gap-2">
                <h2 className="font-semibold">{e.label}</h2>
                <span className="text-muted">
                  {yearsAgoInWords(e.yearsAgo)} ago ± {yearsAgoInWords(e.uncertaintyYears)}
                </span>
              </div>
              <p className="mt-1 text-xs uppercase tracking-wide text-muted">
                {e.relation === 'before' ? 'The light set out before this' : 'The light set out around this time'}
              </p>
              <dl className="mt-2 grid gap-x-3 gap-y-1 sm:grid-cols-[8rem_minmax(0,1fr)]">
                {(Object.keys(e.phrases) as Array<keyof typeof LOCALE_LABELS>).map((l) => (
                  <div key={l} className="contents">
                    <dt className="text-muted">{LOCALE_LABELS[l]}</dt>
                    <dd className="font-serif">… {e.phrases[l]}.</dd>
                  </div>
                ))}
                <dt className="text-muted">Source</dt>
                <dd>
                  {e.sourceUrl ? (
                    <a href={e.sourceUrl} className="text-accent underline" rel="noreferrer noopener" target="_blank">
                      {e.sourceCitation}
                    </a>
                  ) : (
                    e.sourceCitation
                  )}
                </dd>
                {e.note && (
                  <>
                    <dt className="text-muted">Note</dt>
                    <dd>{e.note}</dd>
                  </>
                )}
                <dt className="text-muted">Changed</dt>
                <dd>{formatDateTime(e.updatedAt)}</dd>
              </dl>
              {(e.can.update || e.can.delete) && (
                <div className="mt-3 flex flex-wrap gap-2">
                  {e.can.update && (
                    <Button variant="secondary" onClick={() => setEditing(e.id)}>
                      Change
                    </Button>
                  )}
                  {e.can.delete && (
                    <Button
                      variant="danger"
                      busy={remove.isPending && remove.variables === e.id}
                      onClick={() => {
                        if (
                          window.confirm(`Remove “${e.label}” from the timeline? Statements that named it are worked out again.`)
                        )
                          remove.mutate(e.id);
                      }}
                    >
                      Remove
                    </Button>
                  )}
                </div>
              )}
            </li>
          ),
        )}
      </ol>
    </>
  );
}
