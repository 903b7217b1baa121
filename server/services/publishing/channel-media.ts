import { QueryTypes } from 'sequelize';
import type { MediaUsage } from '@shared/media/schemas.ts';
import { IdSchema } from '@shared/schemas/common.ts';
import { getSequelize } from '../../db.ts';

/**
 * The kiosk channels whose slides show an image (the media library's usage provider for channels:
 * it lists them, and refuses to delete the image while they do).
 * @param mediaId the image; anything but a uuid uses nothing
 */
export async function channelsUsingMedia(mediaId: string): Promise<MediaUsage[]> {
  if (!IdSchema.safeParse(mediaId).success) return [];
  const rows = await getSequelize().query<{ id: string; name: string }>(
    'SELECT DISTINCT c.id, c.name FROM channels c JOIN channel_slides s ON s.channel_id = c.id WHERE s.media_id = :mediaId ORDER BY c.name',
    { replacements: { mediaId }, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({ kind: 'channel', id: r.id, title: `Kiosk channel: ${r.name}` }));
}
