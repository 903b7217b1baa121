import type { ImportReport as Report, ImportRejectionReason } from '@shared/schemas/catalogue-import.ts';
import { DataTable } from '@/components/ui/data-table.tsx';

const REASONS: Record<ImportRejectionReason, string> = {
  unknown_object: 'Unknown object',
  unknown_quantity: 'Unknown quantity',
  non_numeric_value: 'Value is not a number',
  unit_mismatch: 'Unit does not fit the quantity',
  band_missing: 'Band missing',
  band_not_allowed: 'Band not allowed',
  invalid_band: 'Band not readable',
  invalid_uncertainty: 'Uncertainty not readable',
  out_of_range: 'Value out of range',
  missing_source: 'Missing source',
  unknown_source: 'Unknown source',
  duplicate: 'Duplicate',
  too_long: 'Text too long',
};

/** What a dry run found: counts, the reasons, and every rejected row with its number. */
export function ImportReport({ report }: { report: Report }) {
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-3 gap-3 text-sm">
        {[
          ['Rows read', report.totalRows],
          ['Ready to import', report.acceptedCount],
          ['Rejected', report.rejectedCount],
        ].map(([label, n]) => (
          <div key={label} className="rounded-md border border-rule bg-panel px-3 py-2">
            <dt className="text-xs uppercase tracking-wide text-muted">{label}</dt>
            <dd className="text-xl font-semibold tabular-nums">{Number(n).toLocaleString()}</dd>
          </div>
        ))}
      </dl>
      <p className="text-xs text-muted">
        Read as UTF-8{report.hadByteOrderMark ? ' (with a byte-order mark)' : ''}, columns separated by{' '}
        {report.delimiter === ';' ? 'semicolons' : report.delimiter === ',' ? 'commas' : 'tabs'}, checked in{' '}
        {report.durationMs.toLocaleString()} ms.
      </p>
      {report.warnings.map((w) => (
        <p key={w} className="text-sm text-changed">
          {w}
        </p>
      ))}
      {(report.confirmationCount ?? 0) > 0 && (
        <DataTable caption="Rows to confirm before importing" columns={[{ label: 'Row' }, { label: 'What to check' }]}>
          {(report.confirmations ?? []).map((c) => (
            <tr key={c.row} className="border-b border-rule last:border-0">
              <td className="px-4 py-1.5 tabular-nums">{c.row}</td>
              <td className="px-4 py-1.5">{c.message}</td>
            </tr>
          ))}
        </DataTable>
      )}
      {report.rejectedCount > 0 && (
        <DataTable caption="Rejected rows" columns={[{ label: 'Row' }, { label: 'Reason' }, { label: 'What to fix' }]}>
          {report.rejections.map((r) => (
            <tr key={`${r.row}-${r.reason}`} className="border-b border-rule last:border-0">
              <td className="px-4 py-1.5 tabular-nums">{r.row}</td>
              <td className="px-4 py-1.5 whitespace-nowrap text-broken">{REASONS[r.reason] ?? r.reason}</td>
              <td className="px-4 py-1.5">{r.message}</td>
            </tr>
          ))}
        </DataTable>
      )}
    </div>
  );
}
