import { Link } from 'react-router-dom';
import { useDashboard, useSetDigest } from '@/api/pages.ts';
import { Notice } from '@/components/ui/notice.tsx';
import { PageStatusBadge } from './page-status-badge.tsx';
import { pageHref } from './pages-table.tsx';

/** What needs the signed-in person's attention, by role, and the daily e-mail switch. */
export function Dashboard() {
  const dashboard = useDashboard();
  const setDigest = useSetDigest();
  if (dashboard.isPending) return <p className="text-sm text-muted">Loading what needs your attention…</p>;
  if (dashboard.error) return <Notice tone="error">{dashboard.error.message}</Notice>;
  return (
    <div className="space-y-6">
      <div className="grid gap-4 md:grid-cols-2">
        {dashboard.data.sections.map((section) => (
          <section key={section.id} aria-labelledby={`dash-${section.id}`} className="rounded-lg border border-rule bg-panel p-4">
            <h2 id={`dash-${section.id}`} className="flex items-baseline justify-between font-semibold">
              {section.title}
              <span className="text-sm font-normal tabular-nums text-muted">{section.pages.length}</span>
            </h2>
            <p className="mb-3 text-xs text-muted">{section.hint}</p>
            {section.pages.length ? (
              <ul className="divide-y divide-rule">
                {section.pages.map((p) => (
                  <li key={p.id} className="flex items-center justify-between gap-3 py-2 text-sm">
                    <span className="min-w-0">
                      <Link to={pageHref(p)} className="font-medium text-accent hover:underline">
                        {p.title}
                      </Link>
                      <span className="block truncate text-xs text-muted">
                        {p.object.name} · {p.writer.name}
                      </span>
                    </span>
                    <PageStatusBadge status={p.status} />
                  </li>
                ))}
              </ul>
            ) : (
              <p className="text-sm text-muted">Nothing here.</p>
            )}
          </section>
        ))}
      </div>
      <label className="flex items-center gap-2 text-sm">
        <input
          type="checkbox"
          className="size-4 accent-accent"
          checked={dashboard.data.digest}
          disabled={setDigest.isPending}
          onChange={(e) => setDigest.mutate(e.target.checked)}
        />
        E-mail me a summary of this each morning
      </label>
    </div>
  );
}
