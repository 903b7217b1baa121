import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { Media, MediaRendition, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { noteFiles, settleFiles } from './media-file-journal.ts';
import { findMediaUsage, hiddenUsageText } from './media-usage.ts';

/**
 * Deletes an unused image: its row, renditions and object links in one transaction, then its
 * files. Features that reference images hold a foreign key, so a use added meanwhile makes the
 * delete fail (409) rather than leave a page without its picture.
 * @throws HttpError 409 in_use, naming where the image is used
 */
export async function deleteMedia(media: Media, actor: User, ip?: string): Promise<void> {
  const { usage, hiddenCount } = await findMediaUsage(media.id, actor);
  const total = usage.length + hiddenCount;
  if (total) {
    // Only what the person may see is named; other writers' private drafts are counted.
    const named = usage.slice(0, 3).map((u) => `${u.kind} “${u.title}”`);
    const more = usage.length > 3 ? [`${usage.length - 3} more`] : [];
    const hidden = hiddenCount ? [hiddenUsageText(hiddenCount)] : [];
    const parts = [...named, ...more, ...hidden];
    const list = parts.length > 1 ? `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}` : parts[0];
    throw ConflictError(
      `This image is used in ${total === 1 ? 'one place' : `${total} places`} (${list}). Remove it there first.`,
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
