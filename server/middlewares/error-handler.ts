import type { ServerResponse } from 'node:http';
import type { ErrorRequestHandler, RequestHandler } from 'express';
import {
  BaseError,
  ConnectionAcquireTimeoutError,
  ConnectionError,
  ForeignKeyConstraintError,
  UniqueConstraintError,
  ValidationError as SequelizeValidationError,
  TimeoutError,
} from 'sequelize';
import { ZodError } from 'zod';
import type { ApiError } from '@shared/schemas/common.ts';
import { BusyError, HttpError, NotFoundError, zodToValidationError } from '../errors.ts';
import { isDatabaseDown } from '../db-down.ts';
import { logger } from '../logger.ts';

/** Unknown paths under /api answer in JSON, never with the client's HTML. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(NotFoundError(`There is no API endpoint ${req.method} ${req.originalUrl.split('?')[0]}.`));
};

const databaseUnavailable = () =>
  new HttpError(
    503,
    'database_unavailable',
    'The database is not answering. Nothing was saved; try again in a moment.',
    undefined,
    {
      retryAfterSeconds: 5,
    },
  );

function toHttpError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  if (err instanceof ZodError) return zodToValidationError(err);
  const e = err as { type?: string; status?: number; expose?: boolean; message?: string };
  // Broken percent-encoding in the path (`/%ff`): Express's router and static files throw URIError.
  if (err instanceof URIError || /Failed to decode param/.test(e?.message ?? ''))
    return new HttpError(400, 'malformed_url', 'The address is not valid: it has broken percent-encoding.');
  if (e?.type === 'entity.parse.failed') return new HttpError(400, 'malformed_json', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new HttpError(413, 'too_large', 'The request body is too large.');
  if (e?.type === 'charset.unsupported' || e?.type === 'encoding.unsupported')
    return new HttpError(415, 'unsupported_encoding', 'Send the request body as UTF-8.');
  if (err instanceof UniqueConstraintError) return new HttpError(409, 'duplicate', 'That already exists.');
  if (err instanceof ForeignKeyConstraintError)
    return new HttpError(409, 'in_use', 'That record is referenced by another and cannot be changed this way.');
  if (err instanceof SequelizeValidationError)
    return new HttpError(400, 'invalid_input', err.errors[0]?.message ?? 'Invalid input.');
  // Every pooled connection is in use: the database is fine, the server is overloaded for a moment.
  if (err instanceof ConnectionAcquireTimeoutError) return BusyError();
  if (err instanceof ConnectionError || err instanceof TimeoutError) {
    return databaseUnavailable();
  }
  if ((err instanceof BaseError && /timeout|terminat|ECONNREFUSED/i.test(err.message)) || isDatabaseDown(err)) {
    return databaseUnavailable();
  }
  if (e?.status && e.status >= 400 && e.status < 500 && e.expose)
    return new HttpError(e.status, 'bad_request', e.message ?? 'Bad request.');
  return new HttpError(500, 'internal_error', 'Something went wrong on our side. It has been logged.');
}

/** The one place errors become responses: the error shape, never a stack trace. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const httpError = toHttpError(err);
  if (httpError.status >= 500) (req.log ?? logger).error({ err, url: req.originalUrl }, 'request failed');
  // A client's mistake, worth a line for whoever watches the log, not an alarm.
  else if (httpError.code === 'malformed_url') (req.log ?? logger).info({ url: req.originalUrl }, 'malformed URL refused');
  if (res.headersSent) return;
  if (httpError.options.retryAfterSeconds) res.set('Retry-After', String(httpError.options.retryAfterSeconds));
  const body: ApiError = { error: { code: httpError.code, message: httpError.message } };
  if (httpError.fields) body.error.fields = httpError.fields;
  if (httpError.current !== undefined) body.error.current = httpError.current;
  res.status(httpError.status).json(body);
};

/**
 * One error answer rendered once (status, Retry-After and the same JSON body errorHandler writes),
 * for a refusal sent so often that building it per request would cost the event loop: the sign-in
 * door refusing a burst. No Error is thrown or built per request, and no ETag is computed.
 */
export function preparedErrorAnswer(error: HttpError): (res: ServerResponse) => void {
  const body = Buffer.from(JSON.stringify({ error: { code: error.code, message: error.message } } satisfies ApiError));
  const retryAfter = error.options.retryAfterSeconds ? String(error.options.retryAfterSeconds) : undefined;
  return (res) => {
    res.statusCode = error.status;
    if (retryAfter) res.setHeader('Retry-After', retryAfter);
    res.setHeader('Content-Type', 'application/json; charset=utf-8');
    res.setHeader('Content-Length', body.length);
    res.end(body);
  };
}
