import type { ApiError } from '@shared/schemas/common.ts';

/**
 * A failed API call, carrying the server's error shape: `fields` names the inputs at fault, and
 * `current` is what the server holds now when the answer is a conflict (read it through the
 * resource's own parser, e.g. `pageConflictOf`, which checks its shape).
 */
export class ApiRequestError extends Error {
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

/**
 * The error for a failed answer, from its JSON body when it has the standard shape.
 * @param status the HTTP status
 * @param body the parsed body, if any
 */
export function errorFromAnswer(status: number, body: Partial<ApiError> | null | undefined): ApiRequestError {
  const error = body?.error;
  return new ApiRequestError(
    status,
    error?.code ?? 'http_error',
    error?.message ?? `The server answered ${status}.`,
    error?.fields,
    error?.current,
  );
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** Per-call options: `timeoutMs` gives up on an answer that never comes (autosave must not wait forever). */
interface RequestOptions {
  timeoutMs?: number;
}

async function request<T>(method: Method, url: string, body?: unknown, { timeoutMs }: RequestOptions = {}): Promise<T> {
  let response: Response;
  try {
    response = await fetch(`/api${url}`, {
      method,
      credentials: 'same-origin',
      headers:
        body === undefined ? { Accept: 'application/json' } : { Accept: 'application/json', 'Content-Type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: timeoutMs ? AbortSignal.timeout(timeoutMs) : undefined,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'TimeoutError') {
      throw new ApiRequestError(
        0,
        'timeout',
        `Starproof did not answer within ${Math.round(timeoutMs! / 1000)} seconds. Nothing was lost.`,
      );
    }
    throw new ApiRequestError(0, 'network_error', 'Starproof cannot be reached. Check the connection; nothing was lost.');
  }
  if (response.status === 204) return undefined as T;
  const payload = (await response.json().catch(() => undefined)) as (ApiError & { data?: unknown }) | undefined;
  if (!response.ok) throw errorFromAnswer(response.status, payload);
  return payload as T;
}

/** The one HTTP client: every call resolves to the response's JSON body ({ data, meta? }). */
export const api = {
  get: <T>(url: string) => request<T>('GET', url),
  post: <T>(url: string, body?: unknown) => request<T>('POST', url, body ?? {}),
  put: <T>(url: string, body: unknown, options?: RequestOptions) => request<T>('PUT', url, body, options),
  patch: <T>(url: string, body: unknown) => request<T>('PATCH', url, body),
  delete: <T>(url: string) => request<T>('DELETE', url),
};

/** Shape of a successful response. */
export interface ApiData<T> {
  data: T;
}
