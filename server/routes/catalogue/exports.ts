import { Router } from 'express';
import { z } from 'zod';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validateQuery } from '../../middlewares/validate.ts';
import { authorize } from '../../policies/index.ts';
import { exportMeasurementsCsv, exportObjectsCsv } from '../../services/catalogue/index.ts';

const MeasurementsExportQuerySchema = z.object({ objectId: z.uuid({ message: 'objectId must be an object id' }).optional() });

const stamp = () => new Date().toISOString().slice(0, 10);

export const exportsRouter = Router();

exportsRouter.get('/objects.csv', async (req, res) => {
  authorize(currentUser(req), 'catalogue', 'export');
  res.attachment(`starproof-objects-${stamp()}.csv`).type('text/csv; charset=utf-8');
  await exportObjectsCsv(res);
  res.end();
});

exportsRouter.get('/measurements.csv', validateQuery(MeasurementsExportQuerySchema), async (req, res) => {
  authorize(currentUser(req), 'catalogue', 'export');
  res.attachment(`starproof-measurements-${stamp()}.csv`).type('text/csv; charset=utf-8');
  await exportMeasurementsCsv(res, req.query.objectId);
  res.end();
});
