import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useRef } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { PageDto } from '@shared/schemas/page.ts';
import { useSubmitPage } from '@/api/page-workflow.ts';
import { pageKeys, usePage } from '@/api/pages.ts';
import { useSettings } from '@/api/settings.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { PageWorkspace, type WorkspaceHandle } from '@/editor/page-workspace.tsx';
import { PageStatusBadge } from '@/features/pages/components/page-status-badge.tsx';

/** The editor screen (the only route that loads the editor). */
export function Component() {
  const { id = '' } = useParams();
  const page = usePage(id);
  const settings = useSettings();
  const queryClient = useQueryClient();
  const submit = useSubmitPage(id);
  const workspace = useRef<WorkspaceHandle | null>(null);
  const onSaved = useCallback((saved: PageDto) => queryClient.setQueryData(pageKeys.detail(id), saved), [queryClient, id]);

  if (page.isPending || settings.isPending) return <p className="text-sm text-muted">Loading page…</p>;
  // A failed refresh must not unmount the editor and the text in it.
  if (page.error && !page.data) return <Notice tone="error">{page.error.message}</Notice>;
  const p = page.data;
  const submitNow = async () => {
    const version = (await workspace.current?.flush()) ?? p.version;
    submit.mutate(version);
  };
  return (
    <>
      <PageHeader
        title={p.title}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <PageStatusBadge status={p.status} /> About {p.object.name} · revision {p.revision.number} · by {p.writer.name}
            {p.published && p.status !== 'published' && <span>· revision {p.published.revisionNumber} is live</span>}
          </span>
        }
        actions={
          <>
            <Link
              to={paths.pageRevisions.href(p.id)}
              className="inline-flex items-center gap-1.5 rounded-md border border-rule bg-panel px-3.5 py-2 text-sm font-medium hover:border-accent"
            >
              <Icon name="history" className="size-4" />
              Revisions
            </Link>
            {p.status !== 'draft' && (
              <Link
                to={paths.pageReview.href(p.id)}
                className="inline-flex items-center rounded-md border border-rule bg-panel px-3.5 py-2 text-sm font-medium hover:border-accent"
              >
                Review view
              </Link>
            )}
            {p.can.submit && (
              <Button busy={submit.isPending} onClick={() => void submitNow()}>
                Submit for review
              </Button>
            )}
          </>
        }
      />
      {submit.error && (
        <div className="mb-4">
          <Notice tone="error" title="Not submitted">
            {submit.error.message}
          </Notice>
        </div>
      )}
      {submit.isSuccess && (
        <div className="mb-4">
          <Notice tone="success" title="Submitted for review">
            The reviewers have been e-mailed. The page is locked until a reviewer signs it off or sends it back.
          </Notice>
        </div>
      )}
      <PageWorkspace
        key={p.id}
        page={p}
        eyeSafetyNotice={settings.data?.eyeSafetyNotice ?? ''}
        onSaved={onSaved}
        handleRef={workspace}
      />
    </>
  );
}
