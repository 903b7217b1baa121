import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { logger } from '../../logger.ts';
import { registerMediaUsageProvider } from '../media-usage.ts';
import { statementEvents } from '../statements/events.ts';
import { enqueuePageRecheck, enqueueRecheckClear } from './page-recheck.ts';

let registered = false;

/**
 * Where a library image appears: pages whose working copy, approved or published version shows it.
 * @param mediaId the image
 */
export async function pagesUsingMedia(mediaId: string) {
  const rows = await getSequelize().query<{ id: string; title: string }>(
    `SELECT DISTINCT p.id, p.title FROM pages p JOIN page_revisions r
        ON r.id IN (p.current_revision_id, p.approved_revision_id, p.published_revision_id)
      WHERE r.media_ids @> ARRAY[:mediaId]::uuid[] ORDER BY p.title`,
    { replacements: { mediaId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ kind: 'page', id: r.id, title: r.title }));
}

/**
 * Wires object pages to the rest of the product: a statement whose wording changed or broke queues
 * a look for pages to re-check, and one back to current a look for re-checks that have settled; the media library learns which pages use an image. Idempotent.
 */
export function registerPageReactions(): void {
  if (registered) return;
  registered = true;
  const queue = ({ statementIds }: { statementIds: string[] }) => {
    enqueuePageRecheck({ statementIds }).catch((err: unknown) =>
      logger.error({ err, statementIds }, 'could not queue a page re-check'),
    );
  };
  statementEvents.on('textChanged', queue);
  statementEvents.on('broken', queue);
  const clear = ({ statementIds }: { statementIds: string[] }) => {
    enqueueRecheckClear({ statementIds }).catch((err: unknown) =>
      logger.error({ err, statementIds }, 'could not queue a look for settled re-checks'),
    );
  };
  statementEvents.on('recovered', clear);
  statementEvents.on('accepted', clear);
  registerMediaUsageProvider('pages', (mediaId) =>
    /^[0-9a-f-]{36}$/i.test(mediaId) ? pagesUsingMedia(mediaId) : Promise.resolve([]),
  );
}
