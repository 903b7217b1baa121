import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { ChangePasswordSchema, type ChangePasswordInput } from '@shared/schemas/auth.ts';
import { ROLE_LABELS } from '@shared/roles.ts';
import { useChangePassword } from '@/api/auth.ts';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { useCurrentUser } from '@/lib/auth.tsx';
import { applyServerErrors } from '@/lib/form-errors.ts';

export function Component() {
  const user = useCurrentUser();
  const change = useChangePassword();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, reset, formState } = useForm<ChangePasswordInput>({
    resolver: zodResolver(ChangePasswordSchema),
  });

  const onSubmit = handleSubmit((values) => {
    setFormError(undefined);
    change.mutate(values, {
      onSuccess: () => reset(),
      onError: (error) => setFormError(applyServerErrors(error, setError, ['currentPassword', 'newPassword'])),
    });
  });

  return (
    <>
      <PageHeader title="Your account" description={`${user.name} · ${user.email} · ${ROLE_LABELS[user.role]}`} />
      <section className="max-w-md rounded-lg border border-rule bg-panel p-6">
        <h2 className="text-lg font-semibold">Change password</h2>
        <p className="mt-1 text-sm text-muted">Other devices signed in as you will be signed out.</p>
        <form onSubmit={onSubmit} noValidate className="mt-4 space-y-4">
          {formError && <Notice tone="error">{formError}</Notice>}
          {change.isSuccess && <Notice tone="success">Your password has been changed.</Notice>}
          <TextField
            label="Current password"
            type="password"
            autoComplete="current-password"
            error={formState.errors.currentPassword?.message}
            {...register('currentPassword')}
          />
          <TextField
            label="New password"
            type="password"
            autoComplete="new-password"
            hint="At least 10 characters."
            error={formState.errors.newPassword?.message}
            {...register('newPassword')}
          />
          <Button type="submit" busy={change.isPending}>
            Change password
          </Button>
        </form>
      </section>
    </>
  );
}
