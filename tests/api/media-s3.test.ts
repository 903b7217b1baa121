import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import S3rver from 's3rver';
import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.UPLOADS_DIR ??= '.data/test-uploads';
});

import { Media } from '../../server/models/index.ts';
import { S3Storage } from '../../server/storage/s3-storage.ts';
import { getStorage } from '../../server/storage/storage.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { clearUploads, photoWithExif, storedFiles, upload } from '../support/media.ts';

const BUCKET = 'starproof-test-media';
// s3rver's built-in account (its documented defaults).
const credentials = { accessKeyId: 'S3RVER', secretAccessKey: 'S3RVER' };
let s3: S3rver;
let directory: string;
let endpoint: string;

beforeAll(async () => {
  directory = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-s3rver-'));
  s3 = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory, configureBuckets: [{ name: BUCKET }] });
  const { port } = await s3.run();
  endpoint = `http://127.0.0.1:${port}`;
  // The app's storage is chosen by configuration on first use.
  Object.assign(process.env, {
    STARPROOF_STORAGE: 's3',
    STARPROOF_S3_BUCKET: BUCKET,
    STARPROOF_S3_ENDPOINT: endpoint,
    STARPROOF_S3_FORCE_PATH_STYLE: 'true',
    STARPROOF_S3_PREFIX: 'venue-a/',
    AWS_ACCESS_KEY_ID: credentials.accessKeyId,
    AWS_SECRET_ACCESS_KEY: credentials.secretAccessKey,
  });
  await getTestApp();
  await resetDatabase();
  clearUploads();
});

afterAll(async () => {
  (getStorage() as S3Storage).destroy();
  await s3.close();
  fs.rmSync(directory, { recursive: true, force: true });
});

const key = (n: string) => `renditions/${n.repeat(64)}.webp`;
const readAll = async (stream: NodeJS.ReadableStream) => {
  const parts: Buffer[] = [];
  for await (const c of stream) parts.push(c as Buffer);
  return Buffer.concat(parts);
};

describe('the S3 storage driver against s3rver on loopback', () => {
  it('stores, reads, checks and deletes files under its prefix', async () => {
    const storage = new S3Storage({
      bucket: BUCKET,
      region: 'us-east-1',
      endpoint,
      forcePathStyle: true,
      prefix: 'driver/',
      credentials,
    });
    const tmp = path.join(os.tmpdir(), `starproof-s3-${process.pid}.bin`);
    fs.writeFileSync(tmp, Buffer.from('from a file on disk'));
    try {
      await storage.putFile(key('a'), tmp, { contentType: 'image/webp', cacheControl: 'public, max-age=31536000, immutable' });
      await storage.putBuffer(key('b'), Buffer.from('from memory'), { contentType: 'image/webp' });
      expect(await storage.exists(key('a'))).toBe(true);
      const read = await storage.read(key('a'));
      expect(read!.bytes).toBe(19);
      expect((await readAll(read!.stream)).toString()).toBe('from a file on disk');
      expect((await readAll((await storage.read(key('b')))!.stream)).toString()).toBe('from memory');
      expect(await storage.read(key('c'))).toBeNull();
      expect(await storage.exists(key('c'))).toBe(false);
      await storage.delete(key('a'));
      await storage.delete(key('c')); // a missing file is not an error
      expect(await storage.exists(key('a'))).toBe(false);
      // Keys that are not ours never reach the bucket.
      await expect(storage.putBuffer('../originals/x.jpg', Buffer.from('x'), { contentType: 'image/jpeg' })).rejects.toThrow(
        /Not a media storage key/,
      );
      // The prefix really is where the objects live.
      expect(fs.readdirSync(path.join(directory, BUCKET))).toContain('driver');
    } finally {
      fs.rmSync(tmp, { force: true });
      storage.destroy();
    }
  });

  it('an upload through the app keeps its original in the bucket and serves renditions from it', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await upload(agent, await photoWithExif(900, 600), 'comet.jpg', { credit: 'Corrie Vale Planetarium (demo)' });
    expect(res.status).toBe(201);
    expect(res.body.data.renditionsStatus).toBe('ready');
    const media = (await Media.findByPk(res.body.data.id))!;
    expect(await getStorage().exists(media.originalKey)).toBe(true);
    // Nothing but the temporary folder (now empty) on local disk.
    expect(storedFiles()).toEqual([]);
    const thumb = res.body.data.renditions.find(
      (r: { name: string; format: string }) => r.name === 'thumbnail' && r.format === 'jpeg',
    );
    const served = await supertest(await getTestApp()).get(thumb.url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/jpeg');
    expect(served.headers['cache-control']).toBe('public, max-age=31536000, immutable');

    expect((await agent.delete(`/api/media/${media.id}`)).status).toBe(204);
    expect(await getStorage().exists(media.originalKey)).toBe(false);
    expect((await supertest(await getTestApp()).get(thumb.url)).status).toBe(404);
  });
});
