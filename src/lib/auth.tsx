import { createContext, useContext, type ReactNode } from 'react';
import { Navigate, useLocation } from 'react-router-dom';
import type { Role } from '@shared/roles.ts';
import type { SessionUser } from '@shared/schemas/user.ts';
import { useMe } from '@/api/auth.ts';
import { paths } from '@/config/paths.ts';

const CurrentUserContext = createContext<SessionUser | null>(null);

/** The signed-in user; only for components rendered inside <RequireUser>. */
export function useCurrentUser(): SessionUser {
  const user = useContext(CurrentUserContext);
  if (!user) throw new Error('useCurrentUser outside <RequireUser>');
  return user;
}

/** Shows children to a signed-in user, else sends them to sign in and back. */
export function RequireUser({ children }: { children: ReactNode }) {
  const { data: user, isPending, isError } = useMe();
  const location = useLocation();
  if (isPending) return <p className="p-8 text-sm text-muted">Loading…</p>;
  // A failed refresh keeps the screen (and any open editor) as it is; only a first load that fails says so.
  if (isError && user === undefined)
    return <p className="p-8 text-sm text-broken">Starproof cannot be reached. Reload the page in a moment.</p>;
  if (!user) return <Navigate to={paths.signIn.href(location.pathname + location.search)} replace />;
  return <CurrentUserContext.Provider value={user}>{children}</CurrentUserContext.Provider>;
}

/**
 * Hides a screen from roles that cannot use it. Only a gate for what to show: the server's
 * policies decide what is allowed.
 */
export function RequireRole({ roles, children }: { roles: Role[]; children: ReactNode }) {
  const user = useCurrentUser();
  if (!roles.includes(user.role)) {
    return (
      <div className="mx-auto max-w-xl py-8">
        <h1 className="text-xl font-semibold">Not available to your role</h1>
        <p className="mt-2 text-sm text-muted">This screen is for {roles.join(' or ')} accounts. Ask an admin if you need it.</p>
      </div>
    );
  }
  return <>{children}</>;
}
