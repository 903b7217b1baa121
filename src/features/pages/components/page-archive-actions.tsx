import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import type { PageDto } from '@shared/schemas/page.ts';
import { useArchivePage, useDeletePage, useRestorePage } from '@/api/page-workflow.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ReasonDialog } from '@/components/ui/reason-dialog.tsx';
import { paths } from '@/config/paths.ts';
import { formatDateTime } from '@/lib/format-date.ts';

type Step = 'archive' | 'restore' | 'delete';

const DIALOG: Record<Step, { title: string; label: string; confirm: string }> = {
  archive: {
    title: 'Archive this page?',
    label: 'Why is it archived? It leaves the lists, the public API, the Atom feed and every kiosk screen; it can be restored.',
    confirm: 'Archive',
  },
  restore: {
    title: 'Restore this page?',
    label: 'Why is it coming back? It returns to the desk as it was; it goes live again only when an editor publishes it.',
    confirm: 'Restore',
  },
  delete: {
    title: 'Delete this page for good?',
    label: 'Why is it deleted? Its text, revisions and comments go and cannot be brought back.',
    confirm: 'Delete for good',
  },
};

/** Archive, restore and delete buttons for one page, each asking for a reason first; shown only where the viewer may use them. */
export function PageArchiveActions({ page }: { page: PageDto }) {
  const [step, setStep] = useState<Step | null>(null);
  const archive = useArchivePage(page.id);
  const restore = useRestorePage(page.id);
  const remove = useDeletePage(page.id);
  const navigate = useNavigate();
  const mutation = { archive, restore, delete: remove };
  const close = () => setStep(null);
  const run = (reason: string) => {
    if (!step) return;
    for (const m of [archive, restore, remove]) m.reset();
    if (step === 'delete')
      remove.mutate(reason, { onSuccess: () => navigate(paths.pages.href(), { state: { deleted: page.title } }) });
    else mutation[step].mutate(reason, { onSuccess: close });
  };
  const error = archive.error ?? restore.error ?? remove.error;
  return (
    <>
      {page.can.restore && (
        <Button variant="secondary" onClick={() => setStep('restore')}>
          Restore
        </Button>
      )}
      {page.can.archive && (
        <Button variant="secondary" onClick={() => setStep('archive')}>
          Archive
        </Button>
      )}
      {page.can.delete && (
        <Button variant="danger" onClick={() => setStep('delete')}>
          Delete
        </Button>
      )}
      {step && <ReasonDialog {...DIALOG[step]} busy={mutation[step].isPending} onConfirm={run} onCancel={close} />}
      {error && !step && (
        <p role="alert" className="basis-full text-sm font-medium text-broken">
          {error.message}
        </p>
      )}
    </>
  );
}

/** The notice on an archived page: since when, and what restoring does. */
export function ArchivedNotice({ page }: { page: PageDto }) {
  if (!page.archivedAt) return null;
  return (
    <div className="mb-4">
      <Notice tone="warning" title="Archived">
        Archived {formatDateTime(page.archivedAt)}. It is hidden from the page lists and from every public output (the public API,
        the Atom feed and kiosk screens), and it cannot be changed. Restoring brings it back to the desk as it was; it goes live
        again only when an editor publishes it.
      </Notice>
    </div>
  );
}
