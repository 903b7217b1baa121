import { Op } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { logger } from '../../logger.ts';
import { Page, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { publishingEvents } from '../publishing/index.ts';
import { WorkflowError } from './page-errors.ts';
import { lockPage } from './page-workflow.ts';

/**
 * An editor publishes the approved version: its stored HTML and signed wording become the live
 * version (the public API and kiosks read it). Clears any schedule.
 * @param actor the editor, or null when the schedule publishes
 * @throws HttpError 409 unless the page is approved
 */
export async function publishPage(pageId: string, actor: User | null): Promise<Page> {
  return getSequelize().transaction(async (transaction) => {
    const { page } = await lockPage(pageId, transaction);
    if (page.status !== 'approved' || !page.approvedSnapshot) {
      throw WorkflowError(
        page.status === 'published'
          ? 'This version is already published.'
          : 'Only an approved page can be published. A reviewer signs it off first.',
      );
    }
    const publishedAt = new Date();
    page.set({
      status: 'published',
      publishedRevisionId: page.approvedRevisionId,
      publishedSnapshot: {
        ...page.approvedSnapshot,
        publishedAt: publishedAt.toISOString(),
        publishedBy: actor ? { id: actor.id, name: actor.name } : null,
      },
      scheduledPublishAt: null,
      firstPublishedAt: page.firstPublishedAt ?? publishedAt,
    });
    await page.save({ transaction });
    await recordAudit(
      {
        actorId: actor?.id ?? null,
        action: 'page.published',
        subjectType: 'page',
        subjectId: page.id,
        data: { revision: page.approvedSnapshot.revisionNumber, scheduled: !actor },
      },
      transaction,
    );
    transaction.afterCommit(() => void publishingEvents.emit('pagePublished', { pageId: page.id }));
    return page;
  });
}

/**
 * An editor takes the page off the public API and kiosks. An approved version stays approved, so it
 * can be published again; a page being edited keeps its state.
 * @throws HttpError 409 when nothing is published
 */
export async function unpublishPage(pageId: string, actor: User): Promise<Page> {
  return getSequelize().transaction(async (transaction) => {
    const { page } = await lockPage(pageId, transaction);
    if (!page.publishedSnapshot) throw WorkflowError('This page is not published.');
    const from = page.status;
    page.set({
      publishedSnapshot: null,
      publishedRevisionId: null,
      status: page.status === 'published' ? 'approved' : page.status,
    });
    await page.save({ transaction });
    await recordAudit(
      { actorId: actor.id, action: 'page.unpublished', subjectType: 'page', subjectId: page.id, data: { from } },
      transaction,
    );
    transaction.afterCommit(() => void publishingEvents.emit('pageUnpublished', { pageId: page.id }));
    return page;
  });
}

/**
 * Sets or clears the time an approved page goes live by itself (checked every minute).
 * @param at a future time, or null to clear
 * @throws HttpError 409 unless approved; 400 for a time in the past
 */
export async function schedulePublish(pageId: string, at: Date | null, actor: User): Promise<Page> {
  return getSequelize().transaction(async (transaction) => {
    const { page } = await lockPage(pageId, transaction);
    if (at && page.status !== 'approved') throw WorkflowError('Only an approved page can be scheduled for publication.');
    if (at && at.getTime() <= Date.now()) throw WorkflowError('Choose a time in the future, or publish now.', 'time_in_past');
    page.scheduledPublishAt = at;
    await page.save({ transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: at ? 'page.publication_scheduled' : 'page.schedule_cleared',
        subjectType: 'page',
        subjectId: page.id,
        data: { at: at?.toISOString() ?? null },
      },
      transaction,
    );
    return page;
  });
}

/**
 * Publishes every approved page whose scheduled time has come. A page edited since it was
 * scheduled is no longer approved and is skipped (its schedule stays for the editor to see).
 * @param now the clock (tests pass their own)
 * @returns ids of the pages published
 */
export async function publishDuePages(now = new Date()): Promise<string[]> {
  const due = await Page.findAll({ where: { status: 'approved', scheduledPublishAt: { [Op.lte]: now } }, attributes: ['id'] });
  const published: string[] = [];
  for (const { id } of due) {
    try {
      await publishPage(id, null);
      published.push(id);
    } catch (err) {
      logger.warn({ err, pageId: id }, 'scheduled publication skipped');
    }
  }
  return published;
}
