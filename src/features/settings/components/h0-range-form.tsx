import { useState } from 'react';
import { H0RangeSettingSchema, type SettingsDto } from '@shared/schemas/settings.ts';
import { useUpdateSettings } from '@/api/settings.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ApiRequestError } from '@/lib/api-client.ts';

type Field = 'low' | 'high' | 'source';

/** A typed number ('' or text that is not one stays text, so the shared schema names the field). */
const numberOrText = (text: string): number | string => {
  const t = text
    .trim()
    .replace(/\u2212/g, '-')
    .replace(',', '.');
  return t !== '' && Number.isFinite(Number(t)) ? Number(t) : t;
};

/**
 * The organisation's H0 range (km/s/Mpc) with its source: the spread statements give to the model's
 * own uncertainty. Checked with the same schema as the API, field by field; "Use the default" clears it.
 */
export function H0RangeForm({ settings }: { settings: SettingsDto }) {
  const update = useUpdateSettings();
  const range = settings.h0RangeInUse;
  const [values, setValues] = useState<Record<Field, string>>({
    low: String(range.low),
    high: String(range.high),
    source: range.source,
  });
  const [errors, setErrors] = useState<Partial<Record<Field, string>>>({});
  const [saved, setSaved] = useState<string>();
  const onError = (error: Error) => {
    const fields = error instanceof ApiRequestError ? error.fields : undefined;
    setErrors({ low: fields?.['h0Range.low'], high: fields?.['h0Range.high'], source: fields?.['h0Range.source'] });
  };
  const input = (field: Field, label: string, hint?: string) => (
    <TextField
      label={label}
      hint={hint}
      inputMode={field === 'source' ? undefined : 'decimal'}
      value={values[field]}
      error={errors[field]}
      className={field === 'source' ? 'sm:col-span-2' : undefined}
      onChange={(e) => {
        setValues({ ...values, [field]: e.target.value });
        setSaved(undefined);
      }}
    />
  );
  return (
    <form
      className="space-y-4"
      aria-label="H0 range"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        setSaved(undefined);
        const parsed = H0RangeSettingSchema.safeParse({
          low: numberOrText(values.low),
          high: numberOrText(values.high),
          source: values.source,
        });
        if (!parsed.success) {
          const found: Partial<Record<Field, string>> = {};
          for (const issue of parsed.error.issues) found[issue.path[0] as Field] ??= issue.message;
          return setErrors(found);
        }
        setErrors({});
        update.mutate(
          { h0Range: parsed.data },
          { onSuccess: () => setSaved('Saved. Every statement is being recomputed.'), onError },
        );
      }}
    >
      <p className="text-sm text-muted">
        {settings.h0Range
          ? 'Your organisation’s own range is in use.'
          : 'The default range is in use; enter your own with its source to replace it.'}
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        {input('low', 'Low end of the H0 range (km/s/Mpc)')}
        {input('high', 'High end of the H0 range (km/s/Mpc)')}
        {input('source', 'Source of the H0 range', 'The paper or handbook the range comes from.')}
      </div>
      {update.error && !(update.error instanceof ApiRequestError && update.error.fields) && (
        <Notice tone="error">{update.error.message}</Notice>
      )}
      {saved && <Notice tone="success">{saved}</Notice>}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" busy={update.isPending}>
          Save the H0 range
        </Button>
        {settings.h0Range && (
          <Button
            type="button"
            variant="secondary"
            disabled={update.isPending}
            onClick={() =>
              update.mutate(
                { h0Range: null },
                {
                  onSuccess: (s) => {
                    setValues({
                      low: String(s.h0RangeInUse.low),
                      high: String(s.h0RangeInUse.high),
                      source: s.h0RangeInUse.source,
                    });
                    setErrors({});
                    setSaved('The default range is in use again. Every statement is being recomputed.');
                  },
                  onError,
                },
              )
            }
          >
            Use the default
          </Button>
        )}
      </div>
    </form>
  );
}
