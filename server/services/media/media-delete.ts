import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { Media, MediaRendition, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { noteFiles, settleFiles } from './media-file-journal.ts';
import { findMediaUsage } from './media-usage.ts';

/**
 * Deletes an unused image: its row, renditions and object links in one transaction, then its
 * files. Features that reference images hold a foreign key, so a use added meanwhile makes the
 * delete fail (409) rather than leave a page without its picture.
 * @throws HttpError 409 in_use, naming where the image is used
 */
export async function deleteMedia(media: Media, actor: User, ip?: string): Promise<void> {
  const usage = await findMediaUsage(media.id);
  if (usage.length) {
    const places = usage
      .slice(0, 3)
      .map((u) => `${u.kind} “${u.title}”`)
      .join(', ');
    const more = usage.length > 3 ? ` and ${usage.length - 3} more` : '';
    throw ConflictError(
      `This image is used in ${usage.length === 1 ? 'one place' : `${usage.length} places`} (${places}${more}). Remove it there first.`,
      'in_use',
    );
  }
  const renditionKeys = (await MediaRendition.findAll({ where: { mediaId: media.id }, attributes: ['storageKey'] })).map(
    (r) => r.storageKey,
  );
  const keys = [media.originalKey, ...renditionKeys];
  await getSequelize().transaction(async (transaction) => {
    await noteFiles(keys, transaction);
    await Media.destroy({ where: { id: media.id }, transaction });
    await recordAudit(
      {
        actorId: actor.id,
        action: 'media.deleted',
        subjectType: 'media',
        subjectId: media.id,
        data: { fileName: media.fileName, sha256: media.sha256 },
        ip,
      },
      transaction,
    );
  });
  await settleFiles(keys);
}
