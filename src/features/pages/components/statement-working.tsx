import { Link } from 'react-router-dom';
import type { StatementLocale } from '@shared/statements/locales.ts';
import { useStatement } from '@/api/statements.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { venueNightText } from '@/components/statements/venue-night.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { WorkingSteps } from '@/components/working/working-steps.tsx';
import { paths } from '@/config/paths.ts';

/** A statement's wording and every step of its working, in a panel beside the page. */
export function StatementWorking({
  id,
  locale,
  onClose,
  actions,
}: {
  id: string;
  locale: StatementLocale;
  onClose: () => void;
  actions?: React.ReactNode;
}) {
  const statement = useStatement(id);
  const s = statement.data;
  return (
    <aside aria-label="Statement working" className="space-y-4 rounded-lg border border-accent/40 bg-panel p-4 shadow-lg">
      <div className="flex items-start justify-between gap-3">
        <div>
          <h2 className="font-semibold">{s ? s.template.title : 'Statement'}</h2>
          {s && (
            <p className="text-xs text-muted">
              {s.object.name}
              {s.venue ? ` · ${venueNightText(s)}` : ''}
            </p>
          )}
        </div>
        <Button variant="quiet" onClick={onClose}>
          Close
        </Button>
      </div>
      {statement.error && <Notice tone="error">{statement.error.message}</Notice>}
      {s && (
        <>
          <div className="flex items-center gap-2">
            <StatementStatusBadge status={s.status} />
            <Link to={paths.statement.href(s.id)} className="text-xs text-accent hover:underline">
              Open the statement page
            </Link>
          </div>
          <p className="font-serif text-[17px] leading-relaxed">{s.texts?.[locale] ?? 'This statement cannot be worked out.'}</p>
          {s.statusReason && <Notice tone={s.status === 'broken' ? 'error' : 'warning'}>{s.statusReason}</Notice>}
          {actions}
          <WorkingSteps working={s.working ?? []} warnings={s.warnings} model={s.model} />
        </>
      )}
    </aside>
  );
}
