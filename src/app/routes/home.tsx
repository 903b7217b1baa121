import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '@shared/roles.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { useCurrentUser } from '@/lib/auth.tsx';
import { Dashboard } from '@/features/pages/components/dashboard.tsx';

/** The landing screen: who you are here and what needs your attention. */
export function Component() {
  const user = useCurrentUser();
  return (
    <>
      <PageHeader
        title={`Good to see you, ${user.name.split(' ')[0]}`}
        description={`Signed in as ${ROLE_LABELS[user.role].toLowerCase()}: ${ROLE_DESCRIPTIONS[user.role].toLowerCase()}.`}
      />
      <Dashboard />
    </>
  );
}
