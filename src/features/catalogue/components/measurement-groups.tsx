import { useState } from 'react';
import type { MeasurementDto } from '@shared/schemas/measurement.ts';
import { confirmationOf, useRetireMeasurement, useReviewMeasurement, useSetPreferred } from '@/api/measurements.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { formatMeasurement, quantityTitle, sourceHref } from './format.ts';
import { formatDateTime } from '@/lib/format-date.ts';
import { ConfirmWarnings } from './confirm-warnings.tsx';
import { ReasonDialog } from '@/components/ui/reason-dialog.tsx';

function Status({ m }: { m: MeasurementDto }) {
  if (m.retired)
    return (
      <span className="inline-flex items-center gap-1 text-neutral">
        <Icon name="x" className="size-3.5" />
        Retired
      </span>
    );
  if (m.preferred)
    return (
      <span className="inline-flex items-center gap-1 font-semibold text-ok">
        <Icon name="check" className="size-3.5" />
        Preferred
      </span>
    );
  if (m.status === 'proposed')
    return (
      <span className="inline-flex items-center gap-1 text-changed">
        <Icon name="alert" className="size-3.5" />
        Proposed
      </span>
    );
  if (m.status === 'declined')
    return (
      <span className="inline-flex items-center gap-1 text-broken">
        <Icon name="x" className="size-3.5" />
        Declined
      </span>
    );
  return <span className="text-muted">Accepted</span>;
}

function Source({ m }: { m: MeasurementDto }) {
  if (!m.source) return <span className="text-changed">No source</span>;
  const href = sourceHref(m.source);
  return href ? (
    <a href={href} target="_blank" rel="noreferrer" className="text-accent hover:underline">
      {m.source.citation}
    </a>
  ) : (
    <span>{m.source.citation}</span>
  );
}

/** An object's measurements, one block per quantity and band, the preferred value first. */
export function MeasurementGroups({ objectId, measurements }: { objectId: string; measurements: MeasurementDto[] }) {
  const prefer = useSetPreferred(objectId);
  const review = useReviewMeasurement(objectId);
  const retire = useRetireMeasurement(objectId);
  const [showRetired, setShowRetired] = useState(false);
  const visible = measurements.filter((m) => showRetired || (!m.retired && m.status !== 'declined'));
  const groups = new Map<string, MeasurementDto[]>();
  for (const m of visible) {
    const key = quantityTitle(m.quantity, m.band);
    groups.set(key, [...(groups.get(key) ?? []), m]);
  }
  const hidden = measurements.length - visible.length;
  // A negative parallax made preferred is confirmed after reading which statements it breaks.
  const preferConfirmation = confirmationOf(prefer.error);
  const error = (preferConfirmation ? null : prefer.error) ?? review.error ?? retire.error;

  // Which measurement is waiting for a reason, and for which step.
  const [asking, setAsking] = useState<{ m: MeasurementDto; step: 'retire' | 'decline' } | null>(null);
  const askAndRetire = (m: MeasurementDto) => setAsking({ m, step: 'retire' });
  const askAndDecline = (m: MeasurementDto) => setAsking({ m, step: 'decline' });
  const done = { onSuccess: () => setAsking(null) };

  return (
    <div className="space-y-4">
      {asking && (
        <ReasonDialog
          title={asking.step === 'retire' ? `Retire ${formatMeasurement(asking.m)}` : 'Decline this proposal'}
          label={
            asking.step === 'retire'
              ? 'Why is it retired? It stays in the history with this reason.'
              : 'Why is it declined? The proposer sees the reason.'
          }
          confirm={asking.step === 'retire' ? 'Retire' : 'Decline'}
          busy={retire.isPending || review.isPending}
          onCancel={() => setAsking(null)}
          onConfirm={(reason) =>
            asking.step === 'retire'
              ? retire.mutate({ id: asking.m.id, reason }, done)
              : review.mutate({ id: asking.m.id, decision: 'decline', reason }, done)
          }
        />
      )}
      {preferConfirmation && prefer.variables && (
        <ConfirmWarnings
          confirmation={preferConfirmation}
          confirmLabel="Make it preferred anyway"
          busy={prefer.isPending}
          onConfirm={() => prefer.mutate({ ...prefer.variables!, confirm: true })}
          onCancel={() => prefer.reset()}
        />
      )}
      {error && (
        <Notice tone="error" title="That change was not made">
          {error.message}
        </Notice>
      )}
      {groups.size === 0 && <p className="text-sm text-muted">No measurements yet.</p>}
      {[...groups.entries()].map(([title, items]) => {
        const current = items.find((m) => m.preferred)?.id ?? null;
        return (
          <section key={title} aria-label={title} className="rounded-lg border border-rule bg-panel">
            <h3 className="border-b border-rule bg-wash px-4 py-2 text-sm font-semibold">{title}</h3>
            <ul>
              {items.map((m) => (
                <li
                  key={m.id}
                  className="grid grid-cols-[minmax(9rem,auto)_1fr_auto] items-center gap-4 border-b border-rule px-4 py-2 text-sm last:border-0"
                >
                  <div>
                    <span className="block font-mono tabular-nums text-ink">{formatMeasurement(m)}</span>
                    <Status m={m} />
                  </div>
                  <div className="min-w-0 text-xs text-muted">
                    <Source m={m} />
                    <span className="block">
                      Entered by {m.createdBy ?? 'someone no longer listed'} · {formatDateTime(m.createdAt)}
                      {m.reviewedBy && ` · ${m.status === 'declined' ? 'declined' : 'reviewed'} by ${m.reviewedBy}`}
                    </span>
                    {m.note && <span className="block italic">{m.note}</span>}
                    {m.reviewReason && <span className="block">Reason: {m.reviewReason}</span>}
                    {m.retireReason && <span className="block">Retired: {m.retireReason}</span>}
                  </div>
                  <div className="flex flex-wrap justify-end gap-1">
                    {m.can.prefer && !m.preferred && (
                      <Button
                        variant="secondary"
                        disabled={!m.source}
                        title={m.source ? undefined : 'Add a source first'}
                        busy={prefer.isPending && prefer.variables?.id === m.id}
                        onClick={() => prefer.mutate({ id: m.id, preferred: true, replaces: current })}
                      >
                        Make preferred
                      </Button>
                    )}
                    {m.can.review && (
                      <>
                        <Button variant="secondary" onClick={() => review.mutate({ id: m.id, decision: 'accept' })}>
                          Accept
                        </Button>
                        <Button variant="danger" onClick={() => askAndDecline(m)}>
                          Decline
                        </Button>
                      </>
                    )}
                    {m.can.retire && (
                      <Button variant="quiet" onClick={() => askAndRetire(m)}>
                        Retire
                      </Button>
                    )}
                  </div>
                </li>
              ))}
            </ul>
          </section>
        );
      })}
      {(hidden > 0 || showRetired) && (
        <Button variant="quiet" onClick={() => setShowRetired((v) => !v)}>
          {showRetired
            ? 'Hide retired and declined measurements'
            : `Show ${hidden} retired or declined measurement${hidden === 1 ? '' : 's'}`}
        </Button>
      )}
    </div>
  );
}
