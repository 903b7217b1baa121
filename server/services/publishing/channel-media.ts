import { QueryTypes } from 'sequelize';
import { IdSchema } from '@shared/schemas/common.ts';
import { getSequelize } from '../../db.ts';

/** The channels with a slide that shows this image, by name (for the library's "used in" and its delete check). */
export async function channelsShowingMedia(mediaId: string): Promise<Array<{ id: string; name: string }>> {
  if (!IdSchema.safeParse(mediaId).success) return [];
  return getSequelize().query<{ id: string; name: string }>(
    'SELECT DISTINCT c.id, c.name FROM channels c JOIN channel_slides s ON s.channel_id = c.id WHERE s.media_id = :mediaId ORDER BY c.name',
    { replacements: { mediaId }, type: QueryTypes.SELECT },
  );
}
