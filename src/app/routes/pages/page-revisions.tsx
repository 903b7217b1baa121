import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { useRestoreRevision, useRevisionDiff, useRevisions } from '@/api/page-revisions.ts';
import { usePage } from '@/api/pages.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { RevisionDiff } from '@/features/pages/components/revision-diff.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

/** Every saved version, a readable diff between any two, and restoring one as a new revision. */
export function Component() {
  const { id = '' } = useParams();
  const page = usePage(id);
  const revisions = useRevisions(id);
  const restore = useRestoreRevision(id);
  const [from, setFrom] = useState<number | undefined>();
  const [to, setTo] = useState<number | undefined>();
  const list = revisions.data ?? [];
  const a = from ?? list[1]?.number;
  const b = to ?? list[0]?.number;
  const diff = useRevisionDiff(id, a, b);
  if (page.error) return <Notice tone="error">{page.error.message}</Notice>;
  return (
    <>
      <PageHeader
        title={`Revisions of “${page.data?.title ?? '…'}”`}
        description="Every saved version is kept. Compare any two, or restore an old one as a new revision."
        actions={
          <Link
            to={paths.pageEdit.href(id)}
            className="inline-flex items-center rounded-md border border-rule bg-panel px-3.5 py-2 text-sm font-medium hover:border-accent"
          >
            Back to the page
          </Link>
        }
      />
      {restore.error && (
        <div className="mb-4">
          <Notice tone="error">{restore.error.message}</Notice>
        </div>
      )}
      {restore.isSuccess && (
        <div className="mb-4">
          <Notice tone="success">Restored as revision {restore.data.revision.number}.</Notice>
        </div>
      )}
      <div className="grid gap-6 lg:grid-cols-[20rem_minmax(0,1fr)]">
        <div className="overflow-hidden rounded-lg border border-rule bg-panel">
          <table className="w-full text-sm">
            <thead className="bg-wash text-left text-xs uppercase tracking-wide text-muted">
              <tr>
                <th scope="col" className="px-3 py-2">
                  #
                </th>
                <th scope="col" className="px-3 py-2">
                  Saved
                </th>
                <th scope="col" className="px-3 py-2">
                  Compare
                </th>
              </tr>
            </thead>
            <tbody>
              {list.map((r) => (
                <tr key={r.id} className="border-t border-rule align-top">
                  <td className="px-3 py-2 tabular-nums">{r.number}</td>
                  <td className="px-3 py-2">
                    <span className="block">{formatDateTime(r.createdAt)}</span>
                    <span className="block text-xs text-muted">
                      {r.author ?? 'Former staff'}
                      {r.restoredFrom ? ` · restored from ${r.restoredFrom}` : ''}
                      {r.marks.length ? ` · ${r.marks.join(', ')}` : ''}
                    </span>
                    {page.data?.can.edit && !r.marks.includes('current') && (
                      <button
                        type="button"
                        className="text-xs font-medium text-accent hover:underline"
                        onClick={() => restore.mutate({ number: r.number, version: page.data!.version })}
                      >
                        Restore as new revision
                      </button>
                    )}
                  </td>
                  <td className="space-x-2 px-3 py-2 whitespace-nowrap">
                    <label className="text-xs">
                      <input type="radio" name="from" checked={a === r.number} onChange={() => setFrom(r.number)} /> from
                    </label>
                    <label className="text-xs">
                      <input type="radio" name="to" checked={b === r.number} onChange={() => setTo(r.number)} /> to
                    </label>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <div>
          {list.length < 2 && <p className="text-sm text-muted">Only one version so far.</p>}
          {diff.error && <Notice tone="error">{diff.error.message}</Notice>}
          {diff.data && <RevisionDiff diff={diff.data} />}
          {a === b && a !== undefined && <p className="text-sm text-muted">Choose two different revisions.</p>}
          {restore.isPending && <Button busy>Restoring…</Button>}
        </div>
      </div>
    </>
  );
}
