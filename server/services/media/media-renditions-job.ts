import { logger } from '../../logger.ts';
import { Media } from '../../models/index.ts';
import { generateRenditions } from './media-renditions.ts';
import { defineJob } from '../../jobs/queue.ts';

/** Queues the renditions of one image (pg-boss retries a failure with backoff). */
const enqueueRenditionJob = defineJob<{ mediaId: string }>('media-renditions', ({ mediaId }) => generateRenditions(mediaId));

/**
 * Asks for an image's renditions to be (re)made in the background. Never throws: the image is
 * already saved, so a failure is recorded on it for the library to show, with a way to try again.
 * @param mediaId the image
 */
export async function requestRenditions(mediaId: string): Promise<void> {
  try {
    await enqueueRenditionJob({ mediaId });
  } catch (err) {
    logger.warn({ err, mediaId }, 'renditions could not be made or queued');
    // Without a running queue the job ran inline and has recorded its own failure.
    const media = await Media.findByPk(mediaId);
    if (media && media.renditionsStatus !== 'failed') {
      await media.update({
        renditionsStatus: 'failed',
        renditionsError: 'The renditions could not be queued. Try again in a moment.',
      });
    }
  }
}
