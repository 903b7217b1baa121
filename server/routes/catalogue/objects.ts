import { Router } from 'express';
import { MeasurementInputSchema } from '@shared/schemas/measurement.ts';
import { SkyObjectInputSchema, SkyObjectListQuerySchema } from '@shared/schemas/sky-object.ts';
import { AuthorizationError } from '../../errors.ts';
import { currentUser } from '../../middlewares/authenticate.ts';
import { validate, validateQuery } from '../../middlewares/validate.ts';
import { Measurement } from '../../models/index.ts';
import { authorize, can } from '../../policies/index.ts';
import { presentMeasurement } from '../../presenters/measurement.ts';
import { presentSkyObject } from '../../presenters/sky-object.ts';
import {
  createMeasurement,
  createSkyObject,
  deleteSkyObject,
  updateSkyObject,
  listSkyObjects,
  loadObjectHistory,
} from '../../services/catalogue/index.ts';
import { loadMeasurement, loadSkyObject, measurementIncludes } from '../load.ts';

export const objectsRouter = Router();

objectsRouter.get('/', validateQuery(SkyObjectListQuerySchema), async (req, res) => {
  authorize(currentUser(req), 'catalogue', 'read');
  res.json({ data: await listSkyObjects(req.query) });
});

objectsRouter.post('/', validate(SkyObjectInputSchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'catalogue', 'editObject');
  const object = await createSkyObject(req.body, viewer, req.ip);
  res.status(201).json({ data: presentSkyObject(object, viewer) });
});

objectsRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const object = await loadSkyObject(req.params.id);
  authorize(viewer, 'catalogue', 'read');
  res.json({ data: presentSkyObject(object, viewer) });
});

objectsRouter.patch('/:id', validate(SkyObjectInputSchema), async (req, res) => {
  const viewer = currentUser(req);
  const object = await loadSkyObject(req.params.id);
  authorize(viewer, 'catalogue', 'editObject');
  res.json({ data: presentSkyObject(await updateSkyObject(object, req.body, viewer, req.ip), viewer) });
});

objectsRouter.delete('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const object = await loadSkyObject(req.params.id);
  authorize(viewer, 'catalogue', 'editObject');
  await deleteSkyObject(object, viewer, req.ip);
  res.status(204).end();
});

objectsRouter.get('/:id/measurements', async (req, res) => {
  const viewer = currentUser(req);
  const object = await loadSkyObject(req.params.id);
  authorize(viewer, 'catalogue', 'read');
  const measurements = await Measurement.findAll({
    where: { skyObjectId: object.id },
    include: measurementIncludes(),
    order: [
      ['quantity', 'ASC'],
      ['band', 'ASC'],
      ['preferred', 'DESC'],
      ['createdAt', 'DESC'],
    ],
  });
  res.json({ data: measurements.map((m) => presentMeasurement(m, viewer)) });
});

objectsRouter.post('/:id/measurements', validate(MeasurementInputSchema), async (req, res) => {
  const viewer = currentUser(req);
  const object = await loadSkyObject(req.params.id);
  const direct = can(viewer, 'catalogue', 'addMeasurement');
  if (!direct && !can(viewer, 'catalogue', 'proposeMeasurement')) throw AuthorizationError();
  const created = await createMeasurement(object, req.body, viewer, !direct);
  res.status(201).json({ data: presentMeasurement(await loadMeasurement(created.id), viewer) });
});

/** The object's history: measurement events, newest first, then the object's creation. */
objectsRouter.get('/:id/history', async (req, res) => {
  const viewer = currentUser(req);
  const object = await loadSkyObject(req.params.id);
  authorize(viewer, 'catalogue', 'read');
  res.json({ data: await loadObjectHistory(object) });
});
