import { Link } from 'react-router-dom';
import { ROLE_DESCRIPTIONS, ROLE_LABELS } from '@shared/roles.ts';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { ADMIN_NAV, MAIN_NAV, visibleTo } from '@/config/nav.ts';
import { useCurrentUser } from '@/lib/auth.tsx';
import { Icon } from '@/components/ui/icon.tsx';

/** The landing screen: who you are here and where your work is. */
export function Component() {
  const user = useCurrentUser();
  const areas = [...MAIN_NAV, ...ADMIN_NAV].filter(visibleTo(user.role)).filter((item) => item.to !== '/');
  return (
    <>
      <PageHeader title={`Good to see you, ${user.name.split(' ')[0]}`} description={`Signed in as ${ROLE_LABELS[user.role].toLowerCase()}: ${ROLE_DESCRIPTIONS[user.role].toLowerCase()}.`} />
      <section aria-labelledby="areas" className="grid gap-3 sm:grid-cols-2">
        <h2 id="areas" className="sr-only">
          Your areas
        </h2>
        {areas.map((item) => (
          <Link key={item.to} to={item.to} className="group flex items-start gap-3 rounded-lg border border-rule bg-panel p-4 hover:border-accent">
            <Icon name={item.icon} className="mt-0.5 size-5 text-accent" />
            <span>
              <span className="block font-medium group-hover:underline">{item.label}</span>
            </span>
          </Link>
        ))}
      </section>
    </>
  );
}
