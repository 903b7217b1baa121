import type { JSONContent } from '@tiptap/core';
import type { PageCreateInput, PageStatus } from '@shared/schemas/page.ts';
import { getSequelize } from '../../db.ts';
import { NotFoundError } from '../../errors.ts';
import { Page, PageRevision, SkyObject, User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { getSettings } from '../settings/index.ts';
import { ArchivedPageError, PageConflictError, WorkflowError } from './page-errors.ts';
import { appendRevision, EMPTY_DOC } from './page-revisions.ts';

/**
 * Creates a draft page about a catalogue object, with an empty first revision.
 * @throws HttpError 404 when the object is not in the catalogue
 */
export async function createPage(input: PageCreateInput, writer: User): Promise<Page> {
  const object = await SkyObject.findByPk(input.objectId, { attributes: ['id'] });
  if (!object) throw NotFoundError('That object is not in the catalogue.');
  const locale = input.locale ?? ((await getSettings()).defaultLocale as Page['locale']);
  return getSequelize().transaction(async (transaction) => {
    const page = await Page.create({ title: input.title, skyObjectId: object.id, locale, writerId: writer.id }, { transaction });
    const revision = await appendRevision(
      { pageId: page.id, title: input.title, doc: EMPTY_DOC, authorId: writer.id },
      transaction,
    );
    page.currentRevisionId = revision.id;
    await page.save({ transaction });
    await recordAudit(
      {
        actorId: writer.id,
        action: 'page.created',
        subjectType: 'page',
        subjectId: page.id,
        data: { title: input.title, objectId: object.id },
      },
      transaction,
    );
    return page;
  });
}

/** The version the server holds, for a 409. */
async function serverVersion(page: Page): Promise<PageConflictError> {
  const revision = await PageRevision.findByPk(page.currentRevisionId!);
  const author = revision?.authorId ? await User.findByPk(revision.authorId, { attributes: ['name'] }) : null;
  return new PageConflictError({
    version: page.version,
    title: revision?.title ?? page.title,
    doc: revision?.doc ?? EMPTY_DOC,
    revisionNumber: revision?.number ?? 0,
    savedBy: author?.name ?? null,
    savedAt: (revision?.createdAt ?? page.updatedAt).toISOString(),
  });
}

const STATUS_AFTER_EDIT: Record<PageStatus, PageStatus | null> = {
  draft: 'draft',
  in_review: null,
  approved: 'draft',
  published: 'draft',
  needs_recheck: 'draft',
};

/**
 * Saves a new revision, if the writer started from the version the server holds (optimistic
 * locking); otherwise nothing is written and a 409 carries the server's version. Editing an
 * approved or published page makes it a draft again; the published version stays live until a
 * new one is approved and published. A save that changes nothing writes nothing.
 * @param doc a document that passed validateDoc
 * @throws PageConflictError 409 on a stale version; HttpError 409 while the page is in review
 */
export async function savePage(
  pageId: string,
  input: { version: number; title: string; doc: JSONContent; restoredFrom?: number },
  actor: User,
): Promise<{ page: Page; saved: boolean }> {
  const outcome = await getSequelize().transaction(async (transaction) => {
    const page = await Page.findByPk(pageId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!page) throw NotFoundError('There is no such page.');
    if (page.archivedAt) throw ArchivedPageError();
    if (page.version !== input.version) return { page, conflict: true, saved: false };
    const next = STATUS_AFTER_EDIT[page.status as PageStatus];
    if (!next)
      throw WorkflowError(
        'This page is with a reviewer. Ask them to send it back before you change it; your text is kept in this browser.',
        'page_in_review',
      );
    const current = await PageRevision.findByPk(page.currentRevisionId!, { transaction });
    if (
      current &&
      current.title === input.title &&
      JSON.stringify(current.doc) === JSON.stringify(input.doc) &&
      input.restoredFrom === undefined
    ) {
      return { page, conflict: false, saved: false };
    }
    const revision = await appendRevision(
      { pageId: page.id, title: input.title, doc: input.doc, authorId: actor.id, restoredFrom: input.restoredFrom },
      transaction,
    );
    const before = page.status;
    page.set({
      title: input.title,
      currentRevisionId: revision.id,
      version: page.version + 1,
      status: next,
      recheckStatementIds: next === 'draft' ? [] : page.recheckStatementIds,
    });
    await page.save({ transaction });
    if (before !== next) {
      await recordAudit(
        {
          actorId: actor.id,
          action: 'page.reopened',
          subjectType: 'page',
          subjectId: page.id,
          data: { from: before, to: next, revision: revision.number },
        },
        transaction,
      );
    }
    if (input.restoredFrom !== undefined) {
      await recordAudit(
        {
          actorId: actor.id,
          action: 'page.revision_restored',
          subjectType: 'page',
          subjectId: page.id,
          data: { from: input.restoredFrom, as: revision.number },
        },
        transaction,
      );
    }
    return { page, conflict: false, saved: true };
  });
  if (outcome.conflict) throw await serverVersion(outcome.page);
  return { page: outcome.page, saved: outcome.saved };
}
