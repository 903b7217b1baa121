import { Router } from 'express';
import { DiffQuerySchema, RestoreSchema, type PageRevisionDto } from '@shared/schemas/page.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate, validateQuery } from '../../middlewares/validate.ts';
import { PageRevision, User } from '../../models/index.ts';
import { authorize } from '../../policies/index.ts';
import { loadPageDetail, diffRevisions, savePage, loadStatements } from '../../services/pages/index.ts';
import { loadPage, loadRevision, parentParam } from '../load.ts';

/** A page's saved versions (mounted under /api/pages/:id/revisions). */
export const revisionsRouter = Router({ mergeParams: true });

revisionsRouter.get('/', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'read', page);
  const revisions = await PageRevision.findAll({
    where: { pageId: page.id },
    attributes: ['id', 'number', 'title', 'authorId', 'createdAt', 'restoredFrom'],
    order: [['number', 'DESC']],
  });
  const authors = new Map(
    (
      await User.findAll({
        attributes: ['id', 'name'],
        where: { id: [...new Set(revisions.map((r) => r.authorId).filter((x): x is string => !!x))] },
      })
    ).map((u) => [u.id, u.name]),
  );
  const data: PageRevisionDto[] = revisions.map((r) => ({
    id: r.id,
    number: r.number,
    title: r.title,
    author: r.authorId ? (authors.get(r.authorId) ?? null) : null,
    createdAt: r.createdAt.toISOString(),
    restoredFrom: r.restoredFrom ?? null,
    marks: [
      ...(r.id === page.currentRevisionId ? (['current'] as const) : []),
      ...(r.id === page.approvedRevisionId ? (['approved'] as const) : []),
      ...(r.id === page.publishedRevisionId ? (['published'] as const) : []),
    ],
  }));
  res.json({ data });
});

revisionsRouter.get('/diff', validateQuery(DiffQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'read', page);
  const { from, to } = req.query;
  const [a, b] = await Promise.all([loadRevision(page, from), loadRevision(page, to)]);
  const statements = await loadStatements([...new Set([...a.statementIds, ...b.statementIds])]);
  res.json({ data: diffRevisions(a, b, (id) => statements.get(id)?.templateTitle ?? 'statement') });
});

revisionsRouter.get('/:number', async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'read', page);
  const r = await loadRevision(page, req.params.number);
  res.json({ data: { id: r.id, number: r.number, title: r.title, doc: r.doc, createdAt: r.createdAt.toISOString() } });
});

/** Restores an old revision as a new one; history is never rewritten. */
revisionsRouter.post('/:number/restore', validate(RestoreSchema), async (req, res) => {
  const viewer = currentUser(req);
  const page = await loadPage(parentParam(req, 'id'));
  authorize(viewer, 'page', 'edit', page);
  const r = await loadRevision(page, req.params.number);
  // A stale version throws PageConflictError: a 409 whose error carries the server's version (`error.current`).
  const { page: saved } = await savePage(
    page.id,
    { version: req.body.version, title: r.title, doc: r.doc, restoredFrom: r.number },
    viewer,
  );
  res.json({ data: await loadPageDetail(saved, viewer) });
});
