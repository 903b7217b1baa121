import { Router } from 'express';
import { apiNotFound } from '../middlewares/error-handler.ts';
import { authRouter } from './auth.ts';
import { calcRouter } from './calc.ts';
import { catalogueRouter } from './catalogue/index.ts';
import { healthRouter } from './health.ts';
import { mediaRouter } from './media.ts';
import { outboxRouter } from './outbox.ts';
import { pagesRouter } from './pages/index.ts';
import { settingsRouter } from './settings.ts';
import { statementsRouter, statementTemplatesRouter } from './statements.ts';
import { timelineRouter } from './timeline.ts';
import { usersRouter } from './users.ts';
import { kioskRouter } from './kiosk.ts';
import { venuesRouter } from './venues.ts';
import { channelsRouter } from './channels.ts';
import { publicRouter } from './public/index.ts';

/** Every API router, mounted under /api. */
export function apiRouter(): Router {
  const router = Router();
  router.use('/health', healthRouter);
  router.use('/auth', authRouter);
  router.use('/users', usersRouter);
  router.use('/outbox', outboxRouter);
  router.use('/calc', calcRouter);
  router.use('/pages', pagesRouter);
  router.use('/statements', statementsRouter);
  router.use('/statement-templates', statementTemplatesRouter);
  router.use('/settings', settingsRouter);
  router.use('/timeline', timelineRouter);
  router.use('/media', mediaRouter);
  router.use('/catalogue', catalogueRouter);
  router.use('/venues', venuesRouter);
  router.use('/kiosk', kioskRouter);
  router.use('/channels', channelsRouter);
  router.use('/public', publicRouter);
  router.use(apiNotFound);
  return router;
}
