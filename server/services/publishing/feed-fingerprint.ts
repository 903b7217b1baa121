import { createHash } from 'node:crypto';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';

/** The rows a built feed (or public page list) was made from; a change to any of them changes the fingerprint. */
export interface FeedDeps {
  channelId: string | null;
  venueId: string | null;
  pageIds: string[];
  statementIds: string[];
  mediaIds: string[];
  /** The night whose sky snapshot was used, or null when no sky slide is showing. */
  skyDate: string | null;
  /** Language version groups whose published versions count (a version published in another language shows up). */
  pageGroupIds?: string[];
  /** Every published page counts (the public API lists them all). */
  allPublishedPages?: boolean;
}

const NONE = '00000000-0000-0000-0000-000000000000';

/**
 * One cheap query that reads the version stamps of everything a feed depends on (channel version,
 * venue, live page revisions, statements' dates, images, tonight's sky snapshot, the list of
 * published pages) and hashes them. Several server instances compare it to notice changes made on
 * another instance, whose events they never hear.
 * @returns a hex digest
 */
export async function feedFingerprint(deps: FeedDeps): Promise<string> {
  const rows = await getSequelize().query<{ k: string }>(
    `SELECT 'c' || c.id || ':' || c.version AS k FROM channels c WHERE c.id = :channelId
     UNION ALL SELECT 'v' || v.id || ':' || v.updated_at::text FROM venues v WHERE v.id = :venueId
     UNION ALL SELECT 'p' || p.id || ':' || coalesce(p.published_revision_id::text, '-') || ':' || coalesce(p.published_snapshot->>'publishedAt', '-')
       FROM pages p WHERE p.id = ANY(CAST(:pageIds AS uuid[])) OR (:allPages AND p.published_snapshot IS NOT NULL)
         OR (p.version_group_id = ANY(CAST(:groupIds AS uuid[])) AND p.published_snapshot IS NOT NULL)
     UNION ALL SELECT 's' || s.id || ':' || s.computed_at::text || ':' || coalesce(s.acknowledged_at::text, '-') FROM statements s WHERE s.id = ANY(CAST(:statementIds AS uuid[]))
     UNION ALL SELECT 'm' || m.id || ':' || m.updated_at::text FROM media m WHERE m.id = ANY(CAST(:mediaIds AS uuid[]))
     UNION ALL SELECT 'k' || k.computed_at::text FROM sky_snapshots k WHERE k.venue_id = :venueId AND k.local_date = CAST(:skyDate AS date)
     ORDER BY 1`,
    {
      type: QueryTypes.SELECT,
      replacements: {
        channelId: deps.channelId ?? NONE,
        venueId: deps.venueId ?? NONE,
        pageIds: `{${deps.pageIds.join(',')}}`,
        allPages: !!deps.allPublishedPages,
        groupIds: `{${(deps.pageGroupIds ?? []).join(',')}}`,
        statementIds: `{${deps.statementIds.join(',')}}`,
        mediaIds: `{${deps.mediaIds.join(',')}}`,
        skyDate: deps.skyDate ?? '1800-01-01',
      },
    },
  );
  return createHash('sha256')
    .update(rows.map((r) => r.k).join('\n'))
    .digest('hex');
}
