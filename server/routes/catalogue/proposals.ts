import { Router } from 'express';
import {
  ObjectProposalSchema,
  ProposalListQuerySchema,
  ProposalReviewSchema,
  SourceProposalSchema,
} from '@shared/schemas/catalogue-proposal.ts';
import { AuthorizationError } from '../../errors.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate, validateQuery } from '../../middlewares/validate.ts';
import { authorize, can } from '../../policies/index.ts';
import { presentProposal } from '../../presenters/catalogue-proposal.ts';
import { listProposals, proposeSkyObject, proposeSource, reviewProposal } from '../../services/catalogue/index.ts';
import { loadProposal } from '../load.ts';

export const proposalsRouter = Router();

proposalsRouter.get('/', validateQuery(ProposalListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'read');
  const rows = await listProposals(req.query.status);
  res.json({ data: rows.map((p) => presentProposal(p, viewer)) });
});

proposalsRouter.post('/objects', validate(ObjectProposalSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'proposeEntry');
  const proposal = await proposeSkyObject(req.body, viewer, req.ip);
  res.status(201).json({ data: presentProposal(await loadProposal(proposal.id), viewer) });
});

proposalsRouter.post('/sources', validate(SourceProposalSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'proposeEntry');
  const proposal = await proposeSource(req.body, viewer, req.ip);
  res.status(201).json({ data: presentProposal(await loadProposal(proposal.id), viewer) });
});

proposalsRouter.post('/:id/review', validate(ProposalReviewSchema), async (req, res) => {
  const viewer = currentUser(req);
  const proposal = await loadProposal(req.params.id);
  // Say who can, rather than only "no": the screen shows this message.
  if (!can(viewer, 'catalogue', 'reviewProposal', proposal))
    throw AuthorizationError(
      proposal.createdById === viewer.id
        ? 'You made this proposal, so someone else reviews it: a reviewer or an admin.'
        : 'Proposals are accepted or declined by a reviewer or an admin.',
    );
  await reviewProposal(proposal.id, req.body, viewer, req.ip);
  res.json({ data: presentProposal(await loadProposal(proposal.id), viewer) });
});
