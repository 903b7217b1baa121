import { Router } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { PgRateLimitStore } from '../middlewares/rate-limit-store.ts';
import { answer } from '@shared/contract/calculate.ts';
import { HttpError } from '../errors.ts';
import { requireUser } from '../middlewares/authenticate.ts';

export const calcRouter = Router();

calcRouter.post(
  '/',
  requireUser,
  // The engine is pure CPU; a runaway script must not starve everyone else.
  rateLimit({
    windowMs: 60_000,
    limit: 240,
    keyGenerator: (req) => req.user?.id ?? ipKeyGenerator(req.ip ?? ''),
    store: new PgRateLimitStore('calc'),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'too_many_requests', 'Too many calculations in a minute. Wait a moment and try again.')),
  }),
  (req, res) => {
    const result = answer(req.body);
    if ('error' in result) {
      res.status(400).json({ error: result.error, ...(result.id !== undefined ? { id: result.id } : {}) });
      return;
    }
    res.json({ data: result });
  },
);
