import { Link } from 'react-router-dom';
import type { PageRow } from '@shared/schemas/page.ts';
import { paths } from '@/config/paths.ts';
import { PageStatusBadge } from './page-status-badge.tsx';
import { DataTable, WIDE_COLUMN } from '@/components/ui/data-table.tsx';
import { formatDateTime } from '@/lib/format-date.ts';

/** Where a row's title leads: reviewers and editors usually want the review view. */
export const pageHref = (row: PageRow) =>
  row.status === 'in_review' || row.status === 'needs_recheck' || row.status === 'approved'
    ? paths.pageReview.href(row.id)
    : paths.pageEdit.href(row.id);

/**
 * The pages table: title, object, status, writer, last change. On a phone the title takes the row,
 * with the status, object and writer beneath it.
 */
export function PagesTable({ rows }: { rows: PageRow[] }) {
  return (
    <DataTable
      columns={[
        { label: 'Title' },
        { label: 'Object', className: WIDE_COLUMN },
        { label: 'Status', className: WIDE_COLUMN },
        { label: 'Writer', className: WIDE_COLUMN },
        { label: 'Last change', align: 'right', className: 'hidden md:table-cell' },
      ]}
    >
      {rows.map((row) => (
        <tr key={row.id} className="h-10 border-t border-rule">
          <td className="px-4 py-2 [overflow-wrap:anywhere]">
            <Link to={pageHref(row)} className="font-medium text-accent hover:underline">
              {row.title}
            </Link>
            {row.archivedAt && (
              <span className="ml-2 rounded border border-rule px-1.5 py-0.5 text-xs font-medium text-muted">Archived</span>
            )}
            {row.live && row.status !== 'published' && (
              <span className="ml-2 text-xs text-muted">(a published version is live)</span>
            )}
            <span className="mt-1 flex flex-wrap items-center gap-x-2 gap-y-1 text-xs text-muted sm:hidden">
              <PageStatusBadge status={row.status} />
              {row.object.name} · {row.writer.name}
            </span>
          </td>
          <td className={`px-4 py-2 ${WIDE_COLUMN}`}>{row.object.name}</td>
          <td className={`px-4 py-2 ${WIDE_COLUMN}`}>
            <PageStatusBadge status={row.status} />
          </td>
          <td className={`px-4 py-2 text-muted ${WIDE_COLUMN}`}>{row.writer.name}</td>
          <td className="hidden px-4 py-2 text-right tabular-nums text-muted md:table-cell">{formatDateTime(row.updatedAt)}</td>
        </tr>
      ))}
    </DataTable>
  );
}
