import { useEffect } from 'react';
import { useVenueChoices } from '@/api/venues.ts';
import { SelectField } from '@/components/ui/field.tsx';

/**
 * Chooses the venue a statement about tonight's sky is for. With a single venue it is chosen at
 * once; with none, it says who adds venues.
 * @param value the chosen venue id ('' for none yet)
 * @param onChange called with the venue id
 */
export function VenueChoiceField({
  value,
  onChange,
  className = '',
}: {
  value: string;
  onChange: (venueId: string) => void;
  className?: string;
}) {
  const venues = useVenueChoices();
  const list = venues.data ?? [];
  const only = list.length === 1 ? list[0].id : null;
  useEffect(() => {
    if (only && value === '') onChange(only);
  }, [only, value, onChange]);
  if (venues.isSuccess && list.length === 0)
    return <p className="text-xs text-muted">No venues yet: an admin adds them under Venues.</p>;
  return (
    <SelectField
      label="Venue whose night it is"
      value={value}
      onChange={(e) => onChange(e.target.value)}
      disabled={!venues.isSuccess}
      error={venues.error?.message}
      className={className}
    >
      <option value="">{venues.isPending ? 'Loading venues…' : 'Choose a venue…'}</option>
      {list.map((v) => (
        <option key={v.id} value={v.id}>
          {v.name} ({v.timeZone})
        </option>
      ))}
    </SelectField>
  );
}
