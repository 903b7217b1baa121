import { Router } from 'express';
import { QueryTypes } from 'sequelize';
import { z } from 'zod';
import { SourceInputSchema, type SourceValues } from '@shared/schemas/source.ts';
import { getSequelize } from '../../db.ts';
import { NotFoundError } from '../../errors.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate } from '../../middlewares/validate.ts';
import { Measurement, Source } from '../../models/index.ts';
import { authorize } from '../../policies/index.ts';
import { presentSource } from '../../presenters/source.ts';
import { createSource, updateSource } from '../../services/source-write.ts';
import { findSource } from './load.ts';
import { containsPattern } from '../../db/like-pattern.ts';

const notFound = () => NotFoundError('There is no source with that id.');
const SourceListQuerySchema = z.object({ q: z.string().trim().max(200).optional() });

export const sourcesRouter = Router();

sourcesRouter.get('/', validate(SourceListQuerySchema, 'query'), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'read');
  const { q } = req.query as { q?: string };
  const pattern = q ? containsPattern(q, { lower: true }) : null;
  const rows = await getSequelize().query<{ id: string; count: string }>(
    `SELECT s.id, (SELECT count(*) FROM measurements m WHERE m.source_id = s.id AND m.retired_at IS NULL) AS count
     FROM sources s WHERE $1::text IS NULL OR lower(s.citation) LIKE $1 OR lower(coalesce(s.bibcode, '')) LIKE $1 OR lower(coalesce(s.doi, '')) LIKE $1
     ORDER BY lower(s.citation) LIMIT 500`,
    { type: QueryTypes.SELECT, bind: [pattern] },
  );
  const sources = await Source.findAll({ where: { id: rows.map((r) => r.id) } });
  const byId = new Map(sources.map((s) => [s.id, s]));
  res.json({ data: rows.map((r) => presentSource(byId.get(r.id)!, viewer, Number(r.count))) });
});

sourcesRouter.post('/', validate(SourceInputSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'editSource');
  const source = await createSource(req.body as SourceValues, viewer, req.ip);
  res.status(201).json({ data: presentSource(source, viewer, 0) });
});

sourcesRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'read');
  const source = await findSource(req.params.id);
  if (!source) throw notFound();
  res.json({ data: presentSource(source, viewer, await Measurement.count({ where: { sourceId: source.id, retiredAt: null } })) });
});

sourcesRouter.patch('/:id', validate(SourceInputSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'editSource');
  const source = await findSource(req.params.id);
  if (!source) throw notFound();
  const updated = await updateSource(source, req.body as SourceValues, viewer, req.ip);
  res.json({
    data: presentSource(updated, viewer, await Measurement.count({ where: { sourceId: source.id, retiredAt: null } })),
  });
});
