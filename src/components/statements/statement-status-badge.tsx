import { STATEMENT_STATUS_LABELS, type StatementStatusValue } from '@shared/schemas/statement.ts';
import { Icon, type IconName } from '@/components/ui/icon.tsx';

const LOOK: Record<StatementStatusValue, { icon: IconName; className: string }> = {
  // A lighter wash for the green: on bg-ok/10 its small text fell just short of 4.5:1 contrast (axe-core).
  current: { icon: 'check', className: 'text-ok border-ok/40 bg-ok/5' },
  changed: { icon: 'alert', className: 'text-changed border-changed/40 bg-changed/10' },
  broken: { icon: 'x', className: 'text-broken border-broken/40 bg-broken/10' },
};

/** A statement's status: a word and an icon, never colour alone. */
export function StatementStatusBadge({ status }: { status: StatementStatusValue }) {
  const look = LOOK[status];
  return (
    <span className={`inline-flex items-center gap-1 rounded-full border px-2 py-0.5 text-xs font-medium ${look.className}`}>
      <Icon name={look.icon} className="size-3.5" />
      {STATEMENT_STATUS_LABELS[status]}
    </span>
  );
}
