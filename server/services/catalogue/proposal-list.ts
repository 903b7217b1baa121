import { CatalogueProposal, Source, User } from '../../models/index.ts';

/** What a proposal's presenter reads beside it: the source cited, who proposed and who reviewed. */
export const proposalIncludes = () => [
  { model: Source, as: 'source', attributes: ['id', 'citation'] },
  { model: User, as: 'createdBy', attributes: ['id', 'name'] },
  { model: User, as: 'reviewedBy', attributes: ['id', 'name'] },
];

/**
 * Proposed objects and sources, oldest waiting first; with `all`, the latest 200 of every status.
 * @param status 'proposed' for those waiting, 'all' for the recent ones reviewed too
 */
export async function listProposals(status: 'proposed' | 'all'): Promise<CatalogueProposal[]> {
  return CatalogueProposal.findAll({
    where: status === 'proposed' ? { status: 'proposed' } : {},
    include: proposalIncludes(),
    order: status === 'proposed' ? [['createdAt', 'ASC']] : [['createdAt', 'DESC']],
    limit: 200,
  });
}

/** One proposal with what its presenter reads. */
export const findProposal = (id: string) => CatalogueProposal.findByPk(id, { include: proposalIncludes() });
