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
    readonly current?: unknown,
  ) {
    super(message);
  }
}

export const ValidationError = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'invalid_input', message, fields);
export const AuthenticationError = (message = 'Sign in to continue.') => new HttpError(401, 'not_signed_in', message);
export const AuthorizationError = (message = 'Your role does not allow this.') => new HttpError(403, 'forbidden', message);
export const NotFoundError = (message = 'Not found.') => new HttpError(404, 'not_found', message);
export const ConflictError = (message: string, code = 'conflict') => new HttpError(409, code, message);
export const TooManyRequestsError = (message: string) => new HttpError(429, 'too_many_requests', message);
