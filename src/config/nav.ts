import type { Role } from '@shared/roles.ts';
import type { IconName } from '@/components/ui/icon.tsx';
import { paths } from './paths.ts';

/** One entry in the left rail; `roles` limits who sees it. */
export interface NavItem {
  label: string;
  to: string;
  icon: IconName;
  roles?: Role[];
}

/** The main areas, top of the rail. */
export const MAIN_NAV: NavItem[] = [
  { label: 'Overview', to: paths.home.href(), icon: 'home' },
  { label: 'Calculator', to: paths.calculator.href(), icon: 'calc' },
];

/** Administration, at the foot of the rail. */
export const ADMIN_NAV: NavItem[] = [
  { label: 'Users', to: paths.adminUsers.href(), icon: 'users', roles: ['admin'] },
  { label: 'Outbox', to: paths.adminOutbox.href(), icon: 'mail', roles: ['admin'] },
];

export const visibleTo = (role: Role) => (item: NavItem) => !item.roles || item.roles.includes(role);
