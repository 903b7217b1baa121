import { Link } from 'react-router-dom';
import type { PreviewRow } from '@shared/schemas/settings.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { paths } from '@/config/paths.ts';

/** Old and new public text side by side for every statement a model change would move. */
export function CosmologyPreviewTable({ rows }: { rows: PreviewRow[] }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
      <table className="w-full text-left text-sm">
        <thead className="border-b border-rule bg-wash text-xs uppercase tracking-wide text-muted">
          <tr>
            <th scope="col" className="px-4 py-2 font-semibold">Object and statement</th>
            <th scope="col" className="px-4 py-2 font-semibold">Now</th>
            <th scope="col" className="px-4 py-2 font-semibold">After the change</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.statementId} className="border-b border-rule align-top last:border-0">
              <td className="px-4 py-3">
                <Link to={paths.statement.href(r.statementId)} className="font-medium text-accent hover:underline">{r.objectName}</Link>
                <span className="block text-xs text-muted">{r.templateTitle}</span>
              </td>
              <td className="px-4 py-3 font-serif text-[15px] text-ink/80">{r.oldText ?? '—'}</td>
              <td className="px-4 py-3">
                {r.newText ? <p className="font-serif text-[15px]">{r.newText}</p> : <p className="text-broken">{r.reason}</p>}
                <span className="mt-1 inline-block"><StatementStatusBadge status={r.newStatus} /></span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
