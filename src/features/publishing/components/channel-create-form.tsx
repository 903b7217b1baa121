import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { ChannelCreateSchema, type ChannelCreateInput, type ChannelDetailDto } from '@shared/schemas/channel.ts';
import type { VenueDto } from '@shared/schemas/venue.ts';
import { useCreateChannel } from '@/api/channels.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';

/**
 * A new, empty channel at one of the venues. Focus starts in its first field, since the button
 * that opened it is gone.
 * @param venues the venues to choose from (undefined while they load)
 */
export function ChannelCreateForm({
  venues,
  onDone,
  onCancel,
}: {
  venues: VenueDto[] | undefined;
  onDone: (channel: ChannelDetailDto) => void;
  onCancel: () => void;
}) {
  const create = useCreateChannel();
  const form = useForm<ChannelCreateInput>({
    resolver: zodResolver(ChannelCreateSchema),
    defaultValues: { name: '', venueId: '' },
  });
  const submit = form.handleSubmit(async (values) => {
    try {
      onDone(await create.mutateAsync(values));
    } catch (err) {
      const message = applyServerErrors(err, form.setError, ['name', 'venueId']);
      if (message) form.setError('root', { message });
    }
  });
  return (
    <form
      onSubmit={submit}
      aria-label="New channel"
      className="grid gap-4 rounded-lg border border-rule bg-panel p-4 sm:grid-cols-[1fr_1fr_auto] sm:items-end"
    >
      <TextField
        label="Channel name"
        autoFocus
        {...form.register('name')}
        error={form.formState.errors.name?.message}
        placeholder="Foyer loop"
      />
      <SelectField label="Venue" {...form.register('venueId')} error={form.formState.errors.venueId?.message}>
        <option value="">Choose a venue…</option>
        {venues?.map((v) => (
          <option key={v.id} value={v.id}>
            {v.name}
          </option>
        ))}
      </SelectField>
      <div className="flex gap-2">
        <Button type="submit" busy={form.formState.isSubmitting}>
          Create channel
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
      {form.formState.errors.root && (
        <div className="sm:col-span-3">
          <Notice tone="error">{form.formState.errors.root.message}</Notice>
        </div>
      )}
    </form>
  );
}
