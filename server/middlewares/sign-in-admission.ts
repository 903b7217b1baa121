import type { IncomingMessage, ServerResponse } from 'node:http';
import type { RequestHandler } from 'express';
import { signInBusyError, signInWouldWaitTooLong, tryAdmitSignIn } from '../auth/password-pool.ts';
import type { FrontAnswer } from '../front-door.ts';
import { answerInTurns } from './answer-in-turns.ts';
import { preparedErrorAnswer } from './error-handler.ts';

const answerBusy = preparedErrorAnswer(signInBusyError);

/**
 * POST /api/auth/sign-in, ahead of the request log, body parser and sessions: takes the sign-in's
 * place in the hashing queue at the door, or answers 429 `busy` (Retry-After) at once when the
 * hashing threads are already booked for longer than a sign-in may wait. The place is held until
 * the answer is sent (or the connection drops), whatever the answer; an admitted sign-in goes on
 * when its turn comes (a few run at a time, as the hashing threads can take them).
 *
 * The place must be taken here, not in the route: the body parser, the session store and the
 * per-address limiter all wait on I/O, so 200 sign-ins arriving together would otherwise all find
 * the queue empty at the door, each go through all of that, and only then be refused, back to back
 * on the one thread that answers requests. A refusal is a prepared answer written at once: a burst
 * of 200 refusals arrives in a few turns of the event loop, so each must cost as little as it can.
 */
export const admitSignInRequest: RequestHandler = (_req, res, next) => {
  const ticket = tryAdmitSignIn();
  if (!ticket) {
    // As every sign-in answer (app.ts): never stored.
    res.setHeader('Cache-Control', 'no-store');
    return answerBusy(res);
  }
  res.once('close', ticket.release);
  ticket.whenItsTurn(next);
};

/**
 * The door's refusal once more, ahead of Express (server/front-door.ts), for the exact request a
 * sign-in form sends (POST /api/auth/sign-in): while the hashing threads are booked up, the security
 * headers, no-store and the prepared 429 `busy`, written a slice of a burst per turn of the event
 * loop (answerInTurns). Admitted sign-ins, and any other form of the path, go on to the app, where
 * admitSignInRequest takes their place.
 * @param security the app's security headers, recorded once (fixedHeaders)
 */
export function refuseBusySignInEarly(
  security: (req: IncomingMessage, res: ServerResponse, next: () => void) => void,
): FrontAnswer {
  const noop = () => undefined;
  const refuse = answerInTurns((res) => {
    security(res.req, res, noop);
    res.setHeader('Cache-Control', 'no-store');
    answerBusy(res);
  });
  return (req, res) => {
    if (req.method !== 'POST' || req.url !== '/api/auth/sign-in' || !signInWouldWaitTooLong()) return false;
    refuse(res);
    return true;
  };
}
