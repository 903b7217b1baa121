import { Router } from 'express';
import { pipeline } from 'node:stream/promises';
import { NotFoundError } from '../errors.ts';
import { IMMUTABLE_CACHE, RENDITION_MIME_BY_EXT } from '../media/keys.ts';
import { getStorage } from '../storage/storage.ts';

// Only rendition names: an original (or anything else) has no public address.
const RENDITION_NAME = /^([0-9a-f]{64})\.(avif|webp|jpg)$/;

/**
 * Public rendition files under /media/files/<sha256>.<ext>, outside /api and without a session:
 * kiosks and the public pages read them. The name is the content's hash, so it is cached for a year.
 * With a CDN configured the presenters point straight at it and this route is only a fallback.
 */
export const mediaFilesRouter = Router();

mediaFilesRouter.get('/files/:name', async (req, res) => {
  const match = RENDITION_NAME.exec(req.params.name);
  if (!match) throw NotFoundError('There is no such image file.');
  const etag = `"${match[1]}"`;
  res.set({
    'Cache-Control': IMMUTABLE_CACHE,
    ETag: etag,
    'X-Content-Type-Options': 'nosniff',
    // The public API's consumers may show our images on their own pages, and read them by fetch
    // (a kiosk reaching this server by another address than PUBLIC_URL caches them that way).
    'Cross-Origin-Resource-Policy': 'cross-origin',
    'Access-Control-Allow-Origin': '*',
  });
  if (req.get('if-none-match') === etag) {
    res.status(304).end();
    return;
  }
  const file = await getStorage().read(`renditions/${req.params.name}`);
  if (!file) {
    res.set('Cache-Control', 'no-store');
    throw NotFoundError('There is no such image file.');
  }
  res.set({ 'Content-Type': RENDITION_MIME_BY_EXT[match[2]], 'Content-Length': String(file.bytes) });
  if (req.method === 'HEAD') {
    file.stream.destroy();
    res.end();
    return;
  }
  // A visitor closing the page mid-download is not an error worth logging.
  await pipeline(file.stream, res).catch(() => undefined);
});

mediaFilesRouter.use('/files', () => {
  throw NotFoundError('There is no such image file.');
});
