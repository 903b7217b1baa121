import { Router } from 'express';
import { StatementCreateSchema, StatementListQuerySchema } from '@shared/schemas/statement.ts';
import { STATEMENT_TEMPLATES } from '@shared/statements/index.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate, validateQuery } from '../middlewares/validate.ts';
import type { Statement, User } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentStatement } from '../presenters/statement.ts';
import {
  acceptStatementWording,
  findOrCreateStatement,
  listStatements,
  loadStatementView,
  recomputeStatements,
} from '../services/statements/index.ts';
import { loadStatement } from './load.ts';

export const statementTemplatesRouter = Router();
statementTemplatesRouter.use(requireUser);
statementTemplatesRouter.get('/', (req, res) => {
  authorize(currentUser(req), 'statement', 'read');
  res.json({
    data: STATEMENT_TEMPLATES.map(
      ({ id, title, needs, kinds, kindsReason, usesCosmology, needsVenue, followsTonight, phraseOf }) => ({
        id,
        title,
        needs,
        kinds: [...kinds],
        kindsReason,
        usesCosmology,
        needsVenue: !!needsVenue,
        followsTonight: !!followsTonight,
        phraseOf: phraseOf ?? null,
      }),
    ),
  });
});

export const statementsRouter = Router();
statementsRouter.use(requireUser);

statementsRouter.get('/', validateQuery(StatementListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'statement', 'read');
  const q = req.query;
  const { rows, total } = await listStatements(q);
  res.json({
    data: rows.map(({ statement, object }) => presentStatement(statement, object, viewer)),
    meta: { total, page: q.page, pageSize: q.pageSize },
  });
});

/** The statement with its object and working, presented (what every answer about one statement sends). */
async function present(statement: Statement, viewer: User) {
  const { object, working } = await loadStatementView(statement);
  return presentStatement(statement, object, viewer, { working });
}

statementsRouter.post('/', validate(StatementCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'statement', 'create');
  const { objectId, templateId, venueId } = req.body;
  const { statement: made, created } = await findOrCreateStatement(objectId, templateId, viewer, venueId ?? null);
  res.status(created ? 201 : 200).json({ data: await present(await loadStatement(made.id), viewer) });
});

statementsRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const statement = await loadStatement(req.params.id);
  authorize(viewer, 'statement', 'read');
  res.json({ data: await present(statement, viewer) });
});

statementsRouter.post('/:id/recompute', async (req, res) => {
  const viewer = currentUser(req);
  const statement = await loadStatement(req.params.id);
  authorize(viewer, 'statement', 'recompute');
  await recomputeStatements({ statementIds: [statement.id] });
  res.json({ data: await present(await loadStatement(statement.id), viewer) });
});

statementsRouter.post('/:id/accept', async (req, res) => {
  const viewer = currentUser(req);
  const statement = await loadStatement(req.params.id);
  authorize(viewer, 'statement', 'accept', statement);
  await acceptStatementWording(statement, viewer);
  res.json({ data: await present(statement, viewer) });
});
