import { Op, literal, type WhereOptions } from 'sequelize';
import { MediaLimits } from '@shared/media/limits.ts';
import type { MediaListQuery } from '@shared/media/schemas.ts';
import { getSequelize } from '../../db.ts';
import { Media, MediaRendition, User } from '../../models/index.ts';
import { likePattern } from './media-objects.ts';

// An image shows an object when a link names it, by name or by any designation (M31, NGC 224 …).
const showsObject = (escapedPattern: string) =>
  literal(`EXISTS (SELECT 1 FROM media_object_links l JOIN sky_objects o ON o.id = l.sky_object_id
    WHERE l.media_id = "media"."id" AND (o.name ILIKE ${escapedPattern} OR EXISTS (SELECT 1 FROM unnest(o.designations) d WHERE d ILIKE ${escapedPattern})))`);

/**
 * The library, newest first, filtered by free text (alt text, file name, credit, object) or by
 * object, credit or licence.
 * @param query the parsed search
 * @returns one page of images with their renditions and uploader, and the total found
 */
export async function searchMedia(query: MediaListQuery): Promise<{ rows: Media[]; total: number; page: number }> {
  const quoted = (text: string) => getSequelize().escape(likePattern(text));
  const where: WhereOptions[] = [];
  if (query.q) {
    const pattern = likePattern(query.q);
    where.push({
      [Op.or]: [
        { altText: { [Op.iLike]: pattern } },
        { fileName: { [Op.iLike]: pattern } },
        { credit: { [Op.iLike]: pattern } },
        showsObject(quoted(query.q)),
      ],
    });
  }
  if (query.object) where.push(showsObject(quoted(query.object)));
  if (query.credit) where.push({ credit: { [Op.iLike]: likePattern(query.credit) } });
  if (query.licence) where.push({ licenceId: query.licence === 'none' ? null : query.licence });

  const page = query.page ?? 1;
  const { rows, count } = await Media.findAndCountAll({
    where: { [Op.and]: where },
    include: [
      { model: MediaRendition, as: 'renditions' },
      { model: User, as: 'uploadedBy', attributes: ['id', 'name'] },
    ],
    order: [
      ['createdAt', 'DESC'],
      ['id', 'ASC'],
    ],
    limit: MediaLimits.pageSize,
    offset: (page - 1) * MediaLimits.pageSize,
    distinct: true,
  });
  return { rows, total: count, page };
}
