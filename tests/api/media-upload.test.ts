import { createHash } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import supertest from 'supertest';
import { beforeAll, describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.UPLOADS_DIR ??= '.data/test-uploads';
});

import { config } from '../../server/config.ts';
import { AuditEvent, Media } from '../../server/models/index.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { clearUploads, cmykJpeg, halvesImage, photoWithExif, png16, storedFiles, upload } from '../support/media.ts';

const sha256 = (data: Buffer) => createHash('sha256').update(data).digest('hex');
type Rendition = { name: string; format: string; width: number; height: number; url: string };

async function fetchRendition(url: string): Promise<Buffer> {
  const res = await supertest(await getTestApp())
    .get(url)
    .buffer(true)
    .parse((r, cb) => {
      const parts: Buffer[] = [];
      r.on('data', (c: Buffer) => parts.push(c));
      r.on('end', () => cb(null, Buffer.concat(parts)));
    });
  expect(res.status).toBe(200);
  return res.body as Buffer;
}

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
  clearUploads();
});

describe('uploading an image', () => {
  let photo: Buffer;
  let body: { id: string; width: number; height: number; renditions: Rendition[]; renditionsStatus: string; missing: string[] };

  beforeAll(async () => {
    const { agent } = await signedInAgent('writer');
    photo = await photoWithExif(1200, 800);
    // The fixture really carries what must be stripped: orientation, and a GPS block (tag 0x8825).
    const meta = await sharp(photo).metadata();
    expect(meta.orientation).toBe(6);
    expect(meta.exif?.includes(Buffer.from([0x25, 0x88]))).toBe(true);
    const res = await upload(agent, photo, 'Andromeda über Corrie Vale.jpg', {
      altText: 'The Andromeda galaxy above the hills',
      credit: 'Corrie Vale Planetarium (demo)',
    });
    expect(res.status).toBe(201);
    body = res.body.data;
  });

  it('stands the image upright and makes every rendition in three formats', () => {
    // EXIF orientation 6 turns a 1200 × 800 landscape into an 800 × 1200 portrait.
    expect([body.width, body.height]).toEqual([800, 1200]);
    expect(body.renditionsStatus).toBe('ready');
    expect(body.renditions).toHaveLength(12);
    const size = (name: string) => body.renditions.filter((r) => r.name === name).map((r) => [r.width, r.height]);
    expect(size('thumbnail')).toEqual([
      [267, 400],
      [267, 400],
      [267, 400],
    ]);
    // Never enlarged: the page rendition stays at the original's size.
    expect(size('page')).toEqual([
      [800, 1200],
      [800, 1200],
      [800, 1200],
    ]);
    // Kiosk crops keep 16:9 at the largest size the image allows (800 wide), never upscaled to 1920.
    expect(size('kiosk-hd')[0]).toEqual([800, 450]);
    expect(size('kiosk-4k')[0]).toEqual([800, 450]);
    expect(body.missing).toEqual(['licence', 'sourceUrl']);
  });

  it('strips EXIF, GPS and every other metadata from every rendition', async () => {
    for (const r of body.renditions) {
      const meta = await sharp(await fetchRendition(r.url)).metadata();
      expect(meta.exif, `${r.name}.${r.format}`).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.iptc).toBeUndefined();
      expect(meta.orientation ?? 1).toBe(1);
      expect([meta.width, meta.height]).toEqual([r.width, r.height]);
    }
  });

  it('keeps the original byte for byte, privately, under its SHA-256', async () => {
    const hash = sha256(photo);
    const original = path.join(config.uploadsDir, 'originals', `${hash}.jpg`);
    expect(fs.readFileSync(original).equals(photo)).toBe(true);
    expect((await Media.findByPk(body.id))!.sha256).toBe(hash);
    // No URL reaches it: not its name under /media/files, not a path outside renditions/.
    const app = supertest(await getTestApp());
    for (const url of [
      `/media/files/${hash}.jpg`,
      `/media/files/..%2Foriginals%2F${hash}.jpg`,
      `/media/originals/${hash}.jpg`,
      `/media/files/originals/${hash}.jpg`,
    ]) {
      expect((await app.get(url)).status, url).toBe(404);
    }
    expect(JSON.stringify(body)).not.toContain(hash);
  });

  it('serves renditions under content-addressed names with year-long immutable caching', async () => {
    const app = supertest(await getTestApp());
    const thumb = body.renditions.find((r) => r.name === 'thumbnail' && r.format === 'webp')!;
    const res = await app.get(thumb.url);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers['content-type']).toBe('image/webp');
    const bytes = await fetchRendition(thumb.url);
    expect(thumb.url).toBe(`/media/files/${sha256(bytes)}.webp`);
    const again = await app.get(thumb.url).set('If-None-Match', res.headers.etag);
    expect(again.status).toBe(304);
  });

  it('records who uploaded what', async () => {
    const event = await AuditEvent.findOne({ where: { action: 'media.uploaded', subjectId: body.id } });
    expect(event?.data).toMatchObject({ fileName: 'Andromeda über Corrie Vale.jpg', width: 800, height: 1200 });
  });

  it('refuses the same file again, naming the copy already in the library', async () => {
    const { agent } = await signedInAgent('reviewer');
    const before = storedFiles().length;
    const res = await upload(agent, photo, 'copy.jpg');
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'duplicate_image' });
    expect(res.body.error.message).toContain('Andromeda über Corrie Vale.jpg');
    expect(await Media.count()).toBe(1);
    expect(storedFiles().length).toBe(before);
  });
});

describe('colour and crops', () => {
  const pixel = async (data: Buffer, x: number, y: number) => {
    const { data: raw, info } = await sharp(data).raw().toBuffer({ resolveWithObject: true });
    const i = (y * info.width + x) * info.channels;
    return [raw[i], raw[i + 1], raw[i + 2]];
  };

  it('converts a CMYK JPEG to sRGB with its colour kept', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await upload(agent, await cmykJpeg(), 'cmyk-print-proof.jpg');
    expect(res.status).toBe(201);
    for (const r of res.body.data.renditions as Rendition[]) {
      const data = await fetchRendition(r.url);
      const meta = await sharp(data).metadata();
      expect(meta.space).toBe('srgb');
      expect(meta.channels).toBe(3);
      // #d01010 went through CMYK and back: red stays dominant (tolerance for the profile round trip, common practice).
      const [red, green, blue] = await pixel(data, 5, 5);
      expect(red).toBeGreaterThan(170);
      expect(green).toBeLessThan(80);
      expect(blue).toBeLessThan(80);
    }
  });

  it('converts a 16-bit PNG to 8 bits per channel with its colour kept', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await upload(agent, await png16(), 'deep-field-16bit.png');
    expect(res.status).toBe(201);
    for (const r of res.body.data.renditions as Rendition[]) {
      const data = await fetchRendition(r.url);
      expect((await sharp(data).metadata()).depth).toBe('uchar');
      // #2050c0 = (32, 80, 192); lossy encoders may move a channel by a few steps (common practice).
      const [red, green, blue] = await pixel(data, 5, 5);
      expect(Math.abs(red - 32)).toBeLessThan(12);
      expect(Math.abs(green - 80)).toBeLessThan(12);
      expect(Math.abs(blue - 192)).toBeLessThan(12);
    }
  });

  it('crops kiosk renditions around the focal point, and moving it re-makes them', async () => {
    const { agent } = await signedInAgent('writer');
    const res = await upload(agent, await halvesImage(), 'halves.png');
    const id = res.body.data.id as string;
    const kioskJpeg = (renditions: Rendition[]) => renditions.find((r) => r.name === 'kiosk-hd' && r.format === 'jpeg')!;
    const centre = kioskJpeg(res.body.data.renditions);
    // 4000 × 1000 cropped to 16:9 keeps 1778 × 1000, shown at that size (not enlarged to 1920).
    expect([centre.width, centre.height]).toEqual([1778, 1000]);

    const right = await agent.patch(`/api/media/${id}`).send({ focalPoint: { x: 0.95, y: 0.5 } });
    expect(right.status).toBe(200);
    expect(right.body.data.renditionsStatus).toBe('ready');
    const rightCrop = await fetchRendition(kioskJpeg(right.body.data.renditions).url);
    expect((await pixel(rightCrop, 10, 500))[2]).toBeGreaterThan(200); // blue at the left edge: the crop sits right

    const left = await agent.patch(`/api/media/${id}`).send({ focalPoint: { x: 0.05, y: 0.5 } });
    const leftCrop = await fetchRendition(kioskJpeg(left.body.data.renditions).url);
    expect((await pixel(leftCrop, 1700, 500))[0]).toBeGreaterThan(200); // red at the right edge: the crop sits left

    // The right-hand crop is no longer used, so its file is gone; the thumbnail (unchanged) stays.
    expect((await supertest(await getTestApp()).get(kioskJpeg(right.body.data.renditions).url)).status).toBe(404);
    expect((await supertest(await getTestApp()).get(left.body.data.thumbnailUrl)).status).toBe(200);
  });
});
