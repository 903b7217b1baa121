import type { ErrorRequestHandler, RequestHandler } from 'express';
import {
  BaseError,
  ConnectionError,
  ForeignKeyConstraintError,
  UniqueConstraintError,
  ValidationError as SequelizeValidationError,
  TimeoutError,
} from 'sequelize';
import { ZodError } from 'zod';
import type { ApiError } from '@shared/schemas/common.ts';
import { HttpError, NotFoundError, zodToValidationError } from '../errors.ts';
import { isDatabaseDown } from '../db-down.ts';
import { logger } from '../logger.ts';

/** Unknown paths under /api answer in JSON, never with the client's HTML. */
export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(NotFoundError(`There is no API endpoint ${req.method} ${req.originalUrl.split('?')[0]}.`));
};

function toHttpError(err: unknown): HttpError {
  if (err instanceof HttpError) return err;
  if (err instanceof ZodError) return zodToValidationError(err);
  const e = err as { type?: string; status?: number; expose?: boolean; message?: string };
  if (e?.type === 'entity.parse.failed') return new HttpError(400, 'malformed_json', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new HttpError(413, 'too_large', 'The request body is too large.');
  if (e?.type === 'charset.unsupported' || e?.type === 'encoding.unsupported')
    return new HttpError(415, 'unsupported_encoding', 'Send the request body as UTF-8.');
  if (err instanceof UniqueConstraintError) return new HttpError(409, 'duplicate', 'That already exists.');
  if (err instanceof ForeignKeyConstraintError)
    return new HttpError(409, 'in_use', 'That record is referenced by another and cannot be changed this way.');
  if (err instanceof SequelizeValidationError)
    return new HttpError(400, 'invalid_input', err.errors[0]?.message ?? 'Invalid input.');
  if (err instanceof ConnectionError || err instanceof TimeoutError) {
    return new HttpError(
      503,
      'database_unavailable',
      'The database is not answering. Your work has not been saved; try again in a moment.',
    );
  }
  if ((err instanceof BaseError && /timeout|terminat|ECONNREFUSED/i.test(err.message)) || isDatabaseDown(err)) {
    return new HttpError(503, 'database_unavailable', 'The database is not answering. Nothing was saved; try again in a moment.');
  }
  if (e?.status && e.status >= 400 && e.status < 500 && e.expose)
    return new HttpError(e.status, 'bad_request', e.message ?? 'Bad request.');
  return new HttpError(500, 'internal_error', 'Something went wrong on our side. It has been logged.');
}

/** The one place errors become responses: the error shape, never a stack trace. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  const httpError = toHttpError(err);
  if (httpError.status >= 500) (req.log ?? logger).error({ err, url: req.originalUrl }, 'request failed');
  if (res.headersSent) return;
  const body: ApiError = { error: { code: httpError.code, message: httpError.message } };
  if (httpError.fields) body.error.fields = httpError.fields;
  if (httpError.current !== undefined) body.error.current = httpError.current;
  res.status(httpError.status).json(body);
};
