import type { MediaUpdateInput } from '@shared/media/schemas.ts';
import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { HttpError } from '../../errors.ts';
import { can } from '../../policies/index.ts';
import { requestRenditions } from './media-renditions-job.ts';
import { Media, type User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { replaceMediaObjects } from './media-objects.ts';
import { publishingEvents } from '../publishing/index.ts';

/** Whether the input changes what a published page or a kiosk shows of the image (objects links do not). */
function changesWhatThePublicSees(media: Media, input: MediaUpdateInput): boolean {
  return (
    (input.altText !== undefined && input.altText !== media.altText) ||
    (input.credit !== undefined && input.credit !== media.credit) ||
    (input.licenceId !== undefined && input.licenceId !== media.licenceId) ||
    (input.sourceUrl !== undefined && input.sourceUrl !== media.sourceUrl) ||
    (!!input.focalPoint && (input.focalPoint.x !== media.focalX || input.focalPoint.y !== media.focalY))
  );
}

/** Whether the image is on a published page or on a kiosk channel's slide. */
export async function isInPublishedUse(mediaId: string): Promise<boolean> {
  const [row] = await getSequelize().query<{ live: boolean }>(
    `SELECT EXISTS (SELECT 1 FROM pages p JOIN page_revisions r ON r.id = p.published_revision_id
                    WHERE r.media_ids @> ARRAY[:mediaId]::uuid[])
         OR EXISTS (SELECT 1 FROM channel_slides s WHERE s.media_id = :mediaId) AS live`,
    { replacements: { mediaId }, type: QueryTypes.SELECT },
  );
  return !!row?.live;
}

/**
 * Changes an image's details. Moving the focal point re-makes the renditions (the kiosk crops
 * follow it); the old ones stay served until the new ones are ready.
 * @returns the image, reloaded
 * @throws HttpError 400 when a linked object is not in the catalogue; 403 `image_in_published_use`
 *   when someone other than an editor changes what the public sees of a live image
 */
export async function updateMedia(media: Media, input: MediaUpdateInput, actor: User, ip?: string): Promise<Media> {
  if (changesWhatThePublicSees(media, input) && !can(actor, 'media', 'editLive', media) && (await isInPublishedUse(media.id)))
    throw new HttpError(
      403,
      'image_in_published_use',
      'This image is live on a published page or a kiosk channel. Ask an editor to change its credit, alt text, licence, source or crop.',
    );
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
