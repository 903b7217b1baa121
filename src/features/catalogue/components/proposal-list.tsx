import { useState } from 'react';
import { Link } from 'react-router-dom';
import { KIND_LABELS, type SkyObjectKind } from '@shared/catalogue/kinds.ts';
import type { ProposalDto, ProposalKind } from '@shared/schemas/catalogue-proposal.ts';
import { useProposals, useReviewProposal } from '@/api/catalogue-proposals.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { ReasonDialog } from '@/components/ui/reason-dialog.tsx';
import { paths } from '@/config/paths.ts';
import { formatDateTime } from '@/lib/format-date.ts';

const STATUS_LABELS: Record<ProposalDto['status'], string> = {
  proposed: 'Waiting for a reviewer',
  accepted: 'Accepted',
  declined: 'Declined',
};

/** The details a reviewer checks, in words: position and kind for an object, identifiers for a source. */
function details(p: ProposalDto): string {
  const v = p.values;
  if (p.kind === 'object') {
    const position =
      v.raDeg === null ? 'no fixed position' : `RA ${Number(v.raDeg).toFixed(4)}°, Dec ${Number(v.decDeg).toFixed(4)}°`;
    return `${KIND_LABELS[v.kind as SkyObjectKind] ?? String(v.kind)}, ${position}`;
  }
  return (['bibcode', 'doi', 'url'] as const)
    .filter((k) => v[k])
    .map((k) => `${k === 'doi' ? 'DOI' : k === 'url' ? 'URL' : 'Bibcode'} ${String(v[k])}`)
    .join(' · ');
}

function ProposalRow({ proposal, onDecline }: { proposal: ProposalDto; onDecline: (p: ProposalDto) => void }) {
  const review = useReviewProposal();
  const created =
    proposal.status === 'accepted' && proposal.recordId
      ? proposal.kind === 'object'
        ? paths.catalogueObject.href(proposal.recordId)
        : paths.sources.href()
      : null;
  return (
    <li className="space-y-1 rounded-md border border-rule bg-panel p-3 text-sm">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <span className="font-medium break-words">{proposal.title}</span>
        <span
          className={proposal.status === 'declined' ? 'text-broken' : proposal.status === 'accepted' ? 'text-ok' : 'text-changed'}
        >
          {STATUS_LABELS[proposal.status]}
        </span>
      </div>
      <p className="text-muted break-words">{details(proposal)}</p>
      {proposal.source && <p className="text-muted break-words">Source: {proposal.source.citation}</p>}
      <p className="text-xs text-muted">
        Proposed by {proposal.proposedBy ?? 'a former staff member'} · {formatDateTime(proposal.createdAt)}
        {proposal.reviewedBy && ` · reviewed by ${proposal.reviewedBy}`}
      </p>
      {proposal.reviewReason && <p className="break-words">Reviewer’s reason: {proposal.reviewReason}</p>}
      {created && (
        <Link to={created} className="text-accent underline">
          Open the {proposal.kind === 'object' ? 'object' : 'sources list'}
        </Link>
      )}
      {review.error && <Notice tone="error">{review.error.message}</Notice>}
      {proposal.can.review && (
        <div className="flex flex-wrap gap-2 pt-1">
          <Button busy={review.isPending} onClick={() => review.mutate({ id: proposal.id, decision: 'accept' })}>
            Accept {proposal.kind}
          </Button>
          <Button variant="secondary" disabled={review.isPending} onClick={() => onDecline(proposal)}>
            Decline…
          </Button>
        </div>
      )}
    </li>
  );
}

/**
 * Proposed objects or sources: those waiting first, then the latest reviewed with the reviewer's
 * reason. Reviewers and admins accept or decline here; everyone else sees who will.
 */
export function ProposalList({ kind, reviewer }: { kind: ProposalKind; reviewer: boolean }) {
  const proposals = useProposals();
  const review = useReviewProposal();
  const [declining, setDeclining] = useState<ProposalDto | null>(null);
  const mine = (proposals.data ?? []).filter((p) => p.kind === kind);
  const waiting = mine.filter((p) => p.status === 'proposed');
  const reviewed = mine.filter((p) => p.status !== 'proposed').slice(0, 5);
  if (proposals.error) return <Notice tone="error">{proposals.error.message}</Notice>;
  if (mine.length === 0) return null;
  const noun = kind === 'object' ? 'objects' : 'sources';
  return (
    <section aria-label={`Proposed ${noun}`} className="space-y-2">
      <h2 className="text-base font-semibold">
        Proposed {noun} ({waiting.length} waiting)
      </h2>
      <p className="text-xs text-muted">
        {reviewer
          ? 'Check each against its source, then accept it into the catalogue or decline it with a reason the proposer will read.'
          : 'A reviewer or an admin accepts or declines each proposal; their reason shows here.'}
      </p>
      {review.error && <Notice tone="error">{review.error.message}</Notice>}
      <ul className="space-y-2">
        {[...waiting, ...reviewed].map((p) => (
          <ProposalRow key={p.id} proposal={p} onDecline={setDeclining} />
        ))}
      </ul>
      {declining && (
        <ReasonDialog
          title={`Decline “${declining.title}”`}
          label="Why is it declined? The proposer reads this."
          confirm="Decline"
          busy={review.isPending}
          onCancel={() => setDeclining(null)}
          onConfirm={(reason) =>
            review.mutate({ id: declining.id, decision: 'decline', reason }, { onSuccess: () => setDeclining(null) })
          }
        />
      )}
    </section>
  );
}
