import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { Link, useSearchParams } from 'react-router-dom';
import { RequestPasswordResetSchema, type RequestPasswordResetInput } from '@shared/schemas/auth.ts';
import { useRequestPasswordReset } from '@/api/auth.ts';
import { AuthLayout } from '@/components/layouts/auth-layout.tsx';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { TokenPasswordForm } from '@/features/auth/components/token-password-form.tsx';

function RequestForm() {
  const request = useRequestPasswordReset();
  const { register, handleSubmit, formState } = useForm<RequestPasswordResetInput>({
    resolver: zodResolver(RequestPasswordResetSchema),
  });
  if (request.isSuccess) return <Notice tone="success">{request.data.data.message}</Notice>;
  return (
    <form onSubmit={handleSubmit((v) => request.mutate(v))} noValidate className="space-y-4">
      {request.error && <Notice tone="error">{request.error.message}</Notice>}
      <TextField
        label="E-mail address"
        type="email"
        autoComplete="username"
        error={formState.errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" busy={request.isPending} className="w-full">
        Send reset link
      </Button>
    </form>
  );
}

/** Asks for a reset link, or (with ?token=) sets the new password. */
export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return (
    <AuthLayout
      title={token ? 'Choose a new password' : 'Reset your password'}
      intro={token ? undefined : 'We will e-mail you a link that works once, for an hour.'}
    >
      {token ? <TokenPasswordForm kind="reset" token={token} submitLabel="Set new password" /> : <RequestForm />}
      <p className="mt-4 text-center text-sm">
        <Link to={paths.signIn.href()} className="text-accent hover:underline">
          Back to sign in
        </Link>
      </p>
    </AuthLayout>
  );
}
