import { getSequelize } from '../../db.ts';
import { PageComment, PageRevision, User, type Page } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';

/** A page's comments, oldest first, each with its author's name. */
export async function listPageComments(page: Page): Promise<PageComment[]> {
  return PageComment.findAll({
    where: { pageId: page.id },
    include: [{ model: User, as: 'author', attributes: ['name'] }],
    order: [['createdAt', 'ASC']],
  });
}

/**
 * Adds a comment on the page's current revision; the comment and its audit event are written in one
 * transaction, so neither is kept without the other.
 * @returns the comment with its author set
 */
export async function addPageComment(page: Page, body: string, author: User): Promise<PageComment> {
  const revision = await PageRevision.findByPk(page.currentRevisionId!, { attributes: ['number'] });
  return getSequelize().transaction(async (transaction) => {
    const comment = await PageComment.create(
      { pageId: page.id, revisionNumber: revision?.number ?? null, authorId: author.id, body },
      { transaction },
    );
    await recordAudit(
      { actorId: author.id, action: 'page.commented', subjectType: 'page', subjectId: page.id, data: { commentId: comment.id } },
      transaction,
    );
    comment.author = author;
    return comment;
  });
}
