import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useRef, useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import type { PageDto } from '@shared/schemas/page.ts';
import { LOCALE_LABELS } from '@shared/statements/locales.ts';
import { useSubmitPage, useWithdrawPage } from '@/api/page-workflow.ts';
import { pageKeys, usePage } from '@/api/pages.ts';
import { useSettings } from '@/api/settings.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { formatDateTime } from '@/lib/format-date.ts';
import { PageWorkspace, type WorkspaceHandle } from '@/editor/page-workspace.tsx';
import { LanguageVersions } from '@/features/pages/components/language-versions.tsx';
import { ArchivedNotice, PageArchiveActions } from '@/features/pages/components/page-archive-actions.tsx';
import { PageStatusBadge } from '@/features/pages/components/page-status-badge.tsx';
import { PublishPanel } from '@/features/pages/components/publish-panel.tsx';
import { SubmitFlagsForm } from '@/features/pages/components/submit-flags-form.tsx';

/** The editor screen (the only route that loads the editor). */
export function Component() {
  const { id = '' } = useParams();
  const page = usePage(id);
  const settings = useSettings();
  const queryClient = useQueryClient();
  const submit = useSubmitPage(id);
  const withdraw = useWithdrawPage(id);
  const [askReasons, setAskReasons] = useState<string[] | null>(null);
  const workspace = useRef<WorkspaceHandle | null>(null);
  const onSaved = useCallback((saved: PageDto) => queryClient.setQueryData(pageKeys.detail(id), saved), [queryClient, id]);

  if (page.isPending || settings.isPending) return <p className="text-sm text-muted">Loading page…</p>;
  // A failed refresh must not unmount the editor and the text in it.
  if (page.error && !page.data) return <Notice tone="error">{page.error.message}</Notice>;
  const p = page.data;
  const submitNow = async (flagNotes?: Array<{ text: string; reason: string }>) => {
    const version = (await workspace.current?.flush()) ?? p.version;
    const open = workspace.current?.openFlags() ?? [];
    // Open hand-typed numbers need the writer's reason before the page goes to review.
    if (open.length && !flagNotes) return setAskReasons(open);
    withdraw.reset();
    submit.mutate({ version, flagNotes }, { onSuccess: () => setAskReasons(null) });
  };
  const sentBackAt = p.sentBack ? new Date(p.sentBack.at) : null;
  return (
    <>
      <PageHeader
        title={p.title}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <PageStatusBadge status={p.status} /> About {p.object.name} · {LOCALE_LABELS[p.locale]} · revision {p.revision.number}{' '}
            · by {p.writer.name}
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
            {p.can.withdraw && (
              <Button
                variant="secondary"
                busy={withdraw.isPending}
                onClick={() => {
                  submit.reset();
                  withdraw.mutate();
                }}
              >
                Withdraw from review
              </Button>
            )}
            <PageArchiveActions page={p} />
          </>
        }
      />
      <ArchivedNotice page={p} />
      {p.sentBack && sentBackAt && (
        <div className="mb-4">
          <Notice tone="warning" title={`Sent back by ${p.sentBack.by ?? 'a reviewer'}`}>
            <p className="whitespace-pre-wrap">{p.sentBack.reason}</p>
            <p className="mt-1 text-xs text-muted">
              {formatDateTime(sentBackAt)} ·{' '}
              <Link to={paths.pageReview.href(p.id)} className="text-accent underline">
                every comment
              </Link>
            </p>
          </Notice>
        </div>
      )}
      {askReasons && p.can.submit && (
        <SubmitFlagsForm
          flags={askReasons}
          busy={submit.isPending}
          onSubmit={(notes) => void submitNow(notes)}
          onCancel={() => setAskReasons(null)}
        />
      )}
      {withdraw.error && (
        <div className="mb-4">
          <Notice tone="error" title="Not withdrawn">
            {withdraw.error.message}
          </Notice>
        </div>
      )}
      {withdraw.isSuccess && p.status === 'draft' && (
        <div className="mb-4">
          <Notice tone="success" title="Withdrawn from review">
            The page is a draft again. Statements a reviewer signed off keep their sign-off while their wording stays the same.
          </Notice>
        </div>
      )}
      <div className="mb-4">
        <LanguageVersions pageId={p.id} />
      </div>
      {p.can.publish && (
        <div className="mb-4">
          <PublishPanel page={p} />
        </div>
      )}
      {submit.error && (
        <div className="mb-4">
          <Notice tone="error" title="Not submitted">
            {submit.error.message}
          </Notice>
        </div>
      )}
      {submit.isSuccess && p.status === 'in_review' && (
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
