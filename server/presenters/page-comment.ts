import type { PageCommentDto } from '@shared/schemas/page.ts';
import type { PageComment } from '../models/index.ts';

/** A comment on a page, with its author's name (its `author` loaded) and the revision it was made on. */
export function presentPageComment(comment: PageComment): PageCommentDto {
  return {
    id: comment.id,
    body: comment.body,
    author: comment.author?.name ?? null,
    revisionNumber: comment.revisionNumber,
    createdAt: comment.createdAt.toISOString(),
  };
}
