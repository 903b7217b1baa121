import { Link, useSearchParams } from 'react-router-dom';
import type { TokenState } from '@shared/schemas/auth.ts';
import { useInvitationCheck } from '@/api/auth.ts';
import { AuthLayout } from '@/components/layouts/auth-layout.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { paths } from '@/config/paths.ts';
import { TokenPasswordForm } from '@/features/auth/components/token-password-form.tsx';

const REFUSED: Record<Exclude<TokenState, 'valid'>, { title: string; text: string }> = {
  used: {
    title: 'This invitation has already been used',
    text: 'The account is set up. Sign in with the password chosen then, or ask for a password reset if it is forgotten.',
  },
  expired: {
    title: 'This invitation has expired',
    text: 'Invitations last a limited time. Ask the person who invited you (an admin) to send a new one.',
  },
  invalid: {
    title: 'This invitation link does not work',
    text: 'It may have been copied only in part, or replaced by a newer invitation. Open the link from your latest invitation e-mail, or ask an admin for a new one.',
  },
};

/** Where an invitation link lands: the link is checked first, then the person chooses a password and starts. */
export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token');
  const check = useInvitationCheck(token);
  const refused = check.data && check.data !== 'valid';
  return (
    <AuthLayout
      title="Welcome to Starproof"
      intro={refused || !token ? 'This invitation cannot be used.' : 'Choose a password to finish setting up your account.'}
    >
      {token ? (
        <CheckedInvitation token={token} check={check} />
      ) : (
        <Notice tone="error">This link is incomplete. Open the link from your invitation e-mail again.</Notice>
      )}
    </AuthLayout>
  );
}

function CheckedInvitation({ token, check }: { token: string; check: ReturnType<typeof useInvitationCheck> }) {
  if (check.isPending) return <p className="text-sm text-muted">Checking your invitation…</p>;
  // The check itself failing (network, rate limit) must not lock anyone out: the form still works and the server checks again.
  if (check.isError || check.data === 'valid')
    return <TokenPasswordForm kind="invitation" token={token} submitLabel="Set password and continue" />;
  const refused = REFUSED[check.data];
  return (
    <div className="space-y-3">
      <Notice tone="error" title={refused.title}>
        {refused.text}
      </Notice>
      <Link to={paths.signIn.href()} className="inline-block text-sm font-medium text-accent underline">
        Go to sign-in
      </Link>
    </div>
  );
}
