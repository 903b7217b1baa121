import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { SourceInputSchema, type SourceDto, type SourceValues } from '@shared/schemas/source.ts';
import { SourceProposalSchema } from '@shared/schemas/catalogue-proposal.ts';
import { useProposeSource } from '@/api/catalogue-proposals.ts';
import { useCreateSource, useUpdateSource } from '@/api/sources.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';

interface FormValues {
  citation: string;
  bibcode: string;
  doi: string;
  url: string;
  catalogueName: string;
  retrievedOn: string;
  notes: string;
}

const FIELDS = ['citation', 'bibcode', 'doi', 'url', 'catalogueName', 'retrievedOn', 'notes'] as const;

/**
 * Adds a source, or corrects one when `source` is given; with `onProposed` (writers and editors), it
 * proposes one for a reviewer instead, with a bibcode, DOI or URL the reviewer can follow.
 */
export function SourceForm({
  source,
  onDone,
  onProposed,
}: {
  source?: SourceDto;
  onDone: () => void;
  onProposed?: (title: string) => void;
}) {
  const create = useCreateSource();
  const update = useUpdateSource();
  const propose = useProposeSource();
  const proposing = !!onProposed && !source;
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, getValues, formState } = useForm<FormValues, unknown, SourceValues>({
    resolver: zodResolver(proposing ? SourceProposalSchema : SourceInputSchema) as unknown as Resolver<
      FormValues,
      unknown,
      SourceValues
    >,
    defaultValues: Object.fromEntries(FIELDS.map((f) => [f, source?.[f] ?? ''])) as unknown as FormValues,
  });
  const errors = formState.errors;
  const onSubmit = handleSubmit(() => {
    setFormError(undefined);
    const options = {
      onSuccess: onDone,
      onError: (error: Error) => setFormError(applyServerErrors(error, setError, [...FIELDS])),
    };
    if (source) update.mutate({ id: source.id, ...getValues() }, options);
    else if (proposing) propose.mutate(getValues(), { ...options, onSuccess: (p) => onProposed?.(p.title) });
    else create.mutate(getValues(), options);
  });
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={source ? 'Edit source' : proposing ? 'Propose a source' : 'Add a source'}
      className="grid gap-4 rounded-lg border border-rule bg-panel p-5 sm:grid-cols-2"
    >
      {formError && (
        <div className="sm:col-span-2">
          <Notice tone="error">{formError}</Notice>
        </div>
      )}
      <TextField
        label="Citation"
        className="sm:col-span-2"
        placeholder="Authors (year), journal volume, page"
        autoComplete="off"
        error={errors.citation?.message}
        {...register('citation')}
      />
      <TextField
        label="Bibcode"
        placeholder="19 characters, as the ADS lists it"
        autoComplete="off"
        error={errors.bibcode?.message}
        {...register('bibcode')}
      />
      <TextField label="DOI" placeholder="10.…/…" autoComplete="off" error={errors.doi?.message} {...register('doi')} />
      <TextField
        label="URL"
        type="url"
        placeholder="https://…"
        autoComplete="off"
        error={errors.url?.message}
        {...register('url')}
      />
      <TextField label="Catalogue name" autoComplete="off" error={errors.catalogueName?.message} {...register('catalogueName')} />
      <TextField label="Retrieved on" type="date" error={errors.retrievedOn?.message} {...register('retrievedOn')} />
      <TextField label="Notes" autoComplete="off" error={errors.notes?.message} {...register('notes')} />
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={create.isPending || update.isPending || propose.isPending}>
          {source ? 'Save source' : proposing ? 'Propose source' : 'Add source'}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
