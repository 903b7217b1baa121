import { Router } from 'express';
import { z } from 'zod';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate } from '../../middlewares/validate.ts';
import { authorize } from '../../policies/index.ts';
import { exportMeasurementsCsv, exportObjectsCsv } from '../../services/catalogue/index.ts';

const stamp = () => new Date().toISOString().slice(0, 10);

export const exportsRouter = Router();

exportsRouter.get('/objects.csv', async (req, res) => {
  authorize(currentUser(req), 'catalogue', 'export');
  res.attachment(`starproof-objects-${stamp()}.csv`).type('text/csv; charset=utf-8');
  await exportObjectsCsv(res);
  res.end();
});

exportsRouter.get(
  '/measurements.csv',
  validate(z.object({ objectId: z.uuid({ message: 'objectId must be an object id' }).optional() }), 'query'),
  async (req, res) => {
    authorize(currentUser(req), 'catalogue', 'export');
    res.attachment(`starproof-measurements-${stamp()}.csv`).type('text/csv; charset=utf-8');
    await exportMeasurementsCsv(res, (req.query as { objectId?: string }).objectId);
    res.end();
  },
);
