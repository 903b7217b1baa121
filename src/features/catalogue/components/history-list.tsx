import { findQuantity } from '@shared/catalogue/quantities.ts';
import type { MeasurementHistoryDto } from '@shared/schemas/measurement.ts';
import { formatDateTime, formatNumber } from './format.ts';

const ACTIONS: Record<string, string> = {
  created: 'added',
  proposed: 'proposed',
  updated: 'changed',
  preferred: 'marked as preferred',
  unpreferred: 'unmarked as preferred',
  accepted: 'accepted the proposal for',
  declined: 'declined the proposal for',
  retired: 'retired',
  imported: 'imported',
};

const FIELD_LABELS: Record<string, string> = {
  value: 'value', enteredValue: 'value as entered', enteredUnit: 'unit', uncertainty: '±', uncertaintyMinus: '−', uncertaintyPlus: '+',
  sourceId: 'source', band: 'band', preferred: 'preferred', status: 'status', note: 'note', retired: 'retired',
};

const show = (v: unknown) => (v === null || v === undefined || v === '' ? '—' : typeof v === 'number' ? formatNumber(v) : typeof v === 'boolean' ? (v ? 'yes' : 'no') : String(v));

/** Every change to the object's measurements, newest first: who, when, old and new. */
export function HistoryList({ entries }: { entries: MeasurementHistoryDto[] }) {
  if (entries.length === 0) return <p className="text-sm text-muted">No changes recorded yet.</p>;
  return (
    <ol className="divide-y divide-rule rounded-lg border border-rule bg-panel" aria-label="Measurement history">
      {entries.map((e) => {
        const quantity = e.quantity ? (findQuantity(e.quantity)?.label ?? e.quantity).toLowerCase() : 'a measurement';
        const changes = e.action === 'updated' ? Object.keys(e.newValues ?? {}).filter((k) => k !== 'value' || !('enteredValue' in (e.newValues ?? {}))) : [];
        return (
          <li key={e.id} className="px-4 py-2.5 text-sm">
            <p>
              <span className="font-medium">{e.changedBy ?? 'Someone no longer listed'}</span> {ACTIONS[e.action] ?? e.action} {e.action === 'imported' || e.action === 'created' || e.action === 'proposed' ? `a ${quantity} of ${show(e.newValues?.enteredValue)} ${show(e.newValues?.enteredUnit) === '—' ? '' : show(e.newValues?.enteredUnit)}` : `the ${quantity}`}
              <span className="ml-2 text-xs text-muted">{formatDateTime(e.createdAt)}</span>
            </p>
            {changes.length > 0 && (
              <ul className="mt-1 text-xs text-muted">
                {changes.map((k) => (
                  <li key={k} className="font-mono tabular-nums">
                    {FIELD_LABELS[k] ?? k}: <del>{show(e.oldValues?.[k])}</del> → <ins className="no-underline text-ink">{show(e.newValues?.[k])}</ins>
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
