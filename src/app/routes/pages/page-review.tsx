import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { LOCALE_LABELS } from '@shared/statements/locales.ts';
import { useResolveFlag, useSendBack, useSignOffPage, useSignOffStatement } from '@/api/page-workflow.ts';
import { useApprovalProblems, usePage, usePreview, usePublished } from '@/api/pages.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { PageComments } from '@/features/pages/components/page-comments.tsx';
import { PageHtml } from '@/features/pages/components/page-html.tsx';
import { ArchivedNotice, PageArchiveActions } from '@/features/pages/components/page-archive-actions.tsx';
import { PageStatusBadge } from '@/features/pages/components/page-status-badge.tsx';
import { PublishPanel } from '@/features/pages/components/publish-panel.tsx';
import { ReviewFlags } from '@/features/pages/components/review-flags.tsx';
import { ReviewStatements } from '@/features/pages/components/review-statements.tsx';
import { StatementWorking } from '@/features/pages/components/statement-working.tsx';
import { versionLabels } from '@/features/pages/version-labels.ts';

/** The review view: the page as it will read, each statement with its working and sign-off, flags, comments, publishing. */
export function Component() {
  const { id = '' } = useParams();
  const page = usePage(id);
  const p = page.data;
  const preview = usePreview(id, p?.revision.number);
  const [showLive, setShowLive] = useState(false);
  const published = usePublished(id, !!p?.published);
  const problems = useApprovalProblems(id, !!p?.can.review);
  const signStatement = useSignOffStatement(id);
  const signPage = useSignOffPage(id);
  const resolveFlag = useResolveFlag(id);
  const sendBack = useSendBack(id);
  const [working, setWorking] = useState<string | null>(null);
  const [backNote, setBackNote] = useState('');
  if (page.isPending) return <p className="text-sm text-muted">Loading page…</p>;
  if (page.error || !p) return <Notice tone="error">{page.error?.message}</Notice>;
  const error = signStatement.error ?? signPage.error ?? resolveFlag.error ?? sendBack.error;
  /** Starts one step and forgets what the others said, so an old refusal never sits beside a later success. */
  const only = <T,>(step: { mutate: (arg: T) => void; reset: () => void }, arg: T) => {
    for (const m of [signStatement, signPage, resolveFlag, sendBack]) if (m !== (step as unknown)) m.reset();
    step.mutate(arg);
  };
  const moved = p.statements.filter((s) => s.signedText !== null && s.text !== s.signedText);
  const html = showLive ? published.data?.html : preview.data?.html;
  const labels = versionLabels(p);

  return (
    <>
      <PageHeader
        title={p.title}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <PageStatusBadge status={p.status} /> About {p.object.name} · {LOCALE_LABELS[p.locale]} · revision {p.revision.number}{' '}
            by {p.revision.author ?? p.writer.name}
            {p.lastReviewer ? ` · last reviewer ${p.lastReviewer}` : ''}
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
            <Link
              to={paths.pageEdit.href(p.id)}
              className="inline-flex items-center rounded-md border border-rule bg-panel px-3.5 py-2 text-sm font-medium hover:border-accent"
            >
              {p.can.edit ? 'Edit' : 'Open in editor'}
            </Link>
            <PageArchiveActions page={p} />
          </>
        }
      />
      <ArchivedNotice page={p} />
      {p.status === 'needs_recheck' && (
        <div className="mb-6">
          <Notice tone="warning" title="Needs re-check">
            The data behind {moved.length === 1 ? 'a statement' : `${moved.length} statements`} changed after sign-off and the
            wording moved (old and new below).
            {p.published
              ? ` The public still sees revision ${p.published.revisionNumber} with the signed-off wording until a new version is signed off and published.`
              : ''}
          </Notice>
        </div>
      )}
      {error && (
        <div className="mb-4">
          <Notice tone="error">{error.message}</Notice>
        </div>
      )}
      <div className="grid grid-cols-[minmax(0,1fr)] gap-8 [overflow-wrap:anywhere] lg:grid-cols-[minmax(0,1fr)_22rem] xl:grid-cols-[minmax(0,1fr)_26rem]">
        <div className="min-w-0 space-y-4">
          {working && <StatementWorking id={working} locale={p.locale} onClose={() => setWorking(null)} />}
          {labels && (
            // biome-ignore lint/a11y/useSemanticElements: two toggle buttons, not form fields; a fieldset would bring form semantics and its own box
            <div
              role="group"
              aria-label="Which version"
              aria-describedby="version-note"
              className="grid grid-cols-1 gap-0.5 rounded-md border border-rule bg-panel p-0.5 text-sm sm:grid-cols-2"
            >
              <button
                type="button"
                aria-pressed={!showLive}
                onClick={() => setShowLive(false)}
                className={`rounded px-3 py-1.5 text-left ${!showLive ? 'bg-accent text-on-accent' : ''}`}
              >
                {labels.working}
              </button>
              <button
                type="button"
                aria-pressed={showLive}
                onClick={() => setShowLive(true)}
                className={`rounded px-3 py-1.5 text-left ${showLive ? 'bg-accent text-on-accent' : ''}`}
              >
                {labels.live}
              </button>
            </div>
          )}
          {labels && (
            <p id="version-note" className="text-sm text-muted">
              {labels.note}
            </p>
          )}
          {showLive && published.data?.publicUrl && (
            <p className="text-sm">
              <a className="text-accent underline" href={published.data.publicUrl}>
                Open the public page
              </a>{' '}
              <span className="text-muted">(what visitors read, with “How we know” under each figure)</span>
            </p>
          )}
          <article className="rounded-lg border border-rule bg-panel px-4 py-6 sm:px-8">
            <h1 className="mb-4 font-serif text-3xl font-semibold">{showLive ? published.data?.title : p.title}</h1>
            {html !== undefined ? (
              <PageHtml html={html} onStatement={setWorking} />
            ) : (
              <p className="text-sm text-muted">Loading…</p>
            )}
          </article>
          <PageComments pageId={p.id} canComment={p.can.comment} />
        </div>
        <div className="min-w-0 space-y-6">
          <ReviewStatements
            page={p}
            busyId={signStatement.isPending ? (signStatement.variables ?? null) : null}
            onSignOff={(sid) => only(signStatement, sid)}
            onWorking={setWorking}
          />
          <ReviewFlags
            flags={p.flags}
            canReview={p.can.review}
            onResolve={(text, reason) => only(resolveFlag, { text, reason })}
          />
          {p.eyeSafety.required && (
            <Notice tone={p.eyeSafety.present ? 'success' : 'error'} title="Eye safety">
              {p.eyeSafety.required}. {p.eyeSafety.present ? 'The notice is on the page.' : 'The notice is missing.'}
            </Notice>
          )}
          {p.can.review && (
            <section aria-labelledby="page-signoff" className="space-y-3 rounded-lg border border-rule bg-panel p-4">
              <h2 id="page-signoff" className="font-semibold">
                Sign off the page
              </h2>
              {problems.data && problems.data.length > 0 ? (
                <ul className="list-disc space-y-1 pl-5 text-sm text-muted">
                  {problems.data.map((m) => (
                    <li key={m}>{m}</li>
                  ))}
                </ul>
              ) : (
                <p className="text-sm text-muted">
                  Everything is checked. Signing off approves revision {p.revision.number} for an editor to publish.
                </p>
              )}
              <Button busy={signPage.isPending} disabled={!!problems.data?.length} onClick={() => only(signPage, undefined)}>
                Sign off page
              </Button>
              <form
                className="space-y-2 border-t border-rule pt-3"
                onSubmit={(e) => {
                  e.preventDefault();
                  only(sendBack, backNote);
                }}
              >
                <label htmlFor="send-back" className="block text-sm font-medium">
                  Send back to the writer
                </label>
                <textarea
                  id="send-back"
                  rows={2}
                  value={backNote}
                  onChange={(e) => setBackNote(e.target.value)}
                  placeholder="What needs changing"
                  className="w-full rounded-md border border-rule bg-panel px-3 py-2 text-sm"
                />
                <Button type="submit" variant="secondary" disabled={!backNote.trim()} busy={sendBack.isPending}>
                  Send back
                </Button>
              </form>
            </section>
          )}
          {p.status === 'approved' && !p.can.publish && (
            <Notice tone="success" title="Approved">
              Signed off{p.approved?.by ? ` by ${p.approved.by}` : ''}; an editor publishes it.
            </Notice>
          )}
          <PublishPanel page={p} />
        </div>
      </div>
    </>
  );
}
