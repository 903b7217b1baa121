import { Router } from 'express';
import { apiNotFound } from '../middlewares/error-handler.ts';
import { authRouter } from './auth.ts';
import { healthRouter } from './health.ts';
import { outboxRouter } from './outbox.ts';
import { usersRouter } from './users.ts';

/** Every API router, mounted under /api. */
export function apiRouter(): Router {
  const router = Router();
  router.use('/health', healthRouter);
  router.use('/auth', authRouter);
  router.use('/users', usersRouter);
  router.use('/outbox', outboxRouter);
  router.use(apiNotFound);
  return router;
}
