import { useFormContext, useWatch } from 'react-hook-form';
import type { CalcNumericInput } from '@shared/schemas/calc.ts';
import type { CalcFormValues } from '../form-request.ts';
import { INPUT_LABELS } from '@shared/contract/words.ts';

const BOX =
  'block w-full rounded-md border bg-panel px-3 py-2 text-sm text-ink tabular-nums placeholder:text-muted/70 focus:border-accent focus:outline-none focus:ring-2 focus:ring-accent/30';

function fieldError(errors: unknown, path: string[]): string | undefined {
  let cur = errors as Record<string, unknown> | undefined;
  for (const p of path) cur = cur?.[p] as Record<string, unknown> | undefined;
  return (cur as { message?: string } | undefined)?.message;
}

/**
 * One numeric input with an optional 68 % uncertainty: symmetric (±) by default,
 * or separate lower and upper uncertainties.
 * @param props.name the contract's input key
 * @param props.optional whether the calculation runs without it
 */
export function MeasuredInputField({ name, optional = false }: { name: CalcNumericInput; optional?: boolean }) {
  const { register, control, formState, setValue } = useFormContext<CalcFormValues>();
  const asymmetric = useWatch({ control, name: `inputs.${name}.asymmetric` });
  const meta = INPUT_LABELS[name];
  const id = `input-${name}`;
  const errors = formState.errors;
  const valueError = fieldError(errors, ['inputs', name, 'value']);
  const uncertaintyError =
    fieldError(errors, ['inputs', name, 'sigma']) ??
    fieldError(errors, ['inputs', name, 'minus']) ??
    fieldError(errors, ['inputs', name, 'plus']);
  const message = valueError ?? uncertaintyError;
  const unit = meta.unit ? <span className="font-normal text-muted"> ({meta.unit})</span> : null;
  const box = (bad: boolean) => `${BOX} ${bad ? 'border-broken' : 'border-rule'}`;

  return (
    <div className="min-w-0">
      <div className="mb-1 flex items-baseline gap-2">
        <label htmlFor={id} className="text-sm font-medium text-ink">
          {meta.label}
          {unit}
        </label>
        {optional && <span className="text-xs text-muted">optional</span>}
      </div>
      <div className="flex flex-wrap items-center gap-2">
        <input
          id={id}
          inputMode="decimal"
          autoComplete="off"
          aria-invalid={valueError ? true : undefined}
          aria-describedby={message ? `${id}-error` : meta.hint ? `${id}-hint` : undefined}
          className={`${box(!!valueError)} max-w-40`}
          {...register(`inputs.${name}.value`)}
        />
        {asymmetric ? (
          <>
            <span className="text-sm text-muted" aria-hidden="true">
              −
            </span>
            <input
              aria-label={`${meta.label}: lower uncertainty`}
              placeholder="lower"
              inputMode="decimal"
              autoComplete="off"
              className={`${box(!!fieldError(errors, ['inputs', name, 'minus']))} max-w-24`}
              {...register(`inputs.${name}.minus`)}
            />
            <span className="text-sm text-muted" aria-hidden="true">
              +
            </span>
            <input
              aria-label={`${meta.label}: upper uncertainty`}
              placeholder="upper"
              inputMode="decimal"
              autoComplete="off"
              className={`${box(!!fieldError(errors, ['inputs', name, 'plus']))} max-w-24`}
              {...register(`inputs.${name}.plus`)}
            />
          </>
        ) : (
          <>
            <span className="text-sm text-muted" aria-hidden="true">
              ±
            </span>
            <input
              aria-label={`${meta.label}: uncertainty (±)`}
              placeholder="none"
              inputMode="decimal"
              autoComplete="off"
              className={`${box(!!fieldError(errors, ['inputs', name, 'sigma']))} max-w-24`}
              {...register(`inputs.${name}.sigma`)}
            />
          </>
        )}
        <button
          type="button"
          aria-pressed={asymmetric}
          onClick={() => setValue(`inputs.${name}.asymmetric`, !asymmetric)}
          className="rounded px-1.5 py-1 text-xs text-accent hover:underline"
        >
          {asymmetric ? 'Use one ± value' : 'Separate − and +'}
        </button>
      </div>
      {meta.hint && !message && (
        <p id={`${id}-hint`} className="mt-1 text-xs text-muted">
          {meta.hint}
        </p>
      )}
      {message && (
        <p id={`${id}-error`} className="mt-1 text-xs font-medium text-broken">
          {message}
        </p>
      )}
    </div>
  );
}
