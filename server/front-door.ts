import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Express } from 'express';
import { logger } from './logger.ts';

/**
 * A request answered in full before Express sees it: returns true when it sent the answer, false
 * (having written nothing) to let the app handle the request as usual.
 */
export type FrontAnswer = (req: IncomingMessage, res: ServerResponse) => boolean;

/**
 * Puts answers ahead of Express's own handling, for the few requests a busy server answers by the
 * thousand and in a few microseconds of work each: a kiosk's revalidated feed (304) and a sign-in
 * refused because the hashing threads are booked up (429). Express's set-up of every request (the
 * prototypes of req and res swapped, a final handler built, the router walked) cost about 110 µs
 * per request on the 2-core machine the benchmarks run on, three times the whole of such an answer
 * without it, and 200 refusals of a sign-in burst arrive in one or two turns of the event loop.
 *
 * Installed on the app's own `handle`, so every way of serving the app (`app.listen`, the tests'
 * supertest) goes through it. Each answer matches its request exactly (method and path, no query
 * string) and the same rule stays mounted in the app behind it, which answers every other form.
 * @param app the Express app
 * @param answers tried in order
 */
export function installFrontDoor(app: Express, answers: FrontAnswer[]): void {
  const handle = (app as unknown as { handle: (req: IncomingMessage, res: ServerResponse, next?: unknown) => void }).handle;
  (app as unknown as { handle: typeof handle }).handle = function frontDoor(req, res, next) {
    for (const answer of answers) {
      try {
        if (answer(req, res)) return;
      } catch (err) {
        // A fault here must not cost the request: Express answers it (and its error handler logs there).
        logger.error({ err, url: req.url }, 'front door answer failed');
        if (res.headersSent) return;
        break;
      }
    }
    handle.call(this, req, res, next);
  };
}
