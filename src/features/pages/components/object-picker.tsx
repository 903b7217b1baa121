import { useId, useState } from 'react';
import { useObjectSearch } from '../api/pages.ts';

/** Picks a catalogue object by name or designation; shows the first twenty matches. */
export function ObjectPicker({ value, onChange, label = 'Object', error }: { value: string; onChange: (id: string, name: string) => void; label?: string; error?: string }) {
  const [q, setQ] = useState('');
  const objects = useObjectSearch(q);
  const id = useId();
  return (
    <div className="space-y-2">
      <label htmlFor={`${id}-search`} className="block text-sm font-medium text-ink">{label}</label>
      <input
        id={`${id}-search`}
        type="search"
        value={q}
        onChange={(e) => setQ(e.target.value)}
        placeholder="Search the catalogue, e.g. Andromeda or M31"
        className="block w-full rounded-md border border-rule bg-panel px-3 py-2 text-sm focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30"
      />
      <select
        aria-label={`${label} from the catalogue`}
        size={6}
        value={value}
        onChange={(e) => onChange(e.target.value, e.target.selectedOptions[0]?.text ?? '')}
        className={`block w-full rounded-md border bg-panel px-2 py-1 text-sm ${error ? 'border-broken' : 'border-rule'}`}
      >
        {/* With nothing chosen, React would otherwise mark the first object selected on screen while the form holds none, and choosing it would send no change. */}
        <option value="" disabled hidden />
        {(objects.data ?? []).map((o) => (
          <option key={o.id} value={o.id}>{o.name}{o.designations.length ? ` (${o.designations.slice(0, 2).join(', ')})` : ''} · {o.kind}</option>
        ))}
      </select>
      {objects.data?.length === 0 && <p className="text-xs text-muted">No object matches “{q}”.</p>}
      {error && <p className="text-xs font-medium text-broken">{error}</p>}
    </div>
  );
}
