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
  { label: 'Pages', to: paths.pages.href(), icon: 'page' },
  { label: 'Statements', to: paths.statements.href(), icon: 'quote' },
  { label: 'Catalogue', to: paths.catalogue.href(), icon: 'catalogue' },
  { label: 'Sources', to: paths.sources.href(), icon: 'source' },
  { label: 'Calculator', to: paths.calculator.href(), icon: 'calc' },
  { label: 'Media', to: paths.media.href(), icon: 'image' },
  { label: 'Venues', to: paths.venues.href(), icon: 'venue', roles: ['admin', 'editor'] },
  { label: 'Publishing', to: paths.publishing.href(), icon: 'screen', roles: ['admin', 'editor'] },
];

/** Administration, at the foot of the rail. */
export const ADMIN_NAV: NavItem[] = [
  { label: 'Organisation', to: paths.adminOrganisation.href(), icon: 'globe', roles: ['admin'] },
  { label: 'Earth’s timeline', to: paths.timeline.href(), icon: 'history', roles: ['admin'] },
  { label: 'Users', to: paths.adminUsers.href(), icon: 'users', roles: ['admin'] },
  { label: 'Outbox', to: paths.adminOutbox.href(), icon: 'mail', roles: ['admin'] },
];

export const visibleTo = (role: Role) => (item: NavItem) => !item.roles || item.roles.includes(role);
