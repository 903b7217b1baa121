import type { IncomingMessage, ServerResponse } from 'node:http';
import type { NextFunction, Request, RequestHandler, Response } from 'express';

type Header = [name: string, value: string | number | readonly string[]];

/**
 * Runs a middleware whose headers never depend on the request (helmet with fixed directives) once,
 * at start-up, and returns a middleware that sets the same headers from that record (on a plain
 * Node request too: the front door's answers use it). The kiosk
 * feed uses it: helmet re-derives a dozen headers (the CSP string among them) on every request,
 * which the feed, polled by every screen, should not pay for answers that are always the same.
 * @param middleware sets and removes headers and calls next() at once, without reading the request
 * @throws Error when the middleware does anything else (it could not be recorded faithfully)
 */
export function fixedHeaders(middleware: RequestHandler): (req: IncomingMessage, res: ServerResponse, next: () => void) => void {
  // Keyed by the lower-cased name, as Node keys headers; a Map keeps the order they were set in.
  const set = new Map<string, Header>();
  const removed: string[] = [];
  const record = {
    setHeader(name: string, value: Header[1]) {
      set.set(name.toLowerCase(), [name, value]);
      return record;
    },
    removeHeader(name: string) {
      set.delete(name.toLowerCase());
      removed.push(name);
    },
    getHeader: (name: string) => set.get(name.toLowerCase())?.[1],
  };
  let passed = false;
  middleware(
    {} as Request,
    record as unknown as Response,
    ((error?: unknown) => {
      if (error) throw error;
      passed = true;
    }) as NextFunction,
  );
  if (!passed) throw new Error('fixedHeaders: the middleware did not call next() at once, so it cannot be recorded');
  const headers = [...set.values()];
  return (_req, res, next) => {
    for (const name of removed) res.removeHeader(name);
    for (const [name, value] of headers) res.setHeader(name, value);
    next();
  };
}
