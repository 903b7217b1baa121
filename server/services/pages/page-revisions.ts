import type { JSONContent } from '@tiptap/core';
import type { Transaction } from 'sequelize';
import { mediaIdsIn, statementIdsIn } from '@shared/editor/doc-text.ts';
import { PageRevision } from '../../models/index.ts';

/**
 * Appends a revision to a page (numbers count up from 1 per page). Call inside the transaction
 * that holds the page row's lock, so two saves never take the same number.
 */
export async function appendRevision(
  props: { pageId: string; title: string; doc: JSONContent; authorId: string | null; restoredFrom?: number | null },
  transaction: Transaction,
): Promise<PageRevision> {
  const last = (await PageRevision.max<number, PageRevision>('number', { where: { pageId: props.pageId }, transaction })) ?? 0;
  return PageRevision.create(
    {
      pageId: props.pageId,
      number: last + 1,
      title: props.title,
      doc: props.doc,
      statementIds: statementIdsIn(props.doc),
      mediaIds: mediaIdsIn(props.doc),
      restoredFrom: props.restoredFrom ?? null,
      authorId: props.authorId,
    },
    { transaction },
  );
}

/** An empty page: one paragraph to start typing in. */
export const EMPTY_DOC: JSONContent = { type: 'doc', content: [{ type: 'paragraph' }] };
