import { useSearchParams } from 'react-router-dom';
import { AuthLayout } from '@/components/layouts/auth-layout.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { TokenPasswordForm } from '@/features/auth/components/token-password-form.tsx';

/** Where an invitation link lands: choose a password and start. */
export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token');
  return (
    <AuthLayout title="Welcome to Starproof" intro="Choose a password to finish setting up your account.">
      {token ? (
        <TokenPasswordForm kind="invitation" token={token} submitLabel="Set password and continue" />
      ) : (
        <Notice tone="error">This link is incomplete. Open the link from your invitation e-mail again.</Notice>
      )}
    </AuthLayout>
  );
}
