import { Link } from 'react-router-dom';
import type { PageRow } from '@shared/schemas/page.ts';
import { paths } from '@/config/paths.ts';
import { PageStatusBadge } from './page-status-badge.tsx';
import { DataTable } from '@/components/ui/data-table.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

/** Where a row's title leads: reviewers and editors usually want the review view. */
export const pageHref = (row: PageRow) =>
  row.status === 'in_review' || row.status === 'needs_recheck' || row.status === 'approved'
    ? paths.pageReview.href(row.id)
    : paths.pageEdit.href(row.id);

/** The pages table: title, object, status, writer, last change. */
export function PagesTable({ rows }: { rows: PageRow[] }) {
  return (
    <DataTable
      columns={[
        { label: 'Title' },
        { label: 'Object' },
        { label: 'Status' },
        { label: 'Writer' },
        { label: 'Last change', align: 'right' },
      ]}
    >
      {rows.map((row) => (
        <tr key={row.id} className="h-10 border-t border-rule">
          <td className="px-4 py-2">
            <Link to={pageHref(row)} className="font-medium text-accent hover:underline">
              {row.title}
            </Link>
            {row.archivedAt && (
              <span className="ml-2 rounded border border-rule px-1.5 py-0.5 text-xs font-medium text-muted">Archived</span>
            )}
            {row.live && row.status !== 'published' && (
              <span className="ml-2 text-xs text-muted">(a published version is live)</span>
            )}
          </td>
          <td className="px-4 py-2">{row.object.name}</td>
          <td className="px-4 py-2">
            <PageStatusBadge status={row.status} />
          </td>
          <td className="px-4 py-2 text-muted">{row.writer.name}</td>
          <td className="px-4 py-2 text-right tabular-nums text-muted">{formatDateTime(row.updatedAt)}</td>
        </tr>
      ))}
    </DataTable>
  );
}
