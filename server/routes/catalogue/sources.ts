import { Router } from 'express';
import { z } from 'zod';
import { SourceInputSchema } from '@shared/schemas/source.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate, validateQuery } from '../../middlewares/validate.ts';
import { authorize } from '../../policies/index.ts';
import { presentSource } from '../../presenters/source.ts';
import { listSources, measurementsCiting, createSource, updateSource } from '../../services/catalogue/index.ts';
import { loadSource } from '../load.ts';

const SourceListQuerySchema = z.object({ q: z.string().trim().max(200).optional() });

export const sourcesRouter = Router();

sourcesRouter.get('/', validateQuery(SourceListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'read');
  const { q } = req.query;
  const rows = await listSources(q);
  res.json({ data: rows.map((r) => presentSource(r.source, viewer, r.measurementCount)) });
});

sourcesRouter.post('/', validate(SourceInputSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'editSource');
  const source = await createSource(req.body, viewer, req.ip);
  res.status(201).json({ data: presentSource(source, viewer, 0) });
});

sourcesRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const source = await loadSource(req.params.id);
  authorize(viewer, 'catalogue', 'read');
  res.json({ data: presentSource(source, viewer, await measurementsCiting(source)) });
});

sourcesRouter.patch('/:id', validate(SourceInputSchema), async (req, res) => {
  const viewer = currentUser(req);
  const source = await loadSource(req.params.id);
  authorize(viewer, 'catalogue', 'editSource');
  const updated = await updateSource(source, req.body, viewer, req.ip);
  res.json({
    data: presentSource(updated, viewer, await measurementsCiting(source)),
  });
});
