import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Resolver, type UseFormRegisterReturn } from 'react-hook-form';
import { KIND_LABELS, MOVING_KINDS, SKY_OBJECT_KINDS } from '@shared/catalogue/kinds.ts';
import {
  SkyObjectInputSchema,
  type SkyObjectDto,
  type SkyObjectFormValues,
  type SkyObjectValues,
} from '@shared/schemas/sky-object.ts';
import { useCreateSkyObject, useUpdateSkyObject } from '@/api/catalogue-objects.ts';
import { PROPOSAL_SOURCE_MISSING } from '@shared/schemas/catalogue-proposal.ts';
import { useProposeObject } from '@/api/catalogue-proposals.ts';
import { useSources } from '@/api/sources.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ApiRequestError } from '@/lib/api-client.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';

const toForm = (object?: SkyObjectDto): SkyObjectFormValues => ({
  name: object?.name ?? '',
  designations: object?.designations.join(', ') ?? '',
  kind: object?.kind ?? 'star',
  ra: object?.raDeg === null || object?.raDeg === undefined ? '' : String(object.raDeg),
  dec: object?.decDeg === null || object?.decDeg === undefined ? '' : String(object.decDeg),
  notes: object?.notes ?? '',
  sentenceEn: object?.sentenceNames.en?.text ?? '',
  sentenceEnPlural: object?.sentenceNames.en?.plural ?? false,
  sentenceFr: object?.sentenceNames.fr?.text ?? '',
  sentenceFrPlural: object?.sentenceNames.fr?.plural ?? false,
});

/** The form's flat sentence-name fields as the API takes them (a blank text → the name as listed). */
const sentenceNamesOf = (v: SkyObjectFormValues) => ({
  en: { text: v.sentenceEn.trim(), plural: v.sentenceEnPlural },
  fr: { text: v.sentenceFr.trim(), plural: v.sentenceFrPlural },
});

/** One language's sentence name: the text, and whether it takes a plural verb. */
function SentenceNameField({
  label,
  hint,
  text,
  plural,
  pluralLabel,
}: {
  label: string;
  hint: string;
  text: UseFormRegisterReturn;
  plural: UseFormRegisterReturn;
  pluralLabel: string;
}) {
  return (
    <div className="space-y-1">
      <TextField label={label} hint={hint} autoComplete="off" {...text} />
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" className="size-4 accent-accent" {...plural} />
        {pluralLabel}
      </label>
    </div>
  );
}

/** The source picker of a proposal: a proposed object cites where its name and position come from. */
function ProposalSourceField({ value, error, onChange }: { value: string; error?: string; onChange: (id: string) => void }) {
  const sources = useSources();
  return (
    <SelectField
      label="Source"
      hint="Where the name and position come from. Not in the list? Propose the source first, under Sources."
      className="sm:col-span-2"
      error={error}
      value={value}
      onChange={(e) => onChange(e.target.value)}
    >
      <option value="">Choose the source (a proposal needs one)</option>
      {sources.data?.map((s) => (
        <option key={s.id} value={s.id}>
          {s.citation}
        </option>
      ))}
    </SelectField>
  );
}

/**
 * Adds an object, or edits one when `object` is given; with `onProposed` (writers and editors), it
 * proposes one for a reviewer instead, citing a source. Position in degrees or sexagesimal; the
 * constellation is computed by the server from it. Focus starts in its first field, since the
 * button that opened it is gone.
 */
export function ObjectForm({
  object,
  onDone,
  onProposed,
  onCancel,
}: {
  object?: SkyObjectDto;
  onDone: (saved: SkyObjectDto) => void;
  onProposed?: (title: string) => void;
  onCancel: () => void;
}) {
  const create = useCreateSkyObject();
  const update = useUpdateSkyObject(object?.id ?? '');
  const propose = useProposeObject();
  const proposing = !!onProposed && !object;
  const mutation = proposing ? propose : object ? update : create;
  const [sourceId, setSourceId] = useState('');
  const [sourceError, setSourceError] = useState<string>();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, watch, getValues, formState } = useForm<
    SkyObjectFormValues,
    unknown,
    SkyObjectValues
  >({
    resolver: zodResolver(SkyObjectInputSchema) as unknown as Resolver<SkyObjectFormValues, unknown, SkyObjectValues>,
    defaultValues: toForm(object),
  });
  const moving = MOVING_KINDS.includes(watch('kind'));
  const errors = formState.errors;
  const onSubmit = handleSubmit(() => {
    setFormError(undefined);
    setSourceError(undefined);
    // The server parses the same text again (one schema, two uses), so send what was typed.
    const { sentenceEn, sentenceEnPlural, sentenceFr, sentenceFrPlural, ...fields } = getValues();
    const raw = {
      ...fields,
      sentenceNames: sentenceNamesOf({ sentenceEn, sentenceEnPlural, sentenceFr, sentenceFrPlural, ...fields }),
    };
    const input = moving ? { ...raw, ra: '', dec: '' } : raw;
    const onError = (error: Error) => {
      const fields = error instanceof ApiRequestError ? error.fields : undefined;
      if (fields?.sourceId) setSourceError(fields.sourceId);
      const rest = applyServerErrors(error, setError, ['name', 'designations', 'kind', 'ra', 'dec', 'notes']);
      setFormError(fields?.sourceId && Object.keys(fields).length === 1 ? undefined : rest);
    };
    if (proposing && !sourceId) return setSourceError(PROPOSAL_SOURCE_MISSING);
    if (proposing) propose.mutate({ ...input, sourceId }, { onSuccess: (p) => onProposed?.(p.title), onError });
    else (object ? update : create).mutate(input, { onSuccess: onDone, onError });
  });
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={object ? 'Edit object' : proposing ? 'Propose an object' : 'Add an object'}
      className="grid gap-4 rounded-lg border border-rule bg-panel p-5 sm:grid-cols-2"
    >
      {formError && (
        <div className="sm:col-span-2">
          <Notice tone="error">{formError}</Notice>
        </div>
      )}
      <TextField label="Name" autoComplete="off" autoFocus error={errors.name?.message} {...register('name')} />
      <SelectField label="Kind" error={errors.kind?.message} {...register('kind')}>
        {SKY_OBJECT_KINDS.map((kind) => (
          <option key={kind} value={kind}>
            {KIND_LABELS[kind]}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Other designations"
        hint="Separated by commas, e.g. M31, NGC 224"
        autoComplete="off"
        error={errors.designations?.message}
        className="sm:col-span-2"
        {...register('designations')}
      />
      {moving ? (
        <p className="text-sm text-muted sm:col-span-2">
          Planets, moons and the Sun move across the sky, so they have no fixed position here.
        </p>
      ) : (
        <>
          <TextField
            label="Right ascension (J2000)"
            placeholder="05h 35m 17.3s or 83.822"
            hint="Hours, minutes, seconds — or degrees"
            autoComplete="off"
            error={errors.ra?.message}
            {...register('ra')}
          />
          <TextField
            label="Declination (J2000)"
            placeholder="−05° 23′ 28″ or −5.391"
            hint="Degrees, arcminutes, arcseconds — or degrees"
            autoComplete="off"
            error={errors.dec?.message}
            {...register('dec')}
          />
        </>
      )}
      <fieldset className="grid gap-4 sm:col-span-2 sm:grid-cols-2">
        <legend className="mb-1 text-sm font-medium text-ink">Name in a sentence</legend>
        <p className="text-xs text-muted sm:col-span-2">
          How statements name it, with its article: “the Andromeda Galaxy”, “the Pleiades” (plural). Leave empty when the name
          stands alone (“Sirius”, “3C 279”).
        </p>
        <SentenceNameField
          label="English"
          hint="e.g. the Pleiades"
          text={register('sentenceEn')}
          plural={register('sentenceEnPlural')}
          pluralLabel="Takes a plural verb (“are”)"
        />
        <SentenceNameField
          label="French"
          hint="e.g. les Pléiades"
          text={register('sentenceFr')}
          plural={register('sentenceFrPlural')}
          pluralLabel="Pluriel (« sont »)"
        />
      </fieldset>
      {proposing && <ProposalSourceField value={sourceId} error={sourceError} onChange={setSourceId} />}
      <div className="sm:col-span-2">
        <label htmlFor="object-notes" className="mb-1 block text-sm font-medium text-ink">
          Notes
        </label>
        <textarea
          id="object-notes"
          rows={2}
          className="block w-full rounded-md border border-rule bg-panel px-3 py-2 text-sm focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30"
          {...register('notes')}
        />
      </div>
      <div className="flex gap-2 sm:col-span-2">
        <Button type="submit" busy={mutation.isPending}>
          {object ? 'Save object' : proposing ? 'Propose object' : 'Add object'}
        </Button>
        <Button type="button" variant="secondary" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
