import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { KNOWN_BANDS } from '@shared/catalogue/bands.ts';
import { parallaxWarnings } from '@shared/catalogue/measurement-warnings.ts';
import { findQuantity, findUnit, QUANTITIES, QUANTITY_IDS } from '@shared/catalogue/quantities.ts';
import {
  MeasurementInputSchema,
  readNumber,
  type MeasurementConfirmationDto,
  type MeasurementFormValues,
  type MeasurementInput,
  type MeasurementValues,
} from '@shared/schemas/measurement.ts';
import { confirmationOf, useAddMeasurement } from '@/api/measurements.ts';
import { useSources } from '@/api/sources.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';
import { ConfirmWarnings } from './confirm-warnings.tsx';

const FIELDS = [
  'quantity',
  'value',
  'unit',
  'band',
  'uncertainty',
  'uncertaintyMinus',
  'uncertaintyPlus',
  'sourceId',
  'note',
] as const;

/**
 * Adds a measurement (reviewers, admins) or proposes one for review (writers, editors). Focus starts in its first field, since the button that opened it is gone.
 */
export function MeasurementForm({ objectId, proposal, onDone }: { objectId: string; proposal: boolean; onDone: () => void }) {
  const add = useAddMeasurement(objectId);
  const sources = useSources();
  const [formError, setFormError] = useState<string>();
  // The server's warnings for what was sent (a negative parallax, a likely sign error), waiting for a yes.
  const [pending, setPending] = useState<{ input: MeasurementInput; confirmation: MeasurementConfirmationDto } | null>(null);
  const { register, handleSubmit, setError, watch, getValues, setValue, formState } = useForm<
    MeasurementFormValues,
    unknown,
    MeasurementValues
  >({
    resolver: zodResolver(MeasurementInputSchema) as unknown as Resolver<MeasurementFormValues, unknown, MeasurementValues>,
    // Hidden fields (another uncertainty kind, a band the quantity has not) drop out of validation.
    shouldUnregister: true,
    defaultValues: {
      quantity: 'redshift',
      value: '',
      unit: '',
      band: '',
      uncertaintyKind: 'symmetric',
      uncertainty: '',
      uncertaintyMinus: '',
      uncertaintyPlus: '',
      sourceId: '',
      note: '',
    },
  });
  const quantity = findQuantity(watch('quantity')) ?? QUANTITIES.redshift;
  const kind = watch('uncertaintyKind');
  const errors = formState.errors;
  // Told as it is typed: a negative parallax is kept as published but gives no distance.
  const typed = readNumber(watch('value'));
  const typedUnit = findUnit(quantity, watch('unit'));
  const parallaxNote =
    quantity.id === 'parallax' && typeof typed === 'number' && typedUnit
      ? parallaxWarnings(typed * typedUnit.toCanonical, null, []).find((w) => w.code === 'negative_parallax')
      : undefined;

  const send = (input: MeasurementInput) =>
    add.mutate(input, {
      onSuccess: () => {
        setPending(null);
        onDone();
      },
      onError: (error) => {
        const confirmation = confirmationOf(error);
        if (confirmation) return setPending({ input, confirmation });
        setPending(null);
        setFormError(applyServerErrors(error, setError, [...FIELDS]));
      },
    });

  const onSubmit = handleSubmit(() => {
    setFormError(undefined);
    const v = getValues();
    const input = {
      quantity: v.quantity,
      value: v.value,
      unit: v.unit,
      band: quantity.needsBand ? v.band : '',
      sourceId: v.sourceId || null,
      note: v.note,
      uncertainty: kind === 'symmetric' ? v.uncertainty : '',
      uncertaintyMinus: kind === 'asymmetric' ? v.uncertaintyMinus : '',
      uncertaintyPlus: kind === 'asymmetric' ? v.uncertaintyPlus : '',
    };
    send(input);
  });

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label={proposal ? 'Propose a measurement' : 'Add a measurement'}
      className="grid gap-4 rounded-lg border border-rule bg-panel p-5 sm:grid-cols-3"
    >
      {formError && (
        <div className="sm:col-span-3">
          <Notice tone="error">{formError}</Notice>
        </div>
      )}
      {proposal && (
        <div className="sm:col-span-3">
          <Notice>Your measurement is sent to a reviewer, who accepts or declines it. It is not used until accepted.</Notice>
        </div>
      )}
      <SelectField
        label="Quantity"
        autoFocus
        error={errors.quantity?.message}
        {...register('quantity', { onChange: (e) => setValue('unit', findQuantity(e.target.value)?.units[0].id ?? '') })}
      >
        {QUANTITY_IDS.map((id) => (
          <option key={id} value={id}>
            {QUANTITIES[id].label}
          </option>
        ))}
      </SelectField>
      <TextField
        label="Value"
        inputMode="decimal"
        autoComplete="off"
        hint={quantity.hint}
        error={errors.value?.message}
        {...register('value')}
      />
      {quantity.units.length > 1 || quantity.units[0].id !== '' ? (
        <SelectField label="Unit" error={errors.unit?.message} {...register('unit')}>
          {quantity.units.map((u) => (
            <option key={u.id} value={u.id}>
              {u.label}
            </option>
          ))}
        </SelectField>
      ) : (
        <p className="self-end pb-2 text-sm text-muted">No unit (dimensionless)</p>
      )}
      {parallaxNote && (
        <div className="sm:col-span-3">
          <Notice tone="warning" title="A negative parallax">
            {parallaxNote.message}
          </Notice>
        </div>
      )}
      {quantity.needsBand && (
        <>
          <TextField
            label="Band"
            list="known-bands"
            autoComplete="off"
            hint="e.g. V, B, g_SDSS"
            error={errors.band?.message}
            {...register('band')}
          />
          <datalist id="known-bands">
            {KNOWN_BANDS.map((b) => (
              <option key={b.id} value={b.id}>
                {b.label}
              </option>
            ))}
          </datalist>
        </>
      )}
      <fieldset className="sm:col-span-3">
        <legend className="mb-1 text-sm font-medium text-ink">Uncertainty</legend>
        <div className="flex flex-wrap gap-4 text-sm">
          {(['none', 'symmetric', 'asymmetric'] as const).map((k) => (
            <label key={k} className="inline-flex items-center gap-1.5">
              <input type="radio" value={k} {...register('uncertaintyKind')} />
              {k === 'none' ? 'None given' : k === 'symmetric' ? 'Symmetric (±)' : 'Asymmetric (− and +)'}
            </label>
          ))}
        </div>
      </fieldset>
      {kind === 'symmetric' && (
        <TextField
          label="± uncertainty"
          inputMode="decimal"
          autoComplete="off"
          hint="In the same unit as the value"
          error={errors.uncertainty?.message}
          {...register('uncertainty')}
        />
      )}
      {kind === 'asymmetric' && (
        <>
          <TextField
            label="− uncertainty"
            inputMode="decimal"
            autoComplete="off"
            error={errors.uncertaintyMinus?.message}
            {...register('uncertaintyMinus')}
          />
          <TextField
            label="+ uncertainty"
            inputMode="decimal"
            autoComplete="off"
            error={errors.uncertaintyPlus?.message}
            {...register('uncertaintyPlus')}
          />
        </>
      )}
      <SelectField label="Source" className="sm:col-span-3" error={errors.sourceId?.message} {...register('sourceId')}>
        <option value="">{proposal ? 'Choose the source (a proposal needs one)' : 'No source yet (cannot be preferred)'}</option>
        {sources.data?.map((s) => (
          <option key={s.id} value={s.id}>
            {s.citation}
          </option>
        ))}
      </SelectField>
      <TextField label="Note" autoComplete="off" className="sm:col-span-3" error={errors.note?.message} {...register('note')} />
      {pending && (
        <div className="sm:col-span-3">
          <ConfirmWarnings
            confirmation={pending.confirmation}
            confirmLabel={proposal ? 'Propose it as it is' : 'Keep this value'}
            busy={add.isPending}
            onConfirm={() => send({ ...pending.input, confirm: true })}
            onCancel={() => setPending(null)}
          />
        </div>
      )}
      <div className="flex gap-2 sm:col-span-3">
        <Button type="submit" busy={add.isPending}>
          {proposal ? 'Propose measurement' : 'Add measurement'}
        </Button>
        <Button type="button" variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
