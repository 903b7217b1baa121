import { IncomingMessage, ServerResponse } from 'node:http';
import { Socket } from 'node:net';
import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { describe, expect, it } from 'vitest';
import { fixedHeaders } from '../../server/middlewares/fixed-headers.ts';
import { securityHeaders } from '../../server/middlewares/security-headers.ts';

/** The headers a middleware leaves on a real Node response that already carried X-Powered-By. */
function headersAfter(middleware: RequestHandler) {
  const req = new IncomingMessage(new Socket());
  const res = new ServerResponse(req);
  res.setHeader('X-Powered-By', 'Express');
  let nexted = false;
  middleware(
    req as Request,
    res as unknown as Response,
    (() => {
      nexted = true;
    }) as NextFunction,
  );
  expect(nexted).toBe(true);
  return res.getHeaders();
}

describe('fixedHeaders', () => {
  it.each([false, true])('sets exactly the headers helmet sets (https %s), removals included', (https) => {
    const helmet = securityHeaders(https);
    const expected = headersAfter(helmet);
    expect(expected['content-security-policy']).toBeDefined();
    expect(expected['x-powered-by']).toBeUndefined();
    expect(headersAfter(fixedHeaders(helmet))).toEqual(expected);
  });

  it('keeps the last value of a header set twice, and drops one removed after it was set', () => {
    const twice: RequestHandler = (_req, res, next) => {
      res.setHeader('X-One', 'a');
      res.setHeader('X-Two', 'b');
      res.setHeader('x-one', 'c');
      res.removeHeader('X-Two');
      next();
    };
    expect(headersAfter(fixedHeaders(twice))).toEqual({ 'x-powered-by': 'Express', 'x-one': 'c' });
  });

  it('refuses a middleware that does not call next() at once', () => {
    const later: RequestHandler = (_req, _res, next) => {
      setTimeout(next, 0);
    };
    expect(() => fixedHeaders(later)).toThrow(/cannot be recorded/);
  });
});
