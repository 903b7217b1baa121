import type { RequestHandler } from 'express';
import { signInBusyError, tryAdmitSignIn } from '../auth/password-pool.ts';
import { preparedErrorAnswer } from './error-handler.ts';

const answerBusy = preparedErrorAnswer(signInBusyError);

/**
 * POST /api/auth/sign-in, ahead of the request log, body parser and sessions: takes the sign-in's
 * place in the hashing queue at the door, or answers 429 `busy` (Retry-After) at once when the
 * hashing threads are already booked for longer than a sign-in may wait. The place is held until
 * the answer is sent (or the connection drops), whatever the answer.
 *
 * The place must be taken here, not in the route: the body parser, the session store and the
 * per-address limiter all wait on I/O, so 200 sign-ins arriving together would otherwise all find
 * the queue empty at the door, each go through all of that, and only then be refused, back to back
 * on the one thread that answers requests. A refusal is a prepared answer written at once: a burst
 * of 200 refusals arrives in a few turns of the event loop, so each must cost as little as it can.
 */
export const admitSignInRequest: RequestHandler = (_req, res, next) => {
  const release = tryAdmitSignIn();
  if (!release) {
    // As every sign-in answer (app.ts): never stored.
    res.setHeader('Cache-Control', 'no-store');
    return answerBusy(res);
  }
  res.once('close', release);
  next();
};
