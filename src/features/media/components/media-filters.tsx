import { useEffect, useMemo, useState } from 'react';
import { LICENCES } from '@shared/media/licences.ts';
import type { MediaListQuery } from '@shared/media/schemas.ts';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { useDebouncedValue } from '@/lib/use-debounced-value.ts';

type SearchIn = 'q' | 'object' | 'credit';

/** Search by object, credit or anything, and filter by licence; typing is debounced. */
export function MediaFilters({ onChange }: { onChange: (query: MediaListQuery) => void }) {
  const [text, setText] = useState('');
  const [searchIn, setSearchIn] = useState<SearchIn>('q');
  const [licence, setLicence] = useState<MediaListQuery['licence'] | ''>('');
  const query = useMemo(
    (): MediaListQuery => ({ [searchIn]: text.trim() || undefined, licence: licence || undefined }),
    [text, searchIn, licence],
  );
  const settledQuery = useDebouncedValue(query, 250);
  useEffect(() => onChange(settledQuery), [settledQuery, onChange]);
  return (
    <search className="grid gap-3 sm:grid-cols-[1fr_11rem_16rem]">
      <TextField
        label="Search"
        type="search"
        placeholder="Object, credit, alt text or file name"
        value={text}
        onChange={(e) => setText(e.target.value)}
      />
      <SelectField label="Search in" value={searchIn} onChange={(e) => setSearchIn(e.target.value as SearchIn)}>
        <option value="q">Everything</option>
        <option value="object">Objects shown</option>
        <option value="credit">Credit line</option>
      </SelectField>
      <SelectField label="Licence" value={licence} onChange={(e) => setLicence(e.target.value as MediaListQuery['licence'] | '')}>
        <option value="">Any licence</option>
        <option value="none">No licence yet</option>
        {LICENCES.map((l) => (
          <option key={l.id} value={l.id}>
            {l.label}
          </option>
        ))}
      </SelectField>
    </search>
  );
}
