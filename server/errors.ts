import type { z } from 'zod';

/**
 * An error with an HTTP status, a stable snake_case code and a message a person understands.
 * `fields` names the inputs at fault; `current` carries what the server holds now (a 409's other
 * version), and both travel inside `{ error: { code, message, fields?, current? } }`.
 */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /**
     * `current`: what the server holds now (a 409's other version); `retryAfterSeconds`: sent as
     * `Retry-After` with 429 and 503 answers that will clear by themselves.
     */
    readonly options: { current?: unknown; retryAfterSeconds?: number } = {},
  ) {
    super(message);
    this.current = options.current;
  }

  readonly current?: unknown;
}

export const ValidationError = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'invalid_input', message, fields);
/** A refused request with its own code (e.g. `wrong_password`, `no_file`), for a person to act on. */
export const BadRequestError = (message: string, code: string, fields?: Record<string, string>) =>
  new HttpError(400, code, message, fields);
export const AuthenticationError = (message = 'Sign in to continue.', code = 'not_signed_in') =>
  new HttpError(401, code, message);
export const AuthorizationError = (message = 'Your role does not allow this.', code = 'forbidden') =>
  new HttpError(403, code, message);
export const NotFoundError = (message = 'Not found.', code = 'not_found') => new HttpError(404, code, message);
export const ConflictError = (message: string, code = 'conflict') => new HttpError(409, code, message);
/** Well-formed but unusable content (e.g. a file that is not text), with its own code. */
export const UnprocessableError = (message: string, code: string) => new HttpError(422, code, message);
export const TooManyRequestsError = (message: string, code = 'too_many_requests') => new HttpError(429, code, message);

/** The server is overloaded for a moment (pool or queue full): 503 `busy`, never "database down". */
export const BusyError = (retryAfterSeconds = 5) =>
  new HttpError(503, 'busy', 'The server is busy at this moment. Nothing was saved; try again in a few seconds.', undefined, {
    retryAfterSeconds,
  });

/** Turns zod issues into the error shape: the first message, and one message per field. */
export function zodToValidationError(error: z.ZodError): HttpError {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join('.') || '_';
    fields[key] ??= issue.message;
  }
  const [first] = error.issues;
  const where = first?.path.length ? `${first.path.join('.')}: ` : '';
  return ValidationError(`${where}${first?.message ?? 'Invalid input'}`, fields);
}
