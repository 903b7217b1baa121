import { Link } from 'react-router-dom';
import type { PreviewRow } from '@shared/schemas/settings.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { DataTable } from '@/components/ui/data-table.tsx';
import { paths } from '@/config/paths.ts';

/** Old and new public text side by side for every statement a model change would move. */
export function CosmologyPreviewTable({ rows }: { rows: PreviewRow[] }) {
  return (
    <DataTable columns={[{ label: 'Object and statement' }, { label: 'Now' }, { label: 'After the change' }]}>
      {rows.map((r) => (
        <tr key={r.statementId} className="border-b border-rule align-top last:border-0">
          <td className="px-4 py-3">
            <Link to={paths.statement.href(r.statementId)} className="font-medium text-accent hover:underline">
              {r.objectName}
            </Link>
            <span className="block text-xs text-muted">{r.templateTitle}</span>
          </td>
          <td className="px-4 py-3 font-serif text-[15px] text-ink/80">{r.oldText ?? '—'}</td>
          <td className="px-4 py-3">
            {r.newText ? <p className="font-serif text-[15px]">{r.newText}</p> : <p className="text-broken">{r.reason}</p>}
            <span className="mt-1 inline-block">
              <StatementStatusBadge status={r.newStatus} />
            </span>
          </td>
        </tr>
      ))}
    </DataTable>
  );
}
