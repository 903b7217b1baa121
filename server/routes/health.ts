import { Router } from 'express';
import { getSequelize } from '../db.ts';

export const healthRouter = Router();

/** Liveness plus a real database round trip, with a short timeout so an outage answers quickly. */
healthRouter.get('/', async (_req, res) => {
  const started = Date.now();
  try {
    await Promise.race([
      getSequelize().query('SELECT 1'),
      new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 2_000)),
    ]);
    res.json({ status: 'ok', database: { status: 'up', latencyMs: Date.now() - started } });
  } catch {
    res.status(503).json({ status: 'degraded', database: { status: 'down' } });
  }
});
