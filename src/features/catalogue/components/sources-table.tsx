import type { SourceDto } from '@shared/schemas/source.ts';
import { Button } from '@/components/ui/button.tsx';
import { sourceHref } from './format.ts';
import { DataTable } from '@/components/ui/data-table.tsx';
import { formatCalendarDate } from '@/lib/format-date.ts';

/** Sources with their identifiers and how many current measurements cite each. */
export function SourcesTable({ sources, onEdit }: { sources: SourceDto[]; onEdit: (source: SourceDto) => void }) {
  return (
    <DataTable
      columns={[
        { label: 'Citation' },
        { label: 'Identifier' },
        { label: 'Retrieved' },
        { label: 'Measurements', align: 'right' },
        { label: 'Actions', hidden: true },
      ]}
    >
      {sources.map((s) => {
        const href = sourceHref(s);
        return (
          <tr key={s.id} className="h-10 border-b border-rule last:border-0">
            <td className="px-4 py-2">
              <span className="block font-medium">{s.citation}</span>
              {s.catalogueName && <span className="block text-xs text-muted">{s.catalogueName}</span>}
            </td>
            <td className="px-4 py-2 font-mono text-xs">
              {href ? (
                <a href={href} target="_blank" rel="noreferrer" className="text-accent hover:underline">
                  {s.doi ?? s.bibcode ?? 'link'}
                </a>
              ) : (
                '—'
              )}
            </td>
            <td className="px-4 py-2 tabular-nums text-muted">{s.retrievedOn ? formatCalendarDate(s.retrievedOn) : '—'}</td>
            <td className="px-4 py-2 text-right tabular-nums">{s.measurementCount}</td>
            <td className="px-4 py-2 text-right">
              {s.can.update && (
                <Button variant="quiet" onClick={() => onEdit(s)}>
                  Edit
                </Button>
              )}
            </td>
          </tr>
        );
      })}
      {sources.length === 0 && (
        <tr>
          <td colSpan={5} className="px-4 py-8 text-center text-muted">
            No sources yet.
          </td>
        </tr>
      )}
    </DataTable>
  );
}
