import type { ProposalDto } from '@shared/schemas/catalogue-proposal.ts';
import type { CatalogueProposal, User } from '../models/index.ts';
import { can } from '../policies/index.ts';

/** The API contract for a proposed object or source (loaded with its source and people). */
export function presentProposal(proposal: CatalogueProposal, viewer: User): ProposalDto {
  return {
    id: proposal.id,
    kind: proposal.kind,
    status: proposal.status,
    title: proposal.title,
    values: proposal.proposedValues,
    source: proposal.source ? { id: proposal.source.id, citation: proposal.source.citation } : null,
    proposedBy: proposal.createdBy?.name ?? null,
    createdAt: proposal.createdAt.toISOString(),
    reviewedBy: proposal.reviewedBy?.name ?? null,
    reviewedAt: proposal.reviewedAt?.toISOString() ?? null,
    reviewReason: proposal.reviewReason,
    recordId: proposal.recordId,
    can: { review: proposal.status === 'proposed' && can(viewer, 'catalogue', 'reviewProposal', proposal) },
  };
}
