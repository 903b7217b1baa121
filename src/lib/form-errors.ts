import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiRequestError } from './api-client.ts';

/**
 * Puts the server's per-field messages on the form's fields; returns the message to show above the
 * form when the error is not about one field.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  known: Array<Path<T>>,
): string | undefined {
  if (!(error instanceof ApiRequestError)) return 'Something went wrong. Try again.';
  let placed = false;
  for (const [field, message] of Object.entries(error.fields ?? {})) {
    if ((known as string[]).includes(field)) {
      setError(field as Path<T>, { message });
      placed = true;
    }
  }
  return placed ? undefined : error.message;
}
