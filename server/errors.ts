/** An error with an HTTP status, a stable snake_case code and a message a person understands. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    /** Sent as `Retry-After` (seconds) with 429 and 503 answers that will clear by themselves. */
    readonly options: { retryAfterSeconds?: number } = {},
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

/** The server is overloaded for a moment (pool or queue full): 503 `busy`, never "database down". */
export const BusyError = (retryAfterSeconds = 5) =>
  new HttpError(503, 'busy', 'The server is busy at this moment. Nothing was saved; try again in a few seconds.', undefined, {
    retryAfterSeconds,
  });
