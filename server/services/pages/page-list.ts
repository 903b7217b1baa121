import { containsPattern } from '../../db/like-pattern.ts';
import { Op, type WhereOptions } from 'sequelize';
import type { PageListQuery, PageRow } from '@shared/schemas/page.ts';
import { Page, PageRevision, SkyObject, User } from '../../models/index.ts';
import { presentPageRow } from '../../presenters/page.ts';

/**
 * Rows for a set of pages, with object, writer and revision number, in one query each.
 * @param pages pages the viewer may read
 */
export async function pageRows(pages: Page[]): Promise<PageRow[]> {
  if (!pages.length) return [];
  const [objects, writers, revisions] = await Promise.all([
    SkyObject.findAll({
      where: { id: { [Op.in]: [...new Set(pages.map((p) => p.skyObjectId))] } },
      attributes: ['id', 'name', 'kind'],
    }),
    User.findAll({ where: { id: { [Op.in]: [...new Set(pages.map((p) => p.writerId))] } }, attributes: ['id', 'name'] }),
    PageRevision.findAll({
      where: { id: { [Op.in]: pages.map((p) => p.currentRevisionId!).filter(Boolean) } },
      attributes: ['id', 'number'],
    }),
  ]);
  const o = new Map(objects.map((x) => [x.id, x]));
  const w = new Map(writers.map((x) => [x.id, x]));
  const r = new Map(revisions.map((x) => [x.id, x.number]));
  return pages.map((p) => presentPageRow(p, o.get(p.skyObjectId), w.get(p.writerId), r.get(p.currentRevisionId!) ?? 0));
}

/**
 * Which pages a person may see: everything but other writers' unsubmitted drafts (the same rule
 * as the page policy's `read`, in SQL so paging counts are right).
 */
export function visibleTo(viewer: User): WhereOptions<Page> {
  if (viewer.role === 'admin' || viewer.role === 'editor') return {};
  return {
    [Op.or]: [{ writerId: viewer.id }, { status: { [Op.ne]: 'draft' } }, { submittedAt: { [Op.ne]: null } }],
  } as WhereOptions<Page>;
}

const ARCHIVED_FILTER: Record<PageListQuery['archived'], WhereOptions<Page>> = {
  hide: { archivedAt: null },
  include: {},
  only: { archivedAt: { [Op.ne]: null } },
};

/**
 * One page of the pages table, newest change first, filtered by status, object, writer or title;
 * archived pages only when asked for.
 * @param query the parsed list query
 */
export async function listPages(query: PageListQuery, viewer: User): Promise<{ rows: PageRow[]; total: number }> {
  const where: WhereOptions<Page> = {
    [Op.and]: [
      visibleTo(viewer),
      query.status ? { status: query.status } : {},
      query.objectId ? { skyObjectId: query.objectId } : {},
      query.writerId ? { writerId: query.writerId } : {},
      query.q ? { title: { [Op.iLike]: containsPattern(query.q) } } : {},
      ARCHIVED_FILTER[query.archived],
    ],
  } as WhereOptions<Page>;
  const { rows, count } = await Page.findAndCountAll({
    where,
    order: [
      ['updatedAt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { rows: await pageRows(rows), total: count };
}
