import { zodResolver } from '@hookform/resolvers/zod';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { VenueCreateSchema, type VenueCreateInput, type VenueCreateValues, type VenueDto } from '@shared/schemas/venue.ts';
import { useCreateVenue, useUpdateVenue } from '@/api/venues.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';

const FIELDS = ['name', 'latitude', 'longitude', 'elevationM', 'timeZone'] as const;

/** Every IANA zone the browser knows, for the time zone field's suggestions. */
function useTimeZones(): string[] {
  return useMemo(() => (typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : []), []);
}

/**
 * Adds a venue, or changes one when `venue` is given. Moving a venue recomputes its sky. Focus starts in its first field, since the button that opened it is gone.
 */
export function VenueForm({
  venue,
  onDone,
  onCancel,
}: {
  venue?: VenueDto;
  onDone: (saved: VenueDto) => void;
  onCancel: () => void;
}) {
  const create = useCreateVenue();
  const update = useUpdateVenue(venue?.id ?? '');
  const zones = useTimeZones();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<VenueCreateInput, unknown, VenueCreateValues>({
    resolver: zodResolver(VenueCreateSchema),
    defaultValues: venue
      ? {
          name: venue.name,
          latitude: String(venue.latitude),
          longitude: String(venue.longitude),
          elevationM: String(venue.elevationM),
          timeZone: venue.timeZone,
        }
      : { elevationM: '0', timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone },
  });
  const mutation = venue ? update : create;
  const onSubmit = handleSubmit((values) => {
    setFormError(undefined);
    mutation.mutate(values, {
      onSuccess: onDone,
      onError: (error) => setFormError(applyServerErrors(error, setError, [...FIELDS])),
    });
  });
  const errors = formState.errors;
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={venue ? 'Edit venue' : 'Add a venue'}
      className="grid gap-4 rounded-lg border border-rule bg-panel p-5 sm:grid-cols-6"
    >
      {formError && (
        <div className="sm:col-span-6">
          <Notice tone="error">{formError}</Notice>
        </div>
      )}
      <TextField
        className="sm:col-span-3"
        label="Name"
        autoComplete="off"
        autoFocus
        error={errors.name?.message}
        {...register('name')}
      />
      <TextField
        className="sm:col-span-3"
        label="Time zone"
        list="venue-time-zones"
        autoComplete="off"
        hint="An IANA name, e.g. Europe/London"
        error={errors.timeZone?.message}
        {...register('timeZone')}
      />
      <datalist id="venue-time-zones">
        {zones.map((z) => (
          <option key={z} value={z} />
        ))}
      </datalist>
      <TextField
        className="sm:col-span-2"
        label="Latitude (°)"
        inputMode="decimal"
        hint="North positive, −90 to 90"
        error={errors.latitude?.message}
        {...register('latitude')}
      />
      <TextField
        className="sm:col-span-2"
        label="Longitude (°)"
        inputMode="decimal"
        hint="East positive, −180 to 180"
        error={errors.longitude?.message}
        {...register('longitude')}
      />
      <TextField
        className="sm:col-span-2"
        label="Elevation (m)"
        inputMode="decimal"
        hint="Above sea level"
        error={errors.elevationM?.message}
        {...register('elevationM')}
      />
      <div className="flex gap-2 sm:col-span-6">
        <Button type="submit" busy={mutation.isPending}>
          {venue ? 'Save changes' : 'Add venue'}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
