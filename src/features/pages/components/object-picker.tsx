import { KIND_LABELS, type SkyObjectKind } from '@shared/catalogue/kinds.ts';
import { useId, useState } from 'react';
import { useObjectSearch } from '@/api/catalogue-objects.ts';
import { useDebouncedValue } from '@/lib/use-debounced-value.ts';
import { objectCountText } from '../object-count.ts';

/** Long enough to skip the keys of a word typed at speed, short enough to feel immediate. */
const SEARCH_PAUSE_MS = 200;

/**
 * Picks a catalogue object by name or designation. The server searches the whole catalogue from the
 * first key (after a short pause in typing); the list shows the first twenty matches and says how many
 * there are in all.
 * @param valueLabel how to name `value` when the current matches do not include it
 */
export function ObjectPicker({
  value,
  onChange,
  label = 'Object',
  error,
  valueLabel,
}: {
  value: string;
  /** `kind` is the object's kind when it is among the current matches. */
  onChange: (id: string, name: string, kind?: string) => void;
  label?: string;
  error?: string;
  valueLabel?: string;
}) {
  const [q, setQ] = useState('');
  const [picked, setPicked] = useState<{ id: string; text: string } | null>(null);
  const searched = useDebouncedValue(q, SEARCH_PAUSE_MS);
  const objects = useObjectSearch(searched);
  const id = useId();
  const rows = objects.data?.rows ?? [];
  const waiting = q !== searched || objects.isFetching;
  // A chosen object stays listed while the search moves on. Otherwise React would mark the first match
  // selected on screen while the form still holds the earlier choice (or none).
  const keepChosen = value !== '' && !rows.some((o) => o.id === value);
  return (
    <div className="space-y-2">
      <label htmlFor={`${id}-search`} className="block text-sm font-medium text-ink">
        {label}
      </label>
      <input
        id={`${id}-search`}
        type="search"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        placeholder="Search the catalogue, e.g. Andromeda or M31"
        aria-describedby={`${id}-count`}
        className="block w-full rounded-md border border-rule bg-panel px-3 py-2 text-sm focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30"
      />
      <select
        aria-label={`${label} from the catalogue`}
        size={6}
        value={value}
        onChange={(e) => {
          const text = e.target.selectedOptions[0]?.text ?? '';
          setPicked({ id: e.target.value, text });
          onChange(e.target.value, text, rows.find((o) => o.id === e.target.value)?.kind);
        }}
        className={`block w-full rounded-md border bg-panel px-2 py-1 text-sm ${error ? 'border-broken' : 'border-rule'}`}
      >
        <option value="" disabled hidden />
        {keepChosen && (
          <option value={value}>{picked?.id === value ? picked.text : (valueLabel ?? 'The object chosen before')}</option>
        )}
        {rows.map((o) => (
          <option key={o.id} value={o.id}>
            {o.name}
            {o.designations.length ? ` (${o.designations.slice(0, 2).join(', ')})` : ''} ·{' '}
            {KIND_LABELS[o.kind as SkyObjectKind] ?? 'object'}
          </option>
        ))}
      </select>
      <p id={`${id}-count`} aria-live="polite" className="text-xs text-muted">
        {objects.data
          ? `${objectCountText(rows.length, objects.data.total, objects.data.totalExact, searched)}${waiting ? ' · searching…' : ''}`
          : 'Loading the catalogue…'}
      </p>
      {error && <p className="text-xs font-medium text-broken">{error}</p>}
    </div>
  );
}
