import type { PageDto, PageStatementDto } from '@shared/schemas/page.ts';
import { StatementStatusBadge } from '@/components/statements/statement-status-badge.tsx';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';

function Row({
  s,
  canReview,
  busy,
  onSignOff,
  onWorking,
}: {
  s: PageStatementDto;
  canReview: boolean;
  busy: boolean;
  onSignOff: () => void;
  onWorking: () => void;
}) {
  const moved = s.signedText !== null && s.text !== s.signedText;
  return (
    <li className="space-y-2 rounded-md border border-rule p-3">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <span className="text-sm font-medium">
          {s.templateTitle}
          <span className="font-normal text-muted"> · {s.objectName}</span>
        </span>
        <StatementStatusBadge status={s.status} />
      </div>
      {moved ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <div>
            <p className="text-xs text-muted">Signed off (live now)</p>
            <p className="font-serif text-[15px] text-ink/80 line-through decoration-changed/60">{s.signedText}</p>
          </div>
          <div>
            <p className="text-xs text-changed">New wording</p>
            <p className="font-serif text-[15px]">{s.text ?? 'Cannot be worked out'}</p>
          </div>
        </div>
      ) : (
        <p className="font-serif text-[15px]">{s.text ?? 'Cannot be worked out'}</p>
      )}
      {s.status === 'broken' && s.statusReason && <p className="text-xs text-broken">{s.statusReason}</p>}
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="secondary" onClick={onWorking}>
          Show working
        </Button>
        {s.signedOff ? (
          <span className="inline-flex items-center gap-1 text-sm text-ok">
            <Icon name="check" className="size-4" />
            Signed off
          </span>
        ) : (
          canReview &&
          s.status !== 'broken' && (
            <Button busy={busy} onClick={onSignOff}>
              {moved || s.status === 'changed' ? 'Accept new wording and sign off' : 'Sign off statement'}
            </Button>
          )
        )}
      </div>
    </li>
  );
}

/** Each statement on the page: wording (old and new when it moved), its working, and its sign-off. */
export function ReviewStatements({
  page,
  busyId,
  onSignOff,
  onWorking,
}: {
  page: PageDto;
  busyId: string | null;
  onSignOff: (id: string) => void;
  onWorking: (id: string) => void;
}) {
  return (
    <section aria-labelledby="review-statements" className="space-y-3">
      <h2 id="review-statements" className="font-semibold">
        Statements on this page ({page.statements.length})
      </h2>
      {page.statements.length === 0 && <p className="text-sm text-muted">This page has no statements.</p>}
      <ul className="space-y-2">
        {page.statements.map((s) => (
          <Row
            key={s.id}
            s={s}
            canReview={page.can.review}
            busy={busyId === s.id}
            onSignOff={() => onSignOff(s.id)}
            onWorking={() => onWorking(s.id)}
          />
        ))}
      </ul>
    </section>
  );
}
