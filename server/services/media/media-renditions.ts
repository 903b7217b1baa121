import fsp from 'node:fs/promises';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { pipeline } from 'node:stream/promises';
import fs from 'node:fs';
import { FORMAT_FILES } from '@shared/media/renditions.ts';
import { getSequelize } from '../../db.ts';
import { logger } from '../../logger.ts';
import { instanceTmpDir } from '../../media/instance.ts';
import { IMMUTABLE_CACHE, renditionKey } from '../../media/keys.ts';
import { renderAll } from '../../media/render.ts';
import { mediaSettings } from '../../media/settings.ts';
import { Media, MediaRendition } from '../../models/index.ts';
import { LocalStorage } from '../../storage/local-storage.ts';
import { getStorage } from '../../storage/storage.ts';
import { noteFiles, settleFiles } from './media-file-journal.ts';

/** The original as a file on this machine: the stored file itself locally, a temporary copy from a bucket. */
async function originalOnDisk(key: string): Promise<{ file: string; cleanup: () => Promise<void> }> {
  const storage = getStorage();
  if (storage instanceof LocalStorage) return { file: path.join(storage.root, key), cleanup: async () => undefined };
  const stored = await storage.read(key);
  if (!stored) throw new Error(`The original file ${key} is missing from storage.`);
  await fsp.mkdir(instanceTmpDir(), { recursive: true });
  const file = path.join(instanceTmpDir(), `original-${randomUUID()}`);
  const cleanup = () => fsp.rm(file, { force: true });
  try {
    await pipeline(stored.stream, fs.createWriteStream(file));
  } catch (err) {
    await cleanup();
    throw err;
  }
  return { file, cleanup };
}

/**
 * Makes and stores every rendition of an image, then swaps them in for the old ones in one
 * transaction and removes files no longer used. Safe to run twice (names are content-addressed).
 * If the focal point moved meanwhile the status stays pending: the job queued by that change
 * makes the final set.
 * @param mediaId the image
 * @throws whatever failed, after recording it on the image (the queue retries)
 */
export async function generateRenditions(mediaId: string): Promise<void> {
  const media = await Media.findByPk(mediaId);
  if (!media) return;
  const focal = { x: media.focalX, y: media.focalY };
  await media.update({ renditionsStatus: 'processing', renditionsError: null });

  const stored: Array<{
    name: MediaRendition['name'];
    format: MediaRendition['format'];
    width: number;
    height: number;
    bytes: number;
    storageKey: string;
  }> = [];
  try {
    const original = await originalOnDisk(media.originalKey);
    try {
      for (const file of await renderAll(original.file, focal, mediaSettings().maxPixels)) {
        const key = renditionKey(file.data, file.format);
        await noteFiles([key]);
        await getStorage().putBuffer(key, file.data, {
          contentType: FORMAT_FILES[file.format].mime,
          cacheControl: IMMUTABLE_CACHE,
        });
        stored.push({
          name: file.name,
          format: file.format,
          width: file.width,
          height: file.height,
          bytes: file.data.length,
          storageKey: key,
        });
      }
    } finally {
      await original.cleanup();
    }
  } catch (err) {
    logger.warn({ err, mediaId }, 'renditions failed');
    await Media.update(
      {
        renditionsStatus: 'failed',
        renditionsError: `The renditions could not be made: ${(err as Error).message}`.slice(0, 500),
      },
      { where: { id: mediaId } },
    );
    await settleFiles(stored.map((s) => s.storageKey));
    throw err;
  }

  const replaced = await getSequelize().transaction(async (transaction) => {
    const row = await Media.findByPk(mediaId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!row) return null;
    const old = await MediaRendition.findAll({ where: { mediaId }, transaction });
    await noteFiles(
      old.map((r) => r.storageKey),
      transaction,
    );
    await MediaRendition.destroy({ where: { mediaId }, transaction });
    await MediaRendition.bulkCreate(
      stored.map((s) => ({ ...s, mediaId })),
      { transaction },
    );
    const focalMoved = row.focalX !== focal.x || row.focalY !== focal.y;
    await row.update({ renditionsStatus: focalMoved ? 'pending' : 'ready', renditionsError: null }, { transaction });
    return old.map((r) => r.storageKey);
  });
  // Keeps what the rows now use and removes the rest (all of it if the image was deleted meanwhile).
  await settleFiles([...(replaced ?? []), ...stored.map((s) => s.storageKey)]);
}
