import { Router } from 'express';
import { requireUser } from '../../middlewares/authenticate.ts';
import { exportsRouter } from './exports.ts';
import { importsRouter } from './imports.ts';
import { measurementsRouter } from './measurements.ts';
import { objectsRouter } from './objects.ts';
import { proposalsRouter } from './proposals.ts';
import { sourcesRouter } from './sources.ts';

/** The catalogue: objects, their measurements, sources, proposals, CSV imports and exports. Staff only. */
export const catalogueRouter = Router();
catalogueRouter.use(requireUser);
catalogueRouter.use('/objects', objectsRouter);
catalogueRouter.use('/measurements', measurementsRouter);
catalogueRouter.use('/sources', sourcesRouter);
catalogueRouter.use('/proposals', proposalsRouter);
catalogueRouter.use('/imports', importsRouter);
catalogueRouter.use('/exports', exportsRouter);
