import { ConflictError } from '../../errors.ts';
import { requestRenditions } from './media-renditions-job.ts';
import type { Media } from '../../models/index.ts';

/**
 * Queues an image's renditions to be made again (e.g. after a failure).
 * @throws HttpError 409 `already_processing` while they are being made
 */
export async function retryRenditions(media: Media): Promise<Media> {
  if (media.renditionsStatus === 'processing')
    throw ConflictError('The renditions are being made right now.', 'already_processing');
  await media.update({ renditionsStatus: 'pending', renditionsError: null });
  await requestRenditions(media.id);
  return media.reload();
}
