import { getSequelize } from '../../db.ts';
import { NotFoundError } from '../../errors.ts';
import { Page, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { publishingEvents } from '../publishing/index.ts';
import { WorkflowError } from './page-errors.ts';

async function lockAny(pageId: string, transaction: import('sequelize').Transaction): Promise<Page> {
  const page = await Page.findByPk(pageId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!page) throw NotFoundError('There is no such page.');
  return page;
}

/**
 * Archives a page: it leaves the desk's lists (unless asked for) and every public output at once (the
 * live version is taken down, any schedule is cleared), and keeps its revisions, sign-offs and comments.
 * A live page comes back approved, so restoring it never republishes it by itself.
 * @param reason the person's reason, kept in the audit log
 * @throws HttpError 409 `page_archived` when it is archived already
 */
export async function archivePage(pageId: string, reason: string, actor: User): Promise<Page> {
  return getSequelize().transaction(async (transaction) => {
    const page = await lockAny(pageId, transaction);
    if (page.archivedAt) throw WorkflowError('This page is archived already.', 'page_archived');
    const wasLive = !!page.publishedSnapshot;
    const from = page.status;
    page.set({
      archivedAt: new Date(),
      archivedById: actor.id,
      publishedSnapshot: null,
      publishedRevisionId: null,
      scheduledPublishAt: null,
      status: page.status === 'published' ? 'approved' : page.status,
    });
    await page.save({ transaction });
    await recordAudit(
      { actorId: actor.id, action: 'page.archived', subjectType: 'page', subjectId: page.id, data: { reason, from, wasLive } },
      transaction,
    );
    if (wasLive) transaction.afterCommit(() => void publishingEvents.emit('pageUnpublished', { pageId: page.id }));
    return page;
  });
}

/**
 * Brings an archived page back to the desk in the state it was archived in (a page that was live comes
 * back approved, not published): going live again takes an editor's publish, as always.
 * @throws HttpError 409 `page_not_archived`
 */
export async function restorePage(pageId: string, reason: string, actor: User): Promise<Page> {
  return getSequelize().transaction(async (transaction) => {
    const page = await lockAny(pageId, transaction);
    if (!page.archivedAt) throw WorkflowError('This page is not archived.', 'page_not_archived');
    page.set({ archivedAt: null, archivedById: null });
    await page.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'page.restored',
        subjectType: 'page',
        subjectId: page.id,
        data: { reason, status: page.status },
      },
      transaction,
    );
    return page;
  });
}

/**
 * Deletes a page that was never published, with its revisions, sign-offs, comments and any slide
 * pointing at it (foreign keys cascade). The audit event keeps its title and reason.
 * @throws HttpError 409 `page_was_published` for a page that was ever live (archive it instead)
 */
export async function deletePage(pageId: string, reason: string, actor: User): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const page = await lockAny(pageId, transaction);
    if (page.firstPublishedAt || page.publishedSnapshot)
      throw WorkflowError(
        'This page has been published, so it cannot be deleted: visitors, kiosks and the public API have seen it. Archive it instead; it stays in the history and can be restored.',
        'page_was_published',
      );
    await recordAudit(
      {
        actorId: actor.id,
        action: 'page.deleted',
        subjectType: 'page',
        subjectId: page.id,
        data: { reason, title: page.title, status: page.status, writerId: page.writerId },
      },
      transaction,
    );
    await page.destroy({ transaction });
  });
}
