import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, Navigate, useNavigate, useSearchParams } from 'react-router-dom';
import { SignInSchema, type SignInInput } from '@shared/schemas/auth.ts';
import { useMe, useSignIn } from '@/api/auth.ts';
import { AuthLayout } from '@/components/layouts/auth-layout.tsx';
import { Button } from '@/components/ui/button.tsx';
import { TextField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { applyServerErrors } from '@/lib/form-errors.ts';

/** Only same-site paths are followed after sign-in. */
const safeNext = (next: string | null) => (next?.startsWith('/') && !next.startsWith('//') ? next : '/');

export function Component() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const signIn = useSignIn();
  const [formError, setFormError] = useState<string>();
  const { register, handleSubmit, setError, formState } = useForm<SignInInput>({ resolver: zodResolver(SignInSchema) });

  if (me.data) return <Navigate to={safeNext(params.get('next'))} replace />;

  const onSubmit = handleSubmit((values) => {
    setFormError(undefined);
    signIn.mutate(values, {
      onSuccess: () => navigate(safeNext(params.get('next')), { replace: true }),
      onError: (error) => setFormError(applyServerErrors(error, setError, ['email', 'password'])),
    });
  });

  return (
    <AuthLayout
      title="Sign in"
      intro="For the staff of your venue. Visitors read the kiosks and public pages without signing in."
    >
      <form onSubmit={onSubmit} noValidate className="space-y-4">
        {formError && <Notice tone="error">{formError}</Notice>}
        <TextField
          label="E-mail address"
          type="email"
          autoComplete="username"
          error={formState.errors.email?.message}
          {...register('email')}
        />
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          error={formState.errors.password?.message}
          {...register('password')}
        />
        <Button type="submit" busy={signIn.isPending} className="w-full">
          Sign in
        </Button>
        <p className="text-center text-sm">
          <Link to={paths.resetPassword.path} className="text-accent hover:underline">
            Forgotten your password?
          </Link>
        </p>
      </form>
    </AuthLayout>
  );
}
