import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { ValidationError } from '../errors.ts';

/** Turns zod issues into the error shape: the first message, and one message per field. */
export function zodToValidationError(error: z.ZodError) {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  const [first] = error.issues;
  const where = first?.path.length ? `${first.path.join('.')}: ` : '';
  return ValidationError(`${where}${first?.message ?? 'Invalid input'}`, fields);
}

/**
 * Parses req.body (or req.query) with a shared schema and replaces it with the parsed value.
 * @param schema the zod schema from shared/schemas
 * @param part which part of the request to check
 */
export function validate(schema: z.ZodType, part: 'body' | 'query' = 'body'): RequestHandler {
  return (req, _res, next) => {
    const result = schema.safeParse(part === 'body' ? (req.body ?? {}) : req.query);
    if (!result.success) return next(zodToValidationError(result.error));
    if (part === 'body') req.body = result.data;
    else replaceQuery(req, result.data);
    next();
  };
}

// Express 5 makes req.query a getter; keep the parsed query beside it.
function replaceQuery(req: Parameters<RequestHandler>[0], data: unknown) {
  Object.defineProperty(req, 'query', { value: data, writable: true, configurable: true });
}
