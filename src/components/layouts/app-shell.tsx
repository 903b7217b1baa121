import { NavLink, Outlet, useNavigate } from 'react-router-dom';
import { ROLE_LABELS } from '@shared/roles.ts';
import { useSignOut } from '@/api/auth.ts';
import { ADMIN_NAV, MAIN_NAV, visibleTo, type NavItem } from '@/config/nav.ts';
import { paths } from '@/config/paths.ts';
import { useCurrentUser } from '@/lib/auth.tsx';
import { Icon } from '../ui/icon.tsx';
import { ThemeSwitch } from './theme-switch.tsx';

function RailLink({ item }: { item: NavItem }) {
  return (
    <NavLink
      to={item.to}
      end={item.to === '/'}
      className={({ isActive }) =>
        `flex items-center gap-2.5 rounded-md px-2.5 py-2 text-sm ${isActive ? 'bg-wash font-semibold text-ink' : 'text-muted hover:bg-wash hover:text-ink'}`
      }
    >
      <Icon name={item.icon} className="size-[18px]" />
      {item.label}
    </NavLink>
  );
}

/** The signed-in layout: a narrow left rail with the main areas, admin at its foot. */
export function AppShell() {
  const user = useCurrentUser();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const main = MAIN_NAV.filter(visibleTo(user.role));
  const admin = ADMIN_NAV.filter(visibleTo(user.role));

  return (
    <div className="flex min-h-screen bg-paper text-ink">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-panel focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <aside className="sticky top-0 flex h-screen w-56 shrink-0 flex-col border-r border-rule bg-panel px-3 py-4">
        <div className="mb-6 flex items-center gap-2 px-2">
          <img src="/favicon.svg" alt="" className="size-7" />
          <span className="text-[17px] font-semibold tracking-tight">Starproof</span>
        </div>
        <nav aria-label="Main" className="flex flex-col gap-0.5">
          {main.map((item) => (
            <RailLink key={item.to} item={item} />
          ))}
        </nav>
        <div className="mt-auto flex flex-col gap-0.5">
          {admin.length > 0 && (
            <nav aria-label="Administration" className="mb-3 flex flex-col gap-0.5 border-t border-rule pt-3">
              <p className="px-2.5 pb-1 text-[11px] font-semibold uppercase tracking-wider text-muted">Admin</p>
              {admin.map((item) => (
                <RailLink key={item.to} item={item} />
              ))}
            </nav>
          )}
          <div className="border-t border-rule pt-3">
            <NavLink to={paths.account.href()} className="block rounded-md px-2.5 py-1.5 hover:bg-wash">
              <span className="block truncate text-sm font-medium">{user.name}</span>
              <span className="block text-xs text-muted">{ROLE_LABELS[user.role]}</span>
            </NavLink>
            <ThemeSwitch />
            <button
              type="button"
              onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate(paths.signIn.href(), { replace: true }) })}
              className="mt-1 flex w-full items-center gap-2.5 rounded-md px-2.5 py-2 text-sm text-muted hover:bg-wash hover:text-ink"
            >
              <Icon name="out" className="size-[18px]" />
              Sign out
            </button>
          </div>
        </div>
      </aside>
      <main id="main" className="min-w-0 flex-1 px-8 py-8">
        <div className="mx-auto max-w-5xl">
          <Outlet />
        </div>
      </main>
    </div>
  );
}
