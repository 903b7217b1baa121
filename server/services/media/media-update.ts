import type { MediaUpdateInput } from '@shared/media/schemas.ts';
import { getSequelize } from '../../db.ts';
import { requestRenditions } from './media-renditions-job.ts';
import { Media, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { replaceMediaObjects } from './media-objects.ts';
import { publishingEvents } from '../publishing/index.ts';

/**
 * Changes an image's details. Moving the focal point re-makes the renditions (the kiosk crops
 * follow it); the old ones stay served until the new ones are ready.
 * @returns the image, reloaded
 * @throws HttpError 400 when a linked object is not in the catalogue
 */
export async function updateMedia(media: Media, input: MediaUpdateInput, actor: User, ip?: string): Promise<Media> {
  const focalMoved = await getSequelize().transaction(async (transaction) => {
    const row = await Media.findByPk(media.id, { transaction, lock: transaction.LOCK.UPDATE, rejectOnEmpty: true });
    const changes: Partial<Media> = {};
    if (input.altText !== undefined) changes.altText = input.altText;
    if (input.credit !== undefined) changes.credit = input.credit;
    if (input.licenceId !== undefined) changes.licenceId = input.licenceId;
    if (input.sourceUrl !== undefined) changes.sourceUrl = input.sourceUrl;
    const moved = !!input.focalPoint && (input.focalPoint.x !== row.focalX || input.focalPoint.y !== row.focalY);
    if (moved)
      Object.assign(changes, {
        focalX: input.focalPoint!.x,
        focalY: input.focalPoint!.y,
        renditionsStatus: 'pending',
        renditionsError: null,
      });
    await row.update(changes, { transaction });
    if (input.objectIds) await replaceMediaObjects(row.id, input.objectIds, transaction);
    await recordAudit(
      {
        actorId: actor.id,
        action: 'media.updated',
        subjectType: 'media',
        subjectId: row.id,
        data: { fields: Object.keys(input) },
        ip,
      },
      transaction,
    );
    transaction.afterCommit(() => {
      publishingEvents.emit('mediaChanged', { mediaId: row.id });
    });
    return moved;
  });
  if (focalMoved) await requestRenditions(media.id);
  return media.reload();
}
