import { Router } from 'express';
import { Op, type WhereOptions } from 'sequelize';
import { IdSchema } from '@shared/schemas/common.ts';
import { StatementCreateSchema, StatementListQuerySchema } from '@shared/schemas/statement.ts';
import { STATEMENT_TEMPLATES } from '@shared/statements/index.ts';
import { NotFoundError } from '../errors.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate, validateQuery } from '../middlewares/validate.ts';
import { CosmologyDescription, SkyObject, Statement, Venue } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentStatement } from '../presenters/statement.ts';
import { acceptStatementWording } from '../services/statements/accept.ts';
import { findOrCreateStatement } from '../services/statements/create.ts';
import { recomputeStatements } from '../services/statements/recompute.ts';
import { readWorking } from '../services/statements/working-store.ts';

/** What presenting a statement needs loaded with it: its cosmology and its venue. */
const INCLUDE = [
  { model: CosmologyDescription, as: 'modelDescription' },
  { model: Venue, as: 'venue', attributes: ['id', 'name', 'timeZone'] },
];

async function loadStatement(id: string) {
  if (!IdSchema.safeParse(id).success) throw NotFoundError('There is no such statement.');
  const statement = await Statement.findByPk(id, { include: INCLUDE });
  if (!statement) throw NotFoundError('There is no such statement.');
  const object = await SkyObject.findByPk(statement.skyObjectId, { attributes: ['id', 'name', 'kind'] });
  return { statement, object: object!, working: await readWorking(statement.working) };
}

export const statementTemplatesRouter = Router();
statementTemplatesRouter.use(requireUser);
statementTemplatesRouter.get('/', (req, res) => {
  authorize(currentUser(req), 'statement', 'read');
  res.json({
    data: STATEMENT_TEMPLATES.map(({ id, title, needs, usesCosmology, needsVenue, followsTonight }) => ({
      id,
      title,
      needs,
      usesCosmology,
      needsVenue: !!needsVenue,
      followsTonight: !!followsTonight,
    })),
  });
});

export const statementsRouter = Router();
statementsRouter.use(requireUser);

statementsRouter.get('/', validateQuery(StatementListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'statement', 'read');
  const q = req.query;
  const where: WhereOptions<Statement> = {
    ...(q.status ? { status: q.status } : {}),
    ...(q.objectId ? { skyObjectId: q.objectId } : {}),
    ...(q.templateId ? { templateId: q.templateId } : {}),
  };
  const { rows, count } = await Statement.findAndCountAll({
    where,
    // The list shows no working: leave it in the database.
    attributes: { exclude: ['working'] },
    include: INCLUDE,
    // Statements that need attention first, then the newest computations.
    order: [
      [Statement.sequelize!.literal("CASE status WHEN 'broken' THEN 0 WHEN 'changed' THEN 1 ELSE 2 END"), 'ASC'],
      ['computedAt', 'DESC'],
    ],
    limit: q.pageSize,
    offset: (q.page - 1) * q.pageSize,
  });
  const objects = new Map(
    (
      await SkyObject.findAll({
        where: { id: { [Op.in]: [...new Set(rows.map((s) => s.skyObjectId))] } },
        attributes: ['id', 'name', 'kind'],
      })
    ).map((o) => [o.id, o]),
  );
  res.json({
    data: rows.map((s) => presentStatement(s, objects.get(s.skyObjectId)!, viewer)),
    meta: { total: count, page: q.page, pageSize: q.pageSize },
  });
});

statementsRouter.post('/', validate(StatementCreateSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'statement', 'create');
  const { objectId, templateId, venueId } = req.body;
  const { statement: made, created } = await findOrCreateStatement(objectId, templateId, viewer, venueId ?? null);
  const { statement, object, working } = await loadStatement(made.id);
  res.status(created ? 201 : 200).json({ data: presentStatement(statement, object, viewer, { working }) });
});

statementsRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'statement', 'read');
  const { statement, object, working } = await loadStatement(req.params.id as string);
  res.json({ data: presentStatement(statement, object, viewer, { working }) });
});

statementsRouter.post('/:id/recompute', async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'statement', 'recompute');
  const { statement } = await loadStatement(req.params.id as string);
  await recomputeStatements({ statementIds: [statement.id] });
  const reloaded = await loadStatement(statement.id);
  res.json({ data: presentStatement(reloaded.statement, reloaded.object, viewer, { working: reloaded.working }) });
});

statementsRouter.post('/:id/accept', async (req, res) => {
  const viewer = currentUser(req);
  const { statement, object, working } = await loadStatement(req.params.id as string);
  authorize(viewer, 'statement', 'accept', statement);
  await acceptStatementWording(statement, viewer);
  res.json({ data: presentStatement(statement, object, viewer, { working }) });
});
