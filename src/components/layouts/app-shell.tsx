import { useEffect, useRef, useState } from 'react';
import { NavLink, Outlet, useLocation, useNavigate } from 'react-router-dom';
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

/** Everything the rail holds: the main areas, admin, the account, the look and signing out. */
function RailContents({ onNavigate }: { onNavigate?: () => void }) {
  const user = useCurrentUser();
  const signOut = useSignOut();
  const navigate = useNavigate();
  const main = MAIN_NAV.filter(visibleTo(user.role));
  const admin = ADMIN_NAV.filter(visibleTo(user.role));
  return (
    // A click on any link inside closes the phone menu; the rail on a wide screen has no handler.
    // biome-ignore lint/a11y/noStaticElementInteractions: the links inside are the interactive elements
    // biome-ignore lint/a11y/useKeyWithClickEvents: links are activated by Enter, which fires click
    <div
      className="flex min-h-0 flex-1 flex-col"
      onClick={(e) => onNavigate && (e.target as Element).closest('a') && onNavigate()}
    >
      <nav aria-label="Main" className="flex flex-col gap-0.5">
        {main.map((item) => (
          <RailLink key={item.to} item={item} />
        ))}
      </nav>
      <div className="mt-auto flex flex-col gap-0.5 pt-4">
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
    </div>
  );
}

function Brand() {
  return (
    <div className="flex items-center gap-2 px-2">
      <img src="/favicon.svg" alt="" className="sp-logo size-7" />
      <span className="text-[17px] font-semibold tracking-tight">Starproof</span>
    </div>
  );
}

/**
 * The top bar of narrow screens (phones, tablets): the brand and a disclosure button that opens
 * the rail's contents as a panel under it. Closes on a link, on Escape (focus back on the button)
 * and when the route changes.
 */
function MenuBar() {
  const [open, setOpen] = useState(false);
  const button = useRef<HTMLButtonElement>(null);
  const { pathname } = useLocation();
  // biome-ignore lint/correctness/useExhaustiveDependencies: closing is the point of watching the path
  useEffect(() => setOpen(false), [pathname]);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== 'Escape') return;
      setOpen(false);
      button.current?.focus();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [open]);
  return (
    <div className="sticky top-0 z-40 border-b border-rule bg-panel lg:hidden">
      <div className="flex items-center justify-between px-3 py-2">
        <Brand />
        <button
          ref={button}
          type="button"
          aria-expanded={open}
          aria-controls={open ? 'site-menu' : undefined}
          onClick={() => setOpen((o) => !o)}
          className="flex items-center gap-2 rounded-md border border-rule px-3 py-1.5 text-sm font-medium hover:bg-wash"
        >
          <Icon name={open ? 'x' : 'list'} className="size-[18px]" />
          Menu
        </button>
      </div>
      {/* Rendered only while open, so the page holds one copy of the navigation at a time for tests and readers. */}
      {open && (
        <div id="site-menu" className="max-h-[calc(100dvh-3.25rem)] overflow-y-auto border-t border-rule px-3 py-3">
          <RailContents onNavigate={() => setOpen(false)} />
        </div>
      )}
    </div>
  );
}

/**
 * The signed-in layout: a narrow left rail with the main areas, admin at its foot. Below the `lg`
 * breakpoint (phones, tablets) the rail becomes a menu under a top bar, so content has the width.
 */
export function AppShell() {
  return (
    <div className="min-h-screen bg-paper text-ink lg:flex">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-panel focus:px-3 focus:py-2"
      >
        Skip to content
      </a>
      <MenuBar />
      <aside className="sticky top-0 hidden h-screen w-56 shrink-0 flex-col overflow-y-auto border-r border-rule bg-panel px-3 py-4 lg:flex">
        <div className="mb-6">
          <Brand />
        </div>
        <RailContents />
      </aside>
      <main id="main" className="min-w-0 flex-1 px-4 py-5 sm:px-6 lg:px-8 lg:py-8">
        <div className="mx-auto max-w-5xl">
          <Outlet />
        </div>
      </main>
    </div>
  );
}
