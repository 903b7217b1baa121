import fsp from 'node:fs/promises';
import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { MediaLimits } from '@shared/media/limits.ts';
import { MediaListQuerySchema, MediaUpdateSchema } from '@shared/media/schemas.ts';
import { HttpError } from '../errors.ts';
import { mediaSettings } from '../media/settings.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { singleImageUpload } from '../middlewares/media-upload.ts';
import { validate, validateQuery } from '../middlewares/validate.ts';
import type { Media, User } from '../models/index.ts';
import { authorize } from '../policies/index.ts';
import { presentMedia, presentRendition } from '../presenters/media.ts';
import {
  deleteMedia,
  objectsForMedia,
  suggestObjects,
  searchMedia,
  uploadMedia,
  updateMedia,
  retryRenditions,
  findMediaUsage,
} from '../services/media/index.ts';
import { loadMedia } from './load.ts';

async function present(media: Media, viewer: User) {
  const objects = await objectsForMedia([media.id]);
  return presentMedia(media, viewer, objects.get(media.id) ?? []);
}

const SuggestQuerySchema = z.object({
  q: z.string({ message: 'Type part of a name' }).trim().min(1, 'Type part of a name').max(MediaLimits.searchMax),
});

// Checked before the body is read, so a refused request uploads nothing.
const mayUpload: RequestHandler = (req, _res, next) => {
  authorize(currentUser(req), 'media', 'upload');
  next();
};

export const mediaRouter = Router();
mediaRouter.use(requireUser);

mediaRouter.get('/', validateQuery(MediaListQuerySchema), async (req, res) => {
  const viewer = currentUser(req);
  authorize(viewer, 'media', 'list');
  const { rows, total, page } = await searchMedia(req.query);
  const objects = await objectsForMedia(rows.map((m) => m.id));
  const { uploadMaxBytes, maxPixels } = mediaSettings();
  res.json({
    data: rows.map((m) => presentMedia(m, viewer, objects.get(m.id) ?? [])),
    meta: { total, page, pageSize: MediaLimits.pageSize, uploadMaxBytes, maxMegapixels: maxPixels / 1e6 },
  });
});

mediaRouter.get('/object-suggestions', validateQuery(SuggestQuerySchema), async (req, res) => {
  authorize(currentUser(req), 'media', 'list');
  res.json({ data: await suggestObjects(req.query.q) });
});

mediaRouter.post('/', mayUpload, singleImageUpload, async (req, res) => {
  const viewer = currentUser(req);
  if (!req.file) {
    throw new HttpError(400, 'no_file', 'Choose an image file to upload.', { file: 'Choose an image file to upload.' });
  }
  try {
    const media = await uploadMedia({ file: req.file, fields: req.body, uploader: viewer, ip: req.ip });
    const loaded = await loadMedia(media.id);
    res.status(201).json({ data: await present(loaded, viewer) });
  } finally {
    await fsp.rm(req.file.path, { force: true });
  }
});

mediaRouter.get('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const media = await loadMedia(req.params.id);
  authorize(viewer, 'media', 'read', media);
  const { usage, hiddenCount } = await findMediaUsage(media.id, viewer);
  res.json({ data: { ...(await present(media, viewer)), usage, hiddenUsageCount: hiddenCount } });
});

mediaRouter.patch('/:id', validate(MediaUpdateSchema), async (req, res) => {
  const viewer = currentUser(req);
  const media = await loadMedia(req.params.id);
  authorize(viewer, 'media', 'update', media);
  await updateMedia(media, req.body, viewer, req.ip);
  res.json({ data: await present(await loadMedia(media.id), viewer) });
});

mediaRouter.delete('/:id', async (req, res) => {
  const viewer = currentUser(req);
  const media = await loadMedia(req.params.id);
  authorize(viewer, 'media', 'delete', media);
  await deleteMedia(media, viewer, req.ip);
  res.status(204).end();
});

mediaRouter.get('/:id/renditions', async (req, res) => {
  const viewer = currentUser(req);
  const media = await loadMedia(req.params.id);
  authorize(viewer, 'media', 'read', media);
  res.json({
    data: {
      status: media.renditionsStatus,
      error: media.renditionsError,
      renditions: (media.renditions ?? []).map(presentRendition),
    },
  });
});

/** Makes the renditions again, e.g. after a failure. */
mediaRouter.post('/:id/renditions', async (req, res) => {
  const viewer = currentUser(req);
  const media = await loadMedia(req.params.id);
  authorize(viewer, 'media', 'update', media);
  const queued = await retryRenditions(media);
  res.status(202).json({ data: { status: queued.renditionsStatus, error: queued.renditionsError } });
});
