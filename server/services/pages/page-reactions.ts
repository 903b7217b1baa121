import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { logger } from '../../logger.ts';
import type { Page, User } from '../../models/index.ts';
import { pagePolicy } from '../../policies/page.ts';
import { enqueuePageRecheck, enqueueRecheckClear } from './page-recheck.ts';

/**
 * Where a library image appears: pages whose working copy, approved or published version shows it
 * (the media library's usage provider for pages).
 * @param mediaId the image; anything but a uuid uses nothing
 */
export async function pagesUsingMedia(mediaId: string) {
  if (!/^[0-9a-f-]{36}$/i.test(mediaId)) return [];
  const rows = await getSequelize().query<{
    id: string;
    title: string;
    writerId: string;
    status: Page['status'];
    submittedAt: Date | null;
  }>(
    `SELECT DISTINCT p.id, p.title, p.writer_id AS "writerId", p.status, p.submitted_at AS "submittedAt" FROM pages p JOIN page_revisions r
        ON r.id IN (p.current_revision_id, p.approved_revision_id, p.published_revision_id)
      WHERE r.media_ids @> ARRAY[:mediaId]::uuid[] ORDER BY p.title`,
    { replacements: { mediaId }, type: QueryTypes.SELECT },
  );
  // Another writer's private draft is listed only to those who may read it (see pagePolicy.read).
  return rows.map((r) => ({
    kind: 'page',
    id: r.id,
    title: r.title,
    visibleTo: (viewer: User) => pagePolicy.read(viewer, r as unknown as Page),
  }));
}

/**
 * Queues a look for pages that use statements whose wording changed or broke, from an event
 * listener (which cannot wait): a failure to queue is logged, not thrown.
 * @param event the statements concerned
 */
export function queuePageRecheck({ statementIds }: { statementIds: string[] }): void {
  enqueuePageRecheck({ statementIds }).catch((err: unknown) =>
    logger.error({ err, statementIds }, 'could not queue a page re-check'),
  );
}

/**
 * Queues a look for pages whose re-check has settled (every statement reads again as signed), from
 * an event listener: a failure to queue is logged, not thrown.
 * @param event the statements that became current again
 */
export function queueRecheckClear({ statementIds }: { statementIds: string[] }): void {
  enqueueRecheckClear({ statementIds }).catch((err: unknown) =>
    logger.error({ err, statementIds }, 'could not queue a look for settled re-checks'),
  );
}
