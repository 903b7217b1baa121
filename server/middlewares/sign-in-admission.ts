import type { RequestHandler } from 'express';
import { busyError, signInWouldWaitTooLong } from '../auth/password-pool.ts';

/**
 * POST /api/auth/sign-in, ahead of the request log, body parser and sessions: when the hashing
 * threads are already booked for longer than a sign-in may wait, answers 429 `busy` (Retry-After)
 * at once. 200 sign-ins arriving together otherwise each went through JSON parsing, the session
 * store, validation and the log before being refused, back to back in one turn of the event loop.
 * Admitted sign-ins go on to the route, which takes the slot (admitSignIn) and may still refuse.
 */
export const refuseBusySignIn: RequestHandler = (_req, res, next) => {
  if (!signInWouldWaitTooLong()) return next();
  // As every sign-in answer (app.ts): never stored.
  res.setHeader('Cache-Control', 'no-store');
  next(busyError());
};
