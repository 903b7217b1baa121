import { useState } from 'react';
import type { PageDto } from '@shared/schemas/page.ts';
import { usePublishPage, useSchedulePage, useUnpublishPage } from '@/api/page-workflow.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatDateTime } from '@/lib/format-date.ts';
import { publishLabel } from '../version-labels.ts';

/** For editors: publish the approved version now or at a time, or take the live version down. */
export function PublishPanel({ page }: { page: PageDto }) {
  const publish = usePublishPage(page.id);
  const schedule = useSchedulePage(page.id);
  const unpublish = useUnpublishPage(page.id);
  const [at, setAt] = useState('');
  const error = publish.error ?? schedule.error ?? unpublish.error;
  /** Forgets what the other two steps said: an old refusal must not stay beside a later success. */
  const startOnly = (step: { reset: () => void }) => {
    for (const m of [publish, schedule, unpublish]) if (m !== step) m.reset();
  };
  if (!page.can.publish && !page.can.unpublish && !page.can.schedule) return null;
  return (
    <section aria-labelledby="publishing" className="space-y-3 rounded-lg border border-rule bg-panel p-4">
      <h2 id="publishing" className="font-semibold">
        Publishing
      </h2>
      {page.published ? (
        <p className="text-sm">
          Live: revision {page.published.revisionNumber}
          {page.published.at ? `, published ${formatDateTime(page.published.at)}` : ''}.
        </p>
      ) : (
        <p className="text-sm text-muted">Nothing of this page is live.</p>
      )}
      {page.scheduledPublishAt && <p className="text-sm">Scheduled to go live {formatDateTime(page.scheduledPublishAt)}.</p>}
      <div className="flex flex-wrap gap-2">
        {page.can.publish && (
          <Button
            busy={publish.isPending}
            onClick={() => {
              startOnly(publish);
              publish.mutate();
            }}
          >
            {publishLabel(page)}
          </Button>
        )}
        {page.can.unpublish && (
          <Button
            variant="danger"
            busy={unpublish.isPending}
            onClick={() => {
              startOnly(unpublish);
              unpublish.mutate();
            }}
          >
            Unpublish
          </Button>
        )}
      </div>
      {page.can.schedule && (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            if (!at) return;
            startOnly(schedule);
            schedule.mutate(new Date(at).toISOString());
          }}
        >
          <label className="text-sm">
            <span className="mb-1 block font-medium">Publish at</span>
            <input
              type="datetime-local"
              value={at}
              onChange={(e) => setAt(e.target.value)}
              className="rounded-md border border-rule bg-panel px-2 py-1.5 text-sm"
            />
          </label>
          <Button type="submit" variant="secondary" disabled={!at} busy={schedule.isPending}>
            Schedule
          </Button>
          {page.scheduledPublishAt && (
            <Button
              type="button"
              variant="quiet"
              onClick={() => {
                startOnly(schedule);
                schedule.mutate(null);
              }}
            >
              Clear schedule
            </Button>
          )}
        </form>
      )}
      {error && <Notice tone="error">{error.message}</Notice>}
    </section>
  );
}
