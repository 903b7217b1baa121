import { findQuantity } from '@shared/catalogue/quantities.ts';
import type { MeasurementDto, MeasurementHistoryDto } from '@shared/schemas/measurement.ts';
import { formatMeasurement, formatNumber } from './format.ts';
import { formatDateTime } from '@/lib/format-date.ts';

/** How each action reads: before and after the measurement it is about. */
const ACTIONS: Record<string, [string, string]> = {
  created: ['added', ''],
  proposed: ['proposed', ''],
  updated: ['changed', ''],
  preferred: ['chose', 'as preferred'],
  unpreferred: ['unmarked', 'as preferred'],
  accepted: ['accepted the proposed', ''],
  declined: ['declined the proposed', ''],
  retired: ['retired', ''],
  imported: ['imported', ''],
};

const FIELD_LABELS: Record<string, string> = {
  value: 'value',
  enteredValue: 'value as entered',
  enteredUnit: 'unit',
  uncertainty: '±',
  uncertaintyMinus: '−',
  uncertaintyPlus: '+',
  sourceId: 'source',
  band: 'band',
  preferred: 'preferred',
  status: 'status',
  note: 'note',
  retired: 'retired',
};

const show = (v: unknown) =>
  v === null || v === undefined || v === ''
    ? '—'
    : typeof v === 'number'
      ? formatNumber(v)
      : typeof v === 'boolean'
        ? v
          ? 'yes'
          : 'no'
        : String(v);

/** Every change to the object's measurements, newest first (who, when, what, old and new), ending with the object's creation. */
export function HistoryList({ entries, measurements }: { entries: MeasurementHistoryDto[]; measurements: MeasurementDto[] }) {
  if (entries.length === 0) return <p className="text-sm text-muted">No changes recorded yet.</p>;
  const byId = new Map(measurements.map((m) => [m.id, m]));
  return (
    <ol className="divide-y divide-rule rounded-lg border border-rule bg-panel" aria-label="Measurement history">
      {entries.map((e) => {
        if (e.action === 'object_created')
          return (
            <li key={e.id} className="px-4 py-2.5 text-sm">
              <p>
                <span className="font-medium">{e.changedBy ?? 'Someone no longer listed'}</span> created the object{' '}
                <span className="font-medium">{String(e.newValues?.name ?? '')}</span>
                <span className="ml-2 text-xs text-muted">{formatDateTime(e.createdAt)}</span>
              </p>
            </li>
          );
        const m = e.measurementId ? byId.get(e.measurementId) : undefined;
        const what = m
          ? `${(findQuantity(m.quantity)?.label ?? m.quantity).toLowerCase()}${m.band ? ` (${m.band})` : ''} ${formatMeasurement(m)}`
          : (findQuantity(e.quantity ?? '')?.label.toLowerCase() ?? 'a measurement');
        const [before, after] = ACTIONS[e.action] ?? ['changed', ''];
        const changes =
          e.action === 'updated'
            ? Object.keys(e.newValues ?? {}).filter((k) => k !== 'value' || !('enteredValue' in (e.newValues ?? {})))
            : [];
        return (
          <li key={e.id} className="px-4 py-2.5 text-sm">
            <p>
              <span className="font-medium">{e.changedBy ?? 'Someone no longer listed'}</span> {before}{' '}
              <span className="font-mono tabular-nums">{what}</span>
              {after && ` ${after}`}
              <span className="ml-2 text-xs text-muted">{formatDateTime(e.createdAt)}</span>
            </p>
            {changes.length > 0 && (
              <ul className="mt-1 text-xs text-muted">
                {changes.map((k) => (
                  <li key={k} className="font-mono tabular-nums">
                    {FIELD_LABELS[k] ?? k}: <del>{show(e.oldValues?.[k])}</del> →{' '}
                    <ins className="text-ink no-underline">{show(e.newValues?.[k])}</ins>
                  </li>
                ))}
              </ul>
            )}
            {e.reason && <p className="mt-0.5 text-xs italic text-muted">“{e.reason}”</p>}
          </li>
        );
      })}
    </ol>
  );
}
