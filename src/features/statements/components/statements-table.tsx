import { Link } from 'react-router-dom';
import type { StatementDto } from '@shared/schemas/statement.ts';
import type { StatementLocale } from '@shared/statements/locales.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { venueNightText } from '@/components/statements/venue-night.ts';
import { DataTable, WIDE_COLUMN } from '@/components/ui/data-table.tsx';
import { paths } from '@/config/paths.ts';
import { formatDateTime } from '@/lib/format-date.ts';

/**
 * Statements with their public text, dense but calm; each row opens the statement. On a phone the
 * statement takes the row's whole width, with its object and status beneath it.
 */
export function StatementsTable({ statements, locale }: { statements: StatementDto[]; locale: StatementLocale }) {
  return (
    <DataTable
      columns={[
        { label: 'Statement' },
        { label: 'Object', className: WIDE_COLUMN },
        { label: 'Status', className: WIDE_COLUMN },
        { label: 'Computed', className: 'hidden md:table-cell' },
      ]}
    >
      {statements.map((s) => (
        <tr key={s.id} className="border-b border-rule align-top last:border-0 hover:bg-wash/60">
          <td className="max-w-xl px-4 py-2.5 [overflow-wrap:anywhere]">
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
            <span className="mt-1.5 flex flex-wrap items-center gap-2 text-xs text-muted sm:hidden">
              <StatementStatusBadge status={s.status} />
              {s.object.name}
            </span>
          </td>
          <td className={`px-4 py-2.5 ${WIDE_COLUMN}`}>{s.object.name}</td>
          <td className={`px-4 py-2.5 ${WIDE_COLUMN}`}>
            <StatementStatusBadge status={s.status} />
          </td>
          <td className="hidden whitespace-nowrap px-4 py-2.5 text-muted md:table-cell">{formatDateTime(s.computedAt)}</td>
        </tr>
      ))}
    </DataTable>
  );
}
