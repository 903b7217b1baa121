/**
 * The image library: uploads, renditions, details, search, deletion, and where each image is used.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { deleteMedia } from './media-delete.ts';
export { objectsForMedia, suggestObjects, type LinkedObject } from './media-objects.ts';
export { RENDITIONS_JOB, runRenditionsJob } from './media-renditions-job.ts';
export { searchMedia } from './media-search.ts';
export { sweepOrphanMedia } from './media-sweep.ts';
export { updateMedia } from './media-update.ts';
export { uploadMedia } from './media-upload.ts';
export { findMediaUsage, isMediaReadyForPublishing, missingForPublishing, registerMediaUsageProvider } from './media-usage.ts';
export { retryRenditions } from './rendition-retry.ts';
