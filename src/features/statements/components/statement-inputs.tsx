import type { StatementDto } from '@shared/schemas/statement.ts';
import { DataTable, WIDE_COLUMN } from '@/components/ui/data-table.tsx';
import { formatSig } from '@/components/working/format-number.ts';

// Stored values come back from unit conversion with float noise (16399999.999999998); the working shows six figures too.
const uncertainty = (i: StatementDto['inputs'][number]) =>
  i.sigma != null
    ? `± ${formatSig(i.sigma)}`
    : i.minus != null && i.plus != null
      ? `−${formatSig(i.minus)} / +${formatSig(i.plus)}`
      : 'not stated';

/** The preferred measurements the statement used, each with its source (or why there are none). */
export function StatementInputs({ statement }: { statement: StatementDto }) {
  if (statement.inputs.length === 0) {
    return (
      <section aria-labelledby="inputs-heading" className="space-y-2">
        <h2 id="inputs-heading" className="text-lg font-semibold tracking-tight">
          Measurements used
        </h2>
        <p className="text-sm text-muted">
          {statement.venue
            ? `None from the catalogue: the distance comes from the sky computed for the night at ${statement.venue.name} (step 1 of the working).`
            : 'None from the catalogue.'}
        </p>
      </section>
    );
  }
  return (
    <section aria-labelledby="inputs-heading" className="space-y-3">
      <h2 id="inputs-heading" className="text-lg font-semibold tracking-tight">
        Measurements used
      </h2>
      {statement.status === 'broken' && (
        // A statement is never created broken, and a failed recompute keeps the last working's inputs.
        <p className="text-sm text-muted">
          When it was last worked out. The catalogue’s preferred values now are the ones that cannot be worked out (above).
        </p>
      )}
      {/* On a phone the uncertainty goes under the value and the source under the quantity. */}
      <DataTable
        columns={[
          { label: 'Quantity' },
          { label: 'Value' },
          { label: 'Uncertainty (68 %)', className: WIDE_COLUMN },
          { label: 'Source', className: WIDE_COLUMN },
        ]}
      >
        {statement.inputs.map((i) => {
          const unstated = i.sigma == null && i.minus == null ? 'text-changed' : '';
          return (
            <tr key={i.measurementId} className="h-10 border-b border-rule align-baseline last:border-0">
              <td className="px-4 py-2 [overflow-wrap:anywhere]">
                {i.quantity.replaceAll('_', ' ')}
                {i.band ? ` (${i.band})` : ''}
                <span className="mt-0.5 block text-xs text-muted sm:hidden">{i.citation}</span>
              </td>
              <td className="px-4 py-2 tabular-nums">
                {formatSig(i.value)} {i.unit}
                <span className={`mt-0.5 block text-xs sm:hidden ${unstated || 'text-muted'}`}>{uncertainty(i)}</span>
              </td>
              <td className={`px-4 py-2 tabular-nums ${unstated} ${WIDE_COLUMN}`}>{uncertainty(i)}</td>
              <td className={`px-4 py-2 text-muted ${WIDE_COLUMN}`}>{i.citation}</td>
            </tr>
          );
        })}
      </DataTable>
    </section>
  );
}
