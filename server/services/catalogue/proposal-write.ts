import { UniqueConstraintError, type Transaction } from 'sequelize';
import type { ProposalKind, ProposalReviewInput } from '@shared/schemas/catalogue-proposal.ts';
import type { SkyObjectValues } from '@shared/schemas/sky-object.ts';
import type { SourceValues } from '@shared/schemas/source.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError, ValidationError } from '../../errors.ts';
import { CatalogueProposal, Source, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { assertNameFree, createSkyObject } from './sky-object-write.ts';
import { assertUnique, createSource } from './source-write.ts';

const WHAT: Record<ProposalKind, string> = { object: 'object', source: 'source' };

/** Stores a proposal and its audit event; a second waiting proposal of the same name is refused. */
async function storeProposal(
  kind: ProposalKind,
  title: string,
  values: Record<string, unknown>,
  sourceId: string | null,
  actor: User,
  ip: string | undefined,
): Promise<CatalogueProposal> {
  try {
    return await getSequelize().transaction(async (transaction) => {
      const proposal = await CatalogueProposal.create(
        { kind, title, proposedValues: values, sourceId, createdById: actor.id },
        { transaction },
      );
      await recordAudit(
        {
          actorId: actor.id,
          action: `catalogue.${kind}_proposed`,
          subjectType: 'catalogue_proposal',
          subjectId: proposal.id,
          data: { title },
          ip,
        },
        transaction,
      );
      return proposal;
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError)
      throw ConflictError(
        `"${title}" has already been proposed and is waiting for a reviewer; there is no need to propose it again.`,
        'proposal_exists',
      );
    throw error;
  }
}

/**
 * A writer or editor proposes an object, citing the source its name and position come from.
 * @throws HttpError 400 when the source does not exist; 409 when the name is taken or already proposed
 */
export async function proposeSkyObject(
  values: SkyObjectValues & { sourceId: string },
  actor: User,
  ip?: string,
): Promise<CatalogueProposal> {
  const { sourceId, ...object } = values;
  if (!(await Source.findByPk(sourceId)))
    throw ValidationError('That source does not exist; choose one from the list.', {
      sourceId: 'Source: choose a source from the list.',
    });
  await assertNameFree(object.name);
  return storeProposal('object', object.name, object, sourceId, actor, ip);
}

/**
 * A writer or editor proposes a source.
 * @throws HttpError 409 when its citation, bibcode or DOI is already in the catalogue or already proposed
 */
export async function proposeSource(values: SourceValues, actor: User, ip?: string): Promise<CatalogueProposal> {
  await assertUnique(values);
  return storeProposal('source', values.citation, values, null, actor, ip);
}

/** Creates what an accepted proposal describes, inside the review's transaction. */
async function createFromProposal(proposal: CatalogueProposal, actor: User, ip: string | undefined, transaction: Transaction) {
  if (proposal.kind === 'object') {
    const object = await createSkyObject(proposal.proposedValues as unknown as SkyObjectValues, actor, ip, transaction);
    return object.id;
  }
  const source = await createSource(proposal.proposedValues as unknown as SourceValues, actor, ip, transaction);
  return source.id;
}

/**
 * A reviewer accepts a proposal (the object or source is created, as if they had entered it) or
 * declines it with a reason; both are audit events naming who proposed it.
 * @throws HttpError 409 when it has been reviewed meanwhile, or the name has been taken since
 */
export async function reviewProposal(
  proposalId: string,
  input: ProposalReviewInput,
  actor: User,
  ip?: string,
): Promise<CatalogueProposal> {
  return getSequelize().transaction(async (transaction) => {
    const proposal = await CatalogueProposal.findByPk(proposalId, { transaction, lock: transaction.LOCK.UPDATE });
    if (proposal?.status !== 'proposed')
      throw ConflictError('This proposal has already been reviewed; reload the page.', 'already_reviewed');
    const accepted = input.decision === 'accept';
    const recordId = accepted ? await createFromProposal(proposal, actor, ip, transaction) : null;
    proposal.set({
      status: accepted ? 'accepted' : 'declined',
      reviewedById: actor.id,
      reviewedAt: new Date(),
      reviewReason: input.reason || null,
      recordId,
    });
    await proposal.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: accepted ? 'catalogue.proposal_accepted' : 'catalogue.proposal_declined',
        subjectType: 'catalogue_proposal',
        subjectId: proposal.id,
        data: {
          kind: WHAT[proposal.kind],
          title: proposal.title,
          proposedBy: proposal.createdById,
          reason: input.reason || null,
          recordId,
        },
        ip,
      },
      transaction,
    );
    return proposal;
  });
}
