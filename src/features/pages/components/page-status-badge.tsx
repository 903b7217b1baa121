import { PAGE_STATUS_LABELS, type PageStatus } from '@shared/schemas/page.ts';
import { Icon, type IconName } from '@/components/ui/icon.tsx';

const LOOK: Record<PageStatus, { icon: IconName; className: string }> = {
  draft: { icon: 'page', className: 'text-neutral border-rule bg-wash' },
  in_review: { icon: 'info', className: 'text-accent border-accent/40 bg-accent/10' },
  // A lighter wash for the green: on bg-ok/10 its small text fell just short of 4.5:1 contrast (axe-core).
  approved: { icon: 'check', className: 'text-ok border-ok/40 bg-ok/5' },
  published: { icon: 'globe', className: 'text-ok border-ok/40 bg-ok/5' },
  needs_recheck: { icon: 'alert', className: 'text-changed border-changed/40 bg-changed/10' },
};

/** A page's workflow state: a word and an icon, never colour alone. */
export function PageStatusBadge({ status }: { status: PageStatus }) {
  const look = LOOK[status];
  return (
    <span
      className={`inline-flex items-center gap-1 whitespace-nowrap rounded-full border px-2 py-0.5 text-xs font-medium ${look.className}`}
    >
      <Icon name={look.icon} className="size-3.5" />
      {PAGE_STATUS_LABELS[status]}
    </span>
  );
}
