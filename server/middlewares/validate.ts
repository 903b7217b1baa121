import type { Request, RequestHandler } from 'express';
import type { z } from 'zod';
import { zodToValidationError } from '../errors.ts';

// Express's defaults: the route's own params stay as they are; only the validated part is typed.
type Params = Request['params'];
type Query = Request['query'];

/**
 * Parses req.body with a shared schema and replaces it with the parsed value. The handler after it
 * gets `req.body` typed as the schema's output, so routes read the body with no cast.
 * @param schema the zod schema from shared/schemas
 */
export function validate<S extends z.ZodType>(schema: S): RequestHandler<Params, unknown, z.output<S>, Query> {
  return (req, _res, next) => {
    const result = schema.safeParse(req.body ?? {});
    if (!result.success) return next(zodToValidationError(result.error));
    req.body = result.data;
    next();
  };
}

/**
 * Parses req.query with a schema and puts the parsed value in its place: the handler after it gets
 * `req.query` typed as the schema's output (numbers as numbers, defaults filled in).
 * @param schema the zod schema of the query string
 */
export function validateQuery<S extends z.ZodType>(schema: S): RequestHandler<Params, unknown, unknown, z.output<S>> {
  return (req, _res, next) => {
    const result = schema.safeParse(req.query);
    if (!result.success) return next(zodToValidationError(result.error));
    // Express 5 makes req.query a getter; keep the parsed query in its place.
    Object.defineProperty(req, 'query', { value: result.data, writable: true, configurable: true });
    next();
  };
}
