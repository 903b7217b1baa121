import type { PageCan, PageRow } from '@shared/schemas/page.ts';
import type { Page, User } from '../models/index.ts';
import { can } from '../policies/index.ts';

/** The list row: the fields the pages table shows. */
export function presentPageRow(
  page: Page,
  object: { id: string; name: string; kind: string } | undefined,
  writer: { id: string; name: string } | undefined,
  revisionNumber: number,
): PageRow {
  return {
    id: page.id,
    title: page.title,
    object: object
      ? { id: object.id, name: object.name, kind: object.kind }
      : { id: page.skyObjectId, name: '(object removed)', kind: 'unknown' },
    locale: page.locale,
    status: page.status,
    writer: writer ? { id: writer.id, name: writer.name } : { id: page.writerId, name: '(former staff)' },
    revisionNumber,
    live: !!page.publishedSnapshot,
    scheduledPublishAt: page.scheduledPublishAt?.toISOString() ?? null,
    archivedAt: page.archivedAt?.toISOString() ?? null,
    updatedAt: page.updatedAt.toISOString(),
  };
}

/**
 * What the viewer may do with the page now: the policy (who) and the page's state (when), so the
 * client shows only buttons that will work.
 */
export function pageAbilities(page: Page, viewer: User): PageCan {
  const reviewable = (page.status === 'in_review' || page.status === 'needs_recheck') && !page.archivedAt;
  if (page.archivedAt)
    return {
      edit: false,
      submit: false,
      withdraw: false,
      review: false,
      publish: false,
      unpublish: false,
      schedule: false,
      comment: can(viewer, 'page', 'comment', page),
      archive: false,
      restore: can(viewer, 'page', 'restore', page),
      delete: can(viewer, 'page', 'delete', page) && !page.firstPublishedAt,
    };
  return {
    edit: can(viewer, 'page', 'edit', page) && page.status !== 'in_review',
    submit: can(viewer, 'page', 'submit', page) && page.status === 'draft',
    withdraw: can(viewer, 'page', 'submit', page) && page.status === 'in_review',
    review: can(viewer, 'page', 'review', page) && reviewable,
    publish: can(viewer, 'page', 'publish', page) && page.status === 'approved',
    unpublish: can(viewer, 'page', 'publish', page) && !!page.publishedSnapshot,
    schedule: can(viewer, 'page', 'publish', page) && page.status === 'approved',
    comment: can(viewer, 'page', 'comment', page),
    archive: can(viewer, 'page', 'archive', page),
    restore: false,
    delete: can(viewer, 'page', 'delete', page) && !page.firstPublishedAt && !page.publishedSnapshot,
  };
}
