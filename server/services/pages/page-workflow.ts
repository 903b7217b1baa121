import { getSequelize } from '../../db.ts';
import { HttpError, NotFoundError } from '../../errors.ts';
import { pageSentBackMail, pageSubmittedMail } from '../../mail/page-templates.ts';
import { normaliseFlagText } from '@shared/editor/number-check.ts';
import { Page, PageComment, PageRevision, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { approvalProblems, flagsWithResolutions, submissionProblems } from './page-checks.ts';
import { ArchivedPageError, ChecksFailedError, WorkflowError } from './page-errors.ts';
import { activeUsers, deliver, reviewersToNotify } from './page-mail.ts';
import { loadStatements } from './page-statements.ts';

/** Loads a page and its current revision inside a transaction, locking the page row. */
export async function lockPage(pageId: string, transaction: import('sequelize').Transaction) {
  const page = await Page.findByPk(pageId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!page) throw NotFoundError('There is no such page.');
  if (page.archivedAt) throw ArchivedPageError();
  const revision = await PageRevision.findByPk(page.currentRevisionId!, { transaction });
  if (!revision) throw NotFoundError('This page has no saved text yet.');
  return { page, revision };
}

/**
 * Sends a draft to review after the server's own checks (eye-safety notice, statements that can be
 * worked out, not empty); mails every reviewer. A hand-typed number still open needs the writer's
 * reason, stored as a comment on the page for the reviewer, who still resolves it; without a reason
 * for each, nothing is submitted (422 `flags_need_reasons`, naming the numbers).
 * @param expectedVersion the version the writer is looking at; a newer save means they have not seen it
 * @param flagNotes the writer's reason for each open hand-typed number
 * @throws HttpError 409 wrong state or stale version, 422 with every problem
 */
export async function submitPage(
  pageId: string,
  expectedVersion: number | undefined,
  actor: User,
  flagNotes: Array<{ text: string; reason: string }> = [],
): Promise<Page> {
  const page = await getSequelize().transaction(async (transaction) => {
    const { page, revision } = await lockPage(pageId, transaction);
    if (page.status !== 'draft')
      throw WorkflowError(
        page.status === 'in_review'
          ? 'This page is already with the reviewers.'
          : 'Only a draft can be submitted. Edit the page to start a new draft.',
      );
    if (expectedVersion !== undefined && expectedVersion !== page.version)
      throw WorkflowError('The page was saved again since you loaded it. Reload it, check it, then submit.', 'page_changed');
    const problems = await submissionProblems(page, revision, await loadStatements(revision.statementIds));
    if (problems.length) throw ChecksFailedError('This page cannot be submitted yet', problems);
    const notes = new Map(flagNotes.map((n) => [normaliseFlagText(n.text), n.reason]));
    const open = (await flagsWithResolutions(page, revision)).filter((f) => !f.resolution);
    const unexplained = open.filter((f) => !notes.get(f.normalised));
    if (unexplained.length)
      throw new HttpError(
        422,
        'flags_need_reasons',
        `Give a reason for each hand-typed number, or turn it into a statement first: ${unexplained.map((f) => `“${f.text}”`).join(', ')}.`,
      );
    page.set({ status: 'in_review', submittedAt: new Date() });
    await page.save({ transaction });
    for (const flag of open)
      await PageComment.create(
        {
          pageId: page.id,
          revisionNumber: revision.number,
          authorId: actor.id,
          body: `Hand-typed number “${flag.text}” left as typed: ${notes.get(flag.normalised)}`,
        },
        { transaction },
      );
    await recordAudit(
      {
        actorId: actor.id,
        action: 'page.submitted',
        subjectType: 'page',
        subjectId: page.id,
        data: { revision: revision.number, flagNotes: open.map((f) => ({ text: f.text, reason: notes.get(f.normalised) })) },
      },
      transaction,
    );
    return page;
  });
  const reviewers = await reviewersToNotify();
  await deliver(reviewers.map((r) => pageSubmittedMail(r.email, r.name, page, actor.name)));
  return page;
}

/**
 * A reviewer sends a page back to its writer with a comment; the page becomes a draft again.
 * @throws HttpError 409 unless the page is in review or needs a re-check
 */
export async function sendBackPage(pageId: string, comment: string, reviewer: User): Promise<Page> {
  const page = await getSequelize().transaction(async (transaction) => {
    const { page, revision } = await lockPage(pageId, transaction);
    if (page.status !== 'in_review' && page.status !== 'needs_recheck')
      throw WorkflowError('Only a page in review or waiting for a re-check can be sent back.');
    const from = page.status;
    page.set({ status: 'draft', lastReviewerId: reviewer.id });
    await page.save({ transaction });
    await PageComment.create(
      { pageId: page.id, revisionNumber: revision.number, authorId: reviewer.id, body: comment },
      { transaction },
    );
    await recordAudit(
      {
        actorId: reviewer.id,
        action: 'page.sent_back',
        subjectType: 'page',
        subjectId: page.id,
        data: { from, revision: revision.number },
      },
      transaction,
    );
    return page;
  });
  const [writer] = await activeUsers([page.writerId]);
  if (writer && writer.id !== reviewer.id)
    await deliver([pageSentBackMail(writer.email, writer.name, page, reviewer.name, comment)]);
  return page;
}

/**
 * The writer (or an editor) takes a page back from review before anyone has signed the page off;
 * it is a draft again. Statement sign-offs already given stay, and count again for any statement
 * whose wording has not changed.
 * @throws HttpError 409 unless the page is in review
 */
export async function withdrawPage(pageId: string, actor: User): Promise<Page> {
  return getSequelize().transaction(async (transaction) => {
    const { page, revision } = await lockPage(pageId, transaction);
    if (page.status !== 'in_review')
      throw WorkflowError(
        page.status === 'draft'
          ? 'This page is not with the reviewers.'
          : 'This page has been signed off already; it can no longer be withdrawn.',
      );
    page.set({ status: 'draft' });
    await page.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'page.withdrawn',
        subjectType: 'page',
        subjectId: page.id,
        data: { revision: revision.number },
      },
      transaction,
    );
    return page;
  });
}

/** The problems that stop approval now, for the review screen (no change made). */
export async function currentApprovalProblems(page: Page): Promise<string[]> {
  const revision = await PageRevision.findByPk(page.currentRevisionId!);
  if (!revision) return ['This page has no saved text yet.'];
  return approvalProblems(page, revision, await loadStatements(revision.statementIds));
}
