import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { z } from 'zod';
import { NewPasswordSchema } from '@shared/schemas/auth.ts';
import { useCompleteWithToken } from '@/api/auth.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';

const FormSchema = z
  .object({ newPassword: NewPasswordSchema, confirm: z.string() })
  .refine((v) => v.newPassword === v.confirm, { path: ['confirm'], message: 'The two passwords differ' });
type FormValues = z.infer<typeof FormSchema>;

/** Sets a password from an e-mailed token (invitation or reset), then signs in. */
export function TokenPasswordForm({
  kind,
  token,
  submitLabel,
}: {
  kind: 'invitation' | 'reset';
  token: string;
  submitLabel: string;
}) {
  const complete = useCompleteWithToken(kind);
  const navigate = useNavigate();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<FormValues>({ resolver: zodResolver(FormSchema) });

  const onSubmit = handleSubmit(({ newPassword }) => {
    setFormError(undefined);
    complete.mutate(
      { token, newPassword },
      {
        onSuccess: () => navigate('/', { replace: true }),
        onError: (error) => setFormError(applyServerErrors(error, setError, ['newPassword'])),
      },
    );
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {formError && <Notice tone="error">{formError}</Notice>}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters; a short sentence works well."
        error={formState.errors.newPassword?.message}
        {...register('newPassword')}
      />
      <TextField
        label="The same password again"
        type="password"
        autoComplete="new-password"
        error={formState.errors.confirm?.message}
        {...register('confirm')}
      />
      <Button type="submit" busy={complete.isPending} className="w-full">
        {submitLabel}
      </Button>
    </form>
  );
}
