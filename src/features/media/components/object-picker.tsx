import { useState } from 'react';
import { useObjectSuggestions } from '@/api/media.ts';
import { Icon } from '@/components/ui/icon.tsx';

type Obj = { id: string; name: string };

/** The catalogue objects an image shows: type to find one, remove with its × button. */
export function ObjectPicker({ value, onChange }: { value: Obj[]; onChange: (objects: Obj[]) => void }) {
  const [text, setText] = useState('');
  const suggestions = useObjectSuggestions(text);
  const options = (suggestions.data ?? []).filter((o) => !value.some((v) => v.id === o.id));
  return (
    <div>
      <label htmlFor="object-search" className="mb-1 block text-sm font-medium text-ink">
        Objects shown
      </label>
      {value.length > 0 && (
        <ul className="mb-2 flex flex-wrap gap-1.5" aria-label="Linked objects">
          {value.map((o) => (
            <li
              key={o.id}
              className="inline-flex items-center gap-1 rounded-full border border-rule bg-wash py-0.5 pl-2.5 pr-1 text-xs"
            >
              {o.name}
              <button
                type="button"
                aria-label={`Remove ${o.name}`}
                className="rounded-full p-0.5 hover:bg-rule"
                onClick={() => onChange(value.filter((v) => v.id !== o.id))}
              >
                <Icon name="x" className="size-3" />
              </button>
            </li>
          ))}
        </ul>
      )}
      <input
        id="object-search"
        type="search"
        value={text}
        onChange={(e) => setText(e.target.value)}
        placeholder="Type a name or designation, e.g. M31"
        className="block w-full rounded-md border border-rule bg-panel px-3 py-2 text-sm focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30"
      />
      {text.trim() && (
        <ul className="mt-1 max-h-40 overflow-auto rounded-md border border-rule bg-panel text-sm" aria-label="Matching objects">
          {options.map((o) => (
            <li key={o.id}>
              <button
                type="button"
                className="block w-full px-3 py-1.5 text-left hover:bg-wash"
                onClick={() => {
                  onChange([...value, o]);
                  setText('');
                }}
              >
                {o.name}
              </button>
            </li>
          ))}
          {suggestions.isSuccess && options.length === 0 && (
            <li className="px-3 py-1.5 text-muted">No object in the catalogue matches.</li>
          )}
        </ul>
      )}
    </div>
  );
}
