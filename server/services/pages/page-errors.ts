import type { PageServerVersion } from '@shared/schemas/page.ts';
import { ConflictError, HttpError, UnprocessableError } from '../../errors.ts';

/** What the server holds now, sent inside the 409's error so the writer can compare it with their own. */
export type ServerVersion = PageServerVersion;

/** A save against a stale version: someone else saved first. Nothing is overwritten. */
export class PageConflictError extends HttpError {
  constructor(override readonly current: ServerVersion) {
    super(
      409,
      'page_changed',
      `${current.savedBy ?? 'Someone'} saved this page while you were editing (now revision ${current.revisionNumber}). Your text is kept: compare both versions and choose what to keep.`,
      undefined,
      { current },
    );
  }
}

/** The page's state does not allow the step; the message says why and what to do. */
export const WorkflowError = (message: string, code = 'page_state') => ConflictError(message, code);

/** Refused at submission or approval, with every problem listed. */
export function ChecksFailedError(what: string, problems: string[]): HttpError {
  return UnprocessableError(`${what}: ${problems.join(' ')}`, 'page_checks_failed');
}

/** Every step but restoring is refused on an archived page; the message says how to get it back. */
export const ArchivedPageError = () =>
  ConflictError('This page is archived. Restore it first (an editor or its writer can), then carry on.', 'page_archived');
