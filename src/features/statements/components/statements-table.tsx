import { Link } from 'react-router-dom';
import type { StatementDto } from '@shared/schemas/statement.ts';
import type { StatementLocale } from '@shared/statements/locales.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { venueNightText } from '@/components/statements/venue-night.ts';
import { DataTable } from '@/components/ui/data-table.tsx';
import { paths } from '@/config/paths.ts';
import { formatDateTime } from '@/lib/format-date.ts';

/** Statements with their public text, dense but calm; each row opens the statement. */
export function StatementsTable({ statements, locale }: { statements: StatementDto[]; locale: StatementLocale }) {
  return (
    <DataTable columns={[{ label: 'Statement' }, { label: 'Object' }, { label: 'Status' }, { label: 'Computed' }]}>
      {statements.map((s) => (
        <tr key={s.id} className="border-b border-rule align-top last:border-0 hover:bg-wash/60">
          <td className="max-w-xl px-4 py-2.5">
            <Link
              to={paths.statement.href(s.id)}
              className="font-serif text-[15px] leading-snug text-ink hover:text-accent hover:underline"
            >
              {s.texts?.[locale] ?? '—'}
            </Link>
            <span className="mt-0.5 block text-xs text-muted">
              {s.template.title}
              {s.venue ? ` · ${venueNightText(s)}` : ''}
            </span>
          </td>
          <td className="px-4 py-2.5">{s.object.name}</td>
          <td className="px-4 py-2.5">
            <StatementStatusBadge status={s.status} />
          </td>
          <td className="whitespace-nowrap px-4 py-2.5 text-muted">{formatDateTime(s.computedAt)}</td>
        </tr>
      ))}
    </DataTable>
  );
}
