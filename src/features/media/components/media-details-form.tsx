import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { findLicence, LICENCES } from '@shared/media/licences.ts';
import {
  MediaDetailsFormSchema,
  type FocalPoint,
  type MediaDetailDto,
  type MediaDetailsFormInput,
} from '@shared/media/schemas.ts';
import { useUpdateMedia } from '@/api/media.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { FocalPointPicker } from './focal-point-picker.tsx';
import { ObjectPicker } from './object-picker.tsx';

/** Credit, licence, source, alt text, focal point and objects of one image. */
export function MediaDetailsForm({ media, preview }: { media: MediaDetailDto; preview: string | null }) {
  const update = useUpdateMedia();
  const [formError, setFormError] = useState<string>();
  const [saved, setSaved] = useState(false);
  const [focal, setFocal] = useState<FocalPoint>(media.focalPoint);
  const [objects, setObjects] = useState(media.objects);
  const { register, handleSubmit, setError, formState, watch } = useForm<MediaDetailsFormInput>({
    resolver: zodResolver(MediaDetailsFormSchema),
    defaultValues: {
      altText: media.altText,
      credit: media.credit,
      licenceId: media.licence?.id ?? '',
      sourceUrl: media.sourceUrl,
    },
  });
  const licence = findLicence(watch('licenceId'));
  // "Saved." speaks of the last save only: it goes when a later attempt is refused (here or by the server) or a field changes.
  const onSubmit = handleSubmit(
    (values) => {
      setFormError(undefined);
      setSaved(false);
      update.mutate(
        { id: media.id, ...values, licenceId: values.licenceId || null, focalPoint: focal, objectIds: objects.map((o) => o.id) },
        {
          onSuccess: () => setSaved(true),
          onError: (error) => setFormError(applyServerErrors(error, setError, ['altText', 'credit', 'licenceId', 'sourceUrl'])),
        },
      );
    },
    () => setSaved(false),
  );
  return (
    <form onSubmit={onSubmit} onChange={() => setSaved(false)} noValidate aria-label="Image details" className="space-y-4">
      {formError && <Notice tone="error">{formError}</Notice>}
      <div>
        <label htmlFor="alt-text" className="mb-1 block text-sm font-medium text-ink">
          Alt text
        </label>
        <textarea
          id="alt-text"
          rows={3}
          aria-invalid={formState.errors.altText ? true : undefined}
          aria-describedby="alt-text-hint"
          className={`block w-full rounded-md border bg-panel px-3 py-2 text-sm focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30 ${formState.errors.altText ? 'border-broken' : 'border-rule'}`}
          {...register('altText')}
        />
        <p id="alt-text-hint" className={`mt-1 text-xs ${formState.errors.altText ? 'font-medium text-broken' : 'text-muted'}`}>
          {formState.errors.altText?.message ?? 'What the image shows, for people who cannot see it.'}
        </p>
      </div>
      <TextField
        label="Credit line"
        placeholder="e.g. Corrie Vale Astro Society (demo)"
        error={formState.errors.credit?.message}
        {...register('credit')}
      />
      <SelectField label="Licence" error={formState.errors.licenceId?.message} {...register('licenceId')}>
        <option value="">Choose a licence…</option>
        {LICENCES.map((l) => (
          <option key={l.id} value={l.id}>
            {l.label}
          </option>
        ))}
      </SelectField>
      {licence?.url && (
        <p className="-mt-2 text-xs text-muted">
          Terms:{' '}
          <a className="text-accent hover:underline" href={licence.url} target="_blank" rel="noreferrer">
            {licence.url}
          </a>
        </p>
      )}
      <TextField
        label="Source web address"
        type="url"
        placeholder="https://"
        error={formState.errors.sourceUrl?.message}
        {...register('sourceUrl')}
      />
      {preview && (
        <FocalPointPicker src={preview} alt="" width={media.width} height={media.height} value={focal} onChange={setFocal} />
      )}
      <ObjectPicker value={objects} onChange={setObjects} />
      <div className="flex items-center gap-3">
        <Button type="submit" busy={update.isPending}>
          Save details
        </Button>
        {saved && !update.isPending && (
          <span role="status" className="text-sm text-ok">
            Saved.
          </span>
        )}
      </div>
    </form>
  );
}
