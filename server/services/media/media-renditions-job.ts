import { logger } from '../../logger.ts';
import { Media } from '../../models/index.ts';
import { generateRenditions } from './media-renditions.ts';
import { enqueue } from '../../jobs/queue.ts';

/** The job kind that makes an image's renditions (pg-boss retries a failure with backoff). */
export const RENDITIONS_JOB = 'media-renditions';

/** The renditions job: make one image's renditions. */
export async function runRenditionsJob({ mediaId }: { mediaId: string }): Promise<void> {
  await generateRenditions(mediaId);
}

/**
 * Asks for an image's renditions to be (re)made in the background. Never throws: the image is
 * already saved, so a failure is recorded on it for the library to show, with a way to try again.
 * @param mediaId the image
 */
export async function requestRenditions(mediaId: string): Promise<void> {
  try {
    await enqueue(RENDITIONS_JOB, { mediaId });
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
