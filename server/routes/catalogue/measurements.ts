import { Router } from 'express';
import { z } from 'zod';
import {
  MeasurementInputSchema,
  MeasurementPreferredSchema,
  MeasurementRetireSchema,
  MeasurementReviewSchema,
} from '@shared/schemas/measurement.ts';
import { CatalogueLimits } from '@shared/validations.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate, validateQuery } from '../../middlewares/validate.ts';
import { authorize } from '../../policies/index.ts';
import { presentMeasurement } from '../../presenters/measurement.ts';
import { setPreferred, reviewMeasurement, retireMeasurement, updateMeasurement } from '../../services/catalogue/index.ts';
import { loadMeasurement } from '../load.ts';

const ChangeReasonSchema = z.object({
  reason: z.string().trim().max(CatalogueLimits.reasonMax, `At most ${CatalogueLimits.reasonMax} characters`).optional(),
});

export const measurementsRouter = Router();

measurementsRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const m = await loadMeasurement(req.params.id);
  authorize(viewer, 'catalogue', 'read');
  res.json({ data: presentMeasurement(m, viewer) });
});

measurementsRouter.patch('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const m = await loadMeasurement(req.params.id);
  // Refused before the body is read, as the other catalogue writes are.
  authorize(viewer, 'catalogue', 'keepMeasurements');
  const values = MeasurementInputSchema.parse(req.body ?? {});
  const { reason } = ChangeReasonSchema.parse(req.body ?? {});
  await updateMeasurement(m.id, values, viewer, reason || null);
  res.json({ data: presentMeasurement(await loadMeasurement(m.id), viewer) });
});

// Measurements are never deleted: DELETE retires one, keeping it and its history.
measurementsRouter.delete('/:id', validateQuery(MeasurementRetireSchema), async (req, res) => {
  const viewer = currentUser(req);
  const m = await loadMeasurement(req.params.id);
  authorize(viewer, 'catalogue', 'keepMeasurements');
  await retireMeasurement(m.id, req.query.reason, viewer);
  res.json({ data: presentMeasurement(await loadMeasurement(m.id), viewer) });
});

measurementsRouter.put('/:id/preferred', validate(MeasurementPreferredSchema), async (req, res) => {
  const viewer = currentUser(req);
  const m = await loadMeasurement(req.params.id);
  authorize(viewer, 'catalogue', 'keepMeasurements');
  await setPreferred(m.id, req.body, viewer);
  res.json({ data: presentMeasurement(await loadMeasurement(m.id), viewer) });
});

measurementsRouter.post('/:id/review', validate(MeasurementReviewSchema), async (req, res) => {
  const viewer = currentUser(req);
  const m = await loadMeasurement(req.params.id);
  authorize(viewer, 'catalogue', 'keepMeasurements');
  await reviewMeasurement(m.id, req.body, viewer);
  res.json({ data: presentMeasurement(await loadMeasurement(m.id), viewer) });
});
