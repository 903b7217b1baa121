import { Op, QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { enqueue } from '../../jobs/queue.ts';
import { logger } from '../../logger.ts';
import { pageRecheckMail } from '../../mail/page-templates.ts';
import { Page, Statement } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { currentText } from './page-statements.ts';
import { activeUsers, deliver } from './page-mail.ts';

/**
 * Sends approved and published pages that use any of these statements to "needs re-check" when
 * the wording in the page's language moved away from the wording signed off (or the statement can
 * no longer be worked out). The published version stays live and unchanged. Mails the writer and
 * the reviewer who last signed the page off.
 * @param statementIds statements whose public text changed or broke
 * @returns the ids of the pages sent to re-check
 */
export async function markPagesForRecheck(statementIds: string[]): Promise<string[]> {
  if (!statementIds.length) return [];
  const rows = await getSequelize().query<{ id: string }>(
    `SELECT p.id FROM pages p JOIN page_revisions r ON r.id = p.approved_revision_id
      WHERE p.status IN ('approved', 'published') AND p.archived_at IS NULL AND r.statement_ids && ARRAY[:ids]::uuid[]`,
    { replacements: { ids: statementIds }, type: QueryTypes.SELECT },
  );
  const statements = new Map((await Statement.findAll({ where: { id: { [Op.in]: statementIds } } })).map((s) => [s.id, s]));
  const marked: string[] = [];
  for (const { id } of rows) {
    const result = await getSequelize().transaction(async (transaction) => {
      const page = await Page.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!page || page.archivedAt || (page.status !== 'approved' && page.status !== 'published') || !page.approvedSnapshot)
        return null;
      const signed = page.approvedSnapshot.statementTexts;
      const moved = statementIds.filter((sid) => {
        const s = statements.get(sid);
        if (!(sid in signed) || !s) return false;
        return s.status === 'broken' || currentText(s, page.locale) !== signed[sid];
      });
      if (!moved.length) return null;
      const from = page.status;
      page.set({ status: 'needs_recheck', recheckStatementIds: [...new Set([...page.recheckStatementIds, ...moved])] });
      await page.save({ transaction });
      const changes = moved.map((sid) => ({
        statementId: sid,
        oldText: signed[sid] ?? null,
        newText: statements.get(sid)!.status === 'broken' ? null : currentText(statements.get(sid)!, page.locale),
      }));
      await recordAudit(
        { actorId: null, action: 'page.needs_recheck', subjectType: 'page', subjectId: page.id, data: { from, changes } },
        transaction,
      );
      return { page, changes, live: !!page.publishedSnapshot };
    });
    if (!result) continue;
    marked.push(id);
    const people = await activeUsers([result.page.writerId, result.page.lastReviewerId]);
    await deliver(people.map((u) => pageRecheckMail(u.email, u.name, result.page, result.changes, result.live)));
  }
  return marked;
}

/** The job kind of a look for pages to re-check. */
export const PAGE_RECHECK_JOB = 'pages.recheck';

/** Queues a look for the pages that use these statements (inline when no queue runs). */
export async function enqueuePageRecheck(data: { statementIds: string[] }): Promise<void> {
  await enqueue(PAGE_RECHECK_JOB, data);
}

/** The background job behind statement events: look for pages that need a re-check. */
export async function runPageRecheckJob({ statementIds }: { statementIds: string[] }): Promise<void> {
  const marked = await markPagesForRecheck(statementIds);
  if (marked.length) logger.info({ pages: marked.length }, 'pages sent to re-check');
}

/**
 * Sends pages waiting for a re-check back to where they were (published, or approved) when every
 * statement they were signed off with reads again exactly as signed and none is broken: nothing a
 * reader sees moved (a cosmology switched A → B → A), so a new sign-off would check nothing.
 * @param statementIds statements that became current again (recomputed back, or accepted)
 * @returns the ids of the pages returned to their signed-off state
 */
export async function clearSettledRechecks(statementIds: string[]): Promise<string[]> {
  if (!statementIds.length) return [];
  const rows = await getSequelize().query<{ id: string }>(
    `SELECT p.id FROM pages p JOIN page_revisions r ON r.id = p.approved_revision_id
      WHERE p.status = 'needs_recheck' AND r.statement_ids && ARRAY[:ids]::uuid[]`,
    { replacements: { ids: statementIds }, type: QueryTypes.SELECT },
  );
  const cleared: string[] = [];
  for (const { id } of rows) {
    const done = await getSequelize().transaction(async (transaction) => {
      const page = await Page.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (page?.status !== 'needs_recheck' || !page.approvedSnapshot) return false;
      const signed = page.approvedSnapshot.statementTexts;
      const statements = await Statement.findAll({ where: { id: { [Op.in]: Object.keys(signed) } }, transaction });
      if (statements.length !== Object.keys(signed).length) return false;
      const settled = statements.every((s) => s.status !== 'broken' && currentText(s, page.locale) === signed[s.id]);
      if (!settled) return false;
      const to = page.publishedRevisionId && page.publishedRevisionId === page.approvedRevisionId ? 'published' : 'approved';
      const statementIdsBack = page.recheckStatementIds;
      page.set({ status: to, recheckStatementIds: [] });
      await page.save({ transaction });
      await recordAudit(
        {
          actorId: null,
          action: 'page.recheck_cleared',
          subjectType: 'page',
          subjectId: page.id,
          data: { to, statementIds: statementIdsBack, reason: 'every statement reads again as it was signed off' },
        },
        transaction,
      );
      return true;
    });
    if (done) cleared.push(id);
  }
  return cleared;
}

/** The background job behind statements becoming current again: pages whose wording is all back. */
export const RECHECK_CLEAR_JOB = 'pages.recheck-clear';

/** Queues a look for re-checks that have settled. */
export async function enqueueRecheckClear(data: { statementIds: string[] }): Promise<void> {
  await enqueue(RECHECK_CLEAR_JOB, data);
}

/** Runs RECHECK_CLEAR_JOB: pages whose every statement reads again as signed go back to their state. */
export async function runRecheckClearJob({ statementIds }: { statementIds: string[] }): Promise<void> {
  const cleared = await clearSettledRechecks(statementIds);
  if (cleared.length) logger.info({ pages: cleared.length }, 'pages back to their signed-off state');
}
