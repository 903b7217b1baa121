import { normaliseFlagText } from '@shared/editor/number-check.ts';
import type { PageSnapshot } from '@shared/schemas/page.ts';
import { getSequelize } from '../../db.ts';
import { UnprocessableError } from '../../errors.ts';
import { Page, PageNumberFlag, PageRevision, PageSignoff, Statement, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { renderWithLookups } from './page-render.ts';
import { acceptStatementWording } from '../statements/index.ts';
import { approvalProblems, flagsWithResolutions } from './page-checks.ts';
import { ChecksFailedError, WorkflowError } from './page-errors.ts';
import { currentText, loadStatements } from './page-statements.ts';
import { lockPage } from './page-workflow.ts';

const REVIEWABLE = new Set<Page['status']>(['in_review', 'needs_recheck']);
const notReviewable = () => WorkflowError('Only a page in review or waiting for a re-check can be signed off.');

/**
 * A reviewer signs off one statement on the page with the wording shown now. When the statement's
 * wording has changed since it was last accepted, signing it off here accepts the new wording too:
 * the reviewer has just checked it.
 * @throws HttpError 409 (wrong state, statement not on the page, broken statement)
 */
export async function signOffStatement(pageId: string, statementId: string, reviewer: User): Promise<void> {
  const [page, statement] = await Promise.all([Page.findByPk(pageId), Statement.findByPk(statementId)]);
  const revision = page ? await PageRevision.findByPk(page.currentRevisionId!) : null;
  // Accept new wording only for a statement really on a page under review.
  if (page && REVIEWABLE.has(page.status) && revision?.statementIds.includes(statementId) && statement?.status === 'changed') {
    await acceptStatementWording(statement, reviewer);
  }
  await getSequelize().transaction(async (transaction) => {
    const { page, revision } = await lockPage(pageId, transaction);
    if (!REVIEWABLE.has(page.status)) throw notReviewable();
    if (!revision.statementIds.includes(statementId))
      throw WorkflowError('That statement is not on this version of the page.', 'not_on_page');
    const fresh = await Statement.findByPk(statementId, { transaction });
    const text = fresh ? currentText(fresh, page.locale) : null;
    if (!fresh || fresh.status === 'broken' || !text)
      throw WorkflowError(
        `This statement cannot be signed off: ${fresh?.statusReason ?? 'it cannot be worked out'}.`,
        'statement_broken',
      );
    await PageSignoff.create(
      { pageId: page.id, revisionId: revision.id, kind: 'statement', statementId, statementText: text, reviewerId: reviewer.id },
      { transaction },
    );
    await recordAudit(
      {
        actorId: reviewer.id,
        action: 'page.statement_signed_off',
        subjectType: 'page',
        subjectId: page.id,
        data: { statementId, text, revision: revision.number },
      },
      transaction,
    );
  });
}

/**
 * A reviewer marks a flagged number as not a measured quantity, with a reason; stored per page and
 * normalised text, so the same words elsewhere on the page are covered too.
 * @throws HttpError 409 when the page does not show that number
 */
export async function resolveNumberFlag(pageId: string, text: string, reason: string, reviewer: User): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const { page, revision } = await lockPage(pageId, transaction);
    if (!REVIEWABLE.has(page.status)) throw notReviewable();
    const normalised = normaliseFlagText(text);
    const flag = (await flagsWithResolutions(page, revision)).find((f) => f.normalised === normalised);
    if (!flag) throw WorkflowError(`“${text}” is not flagged on this page.`, 'not_flagged');
    await PageNumberFlag.destroy({ where: { pageId: page.id, normalisedText: normalised }, transaction });
    await PageNumberFlag.create(
      { pageId: page.id, normalisedText: normalised, text: flag.text, reason, resolvedById: reviewer.id },
      { transaction },
    );
    await recordAudit(
      {
        actorId: reviewer.id,
        action: 'page.number_resolved',
        subjectType: 'page',
        subjectId: page.id,
        data: { text: flag.text, reason },
      },
      transaction,
    );
  });
}

/**
 * A reviewer signs off the whole page: it becomes approved, and the approved version is stored as
 * rendered HTML with the statement wording as signed. A published version stays live until an
 * editor publishes this one.
 * @throws HttpError 409 wrong state, 422 listing every problem (unsigned statements, open number
 *   flags, missing eye-safety notice, images not ready)
 */
export async function signOffPage(pageId: string, reviewer: User): Promise<Page> {
  return getSequelize().transaction(async (transaction) => {
    const { page, revision } = await lockPage(pageId, transaction);
    if (!REVIEWABLE.has(page.status)) throw notReviewable();
    const statements = await loadStatements(revision.statementIds);
    const problems = await approvalProblems(page, revision, statements);
    if (problems.length) throw ChecksFailedError('This page cannot be signed off yet', problems);
    const statementTexts: Record<string, string> = {};
    const statementNotes: Record<string, string> = {};
    for (const id of revision.statementIds) {
      const statement = statements.get(id)!.statement;
      statementTexts[id] = currentText(statement, page.locale)!;
      // The small print signed with the wording, so the public keeps seeing the pair that was signed.
      const note = statement.footnotes?.[page.locale];
      if (note) statementNotes[id] = note;
    }
    const html = await renderWithLookups(revision.doc, revision.mediaIds, (id) => statementTexts[id] ?? null);
    if (Buffer.byteLength(html) > 20 * 1024 * 1024)
      throw UnprocessableError('The rendered page is too large to publish.', 'page_too_large');
    const snapshot: PageSnapshot = {
      revisionId: revision.id,
      revisionNumber: revision.number,
      title: revision.title,
      html,
      statementTexts,
      statementNotes,
      signedOffAt: new Date().toISOString(),
      signedOffBy: { id: reviewer.id, name: reviewer.name },
    };
    const from = page.status;
    await PageSignoff.create(
      { pageId: page.id, revisionId: revision.id, kind: 'page', statementId: null, statementText: null, reviewerId: reviewer.id },
      { transaction },
    );
    page.set({
      status: 'approved',
      approvedRevisionId: revision.id,
      approvedSnapshot: snapshot,
      lastReviewerId: reviewer.id,
      recheckStatementIds: [],
    });
    await page.save({ transaction });
    await recordAudit(
      {
        actorId: reviewer.id,
        action: 'page.approved',
        subjectType: 'page',
        subjectId: page.id,
        data: { from, revision: revision.number },
      },
      transaction,
    );
    return page;
  });
}
