import type { z } from 'zod';

/** An error with an HTTP status, a stable snake_case code and a message a person understands. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const ValidationError = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'invalid_input', message, fields);
/** A refused request with its own code (e.g. `wrong_password`, `no_file`), for a person to act on. */
export const BadRequestError = (message: string, code: string, fields?: Record<string, string>) =>
  new HttpError(400, code, message, fields);
export const AuthenticationError = (message = 'Sign in to continue.') => new HttpError(401, 'not_signed_in', message);
export const AuthorizationError = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const NotFoundError = (message = 'Not found.') => new HttpError(404, 'not_found', message);
export const ConflictError = (message: string, code = 'conflict') => new HttpError(409, code, message);
export const TooManyRequestsError = (message: string) => new HttpError(429, 'too_many_requests', message);

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
