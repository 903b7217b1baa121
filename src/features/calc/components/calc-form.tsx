import { useState } from 'react';
import { FormProvider, useForm, useWatch, type FieldErrors, type Path, type Resolver } from 'react-hook-form';
import { SOLAR_BANDS } from '@shared/engine/solar-magnitudes.ts';
import type { CalcQuantity, CalcRequest, CalcSuccess } from '@shared/schemas/calc.ts';
import { useCalculate } from '@/api/calc.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { engineMessageInWords, QUANTITY_LABELS } from '@shared/contract/words.ts';
import { buildRequest, defaultFormValues, fieldForMessage, fieldsFor, type CalcFormValues } from '../form-request.ts';
import { GROUP_LABELS, bandLabel } from '../labels.ts';
import { MeasuredInputField } from './measured-input-field.tsx';
import { ModelPicker } from './model-picker.tsx';

/** Quantities grouped as a reader looks for them. */
const QUANTITY_GROUPS: ReadonlyArray<{ label: string; quantities: CalcQuantity[] }> = [
  {
    label: 'Distances from a redshift',
    quantities: [
      'luminosity_distance',
      'light_travel_distance',
      'proper_distance',
      'comoving_distance',
      'transverse_comoving_distance',
      'angular_diameter_distance',
    ],
  },
  { label: 'Times and the expansion', quantities: ['lookback_time', 'age_at_z', 'age_now', 'hubble_parameter'] },
  {
    label: 'Magnitudes and brightness',
    quantities: ['distance_modulus', 'absolute_magnitude', 'luminosity_ratio_sun', 'flux_ratio', 'parallax_distance'],
  },
  { label: 'Redshift from another quantity', quantities: ['z_from_lookback_time', 'z_from_luminosity_distance'] },
];

/** Nests a message at a dotted path, the shape react-hook-form expects for errors. */
function putError(errors: Record<string, unknown>, path: string, message: string): void {
  const parts = path.split('.');
  let cur = errors;
  parts.slice(0, -1).forEach((p) => {
    cur[p] = (cur[p] as Record<string, unknown> | undefined) ?? {};
    cur = cur[p] as Record<string, unknown>;
  });
  cur[parts[parts.length - 1]] ??= { type: 'validate', message };
}

/** Checks the form in the browser with the same rules that build the request. */
const resolver: Resolver<CalcFormValues> = async (values) => {
  const built = buildRequest(values);
  if ('request' in built) return { values, errors: {} };
  const errors: Record<string, unknown> = {};
  for (const p of built.problems) putError(errors, p.path, p.message);
  return { values: {}, errors: errors as FieldErrors<CalcFormValues> };
};

/**
 * The calculator's form: a quantity, only the inputs it needs (each with an
 * optional uncertainty), a band where needed, and a model. Server refusals are
 * shown in words above the button and on the field they name.
 * @param props.onResult called with each successful result and the request that produced it
 * @param props.onRefused called when the server refuses a calculation, so an older result is not left on show
 */
export function CalcForm({
  onResult,
  onRefused,
}: {
  onResult: (result: CalcSuccess, request: CalcRequest) => void;
  onRefused?: () => void;
}) {
  const form = useForm<CalcFormValues>({ defaultValues: defaultFormValues(), resolver, reValidateMode: 'onSubmit' });
  const { register, handleSubmit, control, setValue, getValues, setError, formState } = form;
  const [serverError, setServerError] = useState<string>();
  const calc = useCalculate();
  const quantity = useWatch({ control, name: 'quantity' });
  const group = useWatch({ control, name: 'group' });
  const fields = fieldsFor(quantity, Number(group));

  // An input the form refuses must not leave the previous result on show beneath it, as if it answered this one.
  const onSubmit = handleSubmit(
    (values) => {
      const built = buildRequest(values);
      setServerError(undefined);
      if (!('request' in built)) return onRefused?.();
      calc.mutate(built.request, {
        onSuccess: (result) => onResult(result, built.request),
        onError: (error) => {
          const words = engineMessageInWords(error.message);
          const path = error.status === 400 ? fieldForMessage(error.message, values) : undefined;
          if (path) setError(path as Path<CalcFormValues>, { message: words });
          setServerError(words);
          onRefused?.();
        },
      });
    },
    () => {
      setServerError(undefined);
      onRefused?.();
    },
  );

  const onQuantityChange = () => {
    setValue('group', '0');
    const next = fieldsFor(getValues('quantity'), 0);
    if (next.flrwOnly && getValues('model') === 'hubble') setValue('model', 'planck18');
    setServerError(undefined);
  };

  return (
    <FormProvider {...form}>
      <form
        onSubmit={onSubmit}
        noValidate
        aria-label="Calculation"
        className="space-y-6 rounded-lg border border-rule bg-panel p-5"
      >
        <div className="grid gap-4 sm:grid-cols-3">
          <SelectField label="Quantity" className="sm:col-span-2" {...register('quantity', { onChange: onQuantityChange })}>
            {QUANTITY_GROUPS.map((g) => (
              <optgroup key={g.label} label={g.label}>
                {g.quantities.map((q) => (
                  <option key={q} value={q}>
                    {QUANTITY_LABELS[q]}
                  </option>
                ))}
              </optgroup>
            ))}
          </SelectField>
          {fields.band && (
            <SelectField label="Band" error={formState.errors.band?.message} {...register('band')}>
              {SOLAR_BANDS.map((b) => (
                <option key={b} value={b}>
                  {bandLabel(b)}
                </option>
              ))}
            </SelectField>
          )}
        </div>

        {fields.groups.length > 1 && (
          <fieldset>
            <legend className="mb-1.5 text-sm font-medium text-ink">Work from</legend>
            <div className="flex flex-wrap gap-2">
              {fields.groups.map((g, i) => (
                <label
                  key={g.join()}
                  className={`flex cursor-pointer items-center gap-2 rounded-md border px-3 py-1.5 text-sm ${String(i) === group ? 'border-accent bg-accent/5' : 'border-rule hover:border-accent'}`}
                >
                  <input type="radio" value={String(i)} className="accent-accent" {...register('group')} />
                  {GROUP_LABELS[g.join()] ?? g.join(' and ')}
                </label>
              ))}
            </div>
          </fieldset>
        )}

        {fields.required.length + fields.optional.length > 0 && (
          <div className="grid gap-x-6 gap-y-4 lg:grid-cols-2">
            {fields.required.map((k) => (
              <MeasuredInputField key={k} name={k} />
            ))}
            {fields.optional.map((k) => (
              <MeasuredInputField key={k} name={k} optional />
            ))}
          </div>
        )}
        {fields.required.length + fields.optional.length > 0 && (
          <p className="-mt-3 text-xs text-muted">
            Uncertainties are 68 % (one standard deviation); leave them empty for an exact value.
          </p>
        )}

        {fields.usesModel && (
          <div className="border-t border-rule pt-5">
            <ModelPicker flrwOnly={fields.flrwOnly} />
          </div>
        )}

        {serverError && (
          <Notice tone="error" title="The calculation was refused">
            {serverError}
          </Notice>
        )}
        <div className="flex items-center gap-3">
          <Button type="submit" busy={calc.isPending}>
            Calculate
          </Button>
          {calc.isPending && (
            <span className="text-sm text-muted" role="status">
              Calculating…
            </span>
          )}
        </div>
      </form>
    </FormProvider>
  );
}
