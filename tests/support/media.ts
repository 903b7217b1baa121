import { deflateSync, crc32 } from 'node:zlib';
import fs from 'node:fs';
import path from 'node:path';
import sharp from 'sharp';
import type { Agent } from 'supertest';
import { config } from '../../server/config.ts';

/** Solid colour image of the given size in a format, made by sharp (no files on disk). */
export async function solidImage(
  width: number,
  height: number,
  colour: string,
  format: 'jpeg' | 'png' | 'webp' = 'jpeg',
): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: colour } })
    [format]()
    .toBuffer();
}

/** A photo-like JPEG with a gradient, an EXIF orientation of 6 (rotate 90° clockwise), a camera model and a GPS position. */
export async function photoWithExif(width = 1200, height = 800): Promise<Buffer> {
  const gradient = Buffer.alloc(width * height * 3);
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const i = (y * width + x) * 3;
      gradient[i] = Math.round((255 * x) / width);
      gradient[i + 1] = Math.round((255 * y) / height);
      gradient[i + 2] = 90;
    }
  }
  return sharp(gradient, { raw: { width, height, channels: 3 } })
    .jpeg({ quality: 85 })
    .withExif({
      IFD0: { Make: 'Corrie Vale Observatory (demo)', Model: 'Demo Camera 1' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '54/1 37/1 12/1', GPSLongitudeRef: 'W', GPSLongitude: '2/1 57/1 0/1' },
    })
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** A wide image, left half red and right half blue, to see which side a crop kept. */
export async function halvesImage(width = 4000, height = 1000): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: '#0000ff' } })
    .composite([{ input: { create: { width: width / 2, height, channels: 3, background: '#ff0000' } }, left: 0, top: 0 }])
    .png()
    .toBuffer();
}

/** A CMYK JPEG of a strong red. */
export async function cmykJpeg(): Promise<Buffer> {
  return sharp({ create: { width: 640, height: 480, channels: 3, background: '#d01010' } })
    .toColourspace('cmyk')
    .jpeg()
    .toBuffer();
}

/** A 16-bit-per-channel PNG of a mid blue. */
export async function png16(): Promise<Buffer> {
  return sharp({ create: { width: 640, height: 480, channels: 3, background: '#2050c0' } })
    .toColourspace('rgb16')
    .png()
    .toBuffer();
}

/** An animated image of two frames (GIF or WebP). */
export async function animated(format: 'gif' | 'webp'): Promise<Buffer> {
  const frames = await Promise.all(['#ffffff', '#000000'].map((c) => solidImage(64, 64, c, 'png')));
  return sharp(frames, { join: { animated: true } })
    [format]({ delay: [100, 100], loop: 0 })
    .toBuffer();
}

function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

/**
 * A PNG whose header declares width × height pixels while the file is tiny: a decompression bomb
 * as far as any decoder that trusts the header is concerned.
 */
export function declaredHugePng(width = 30_000, height = 30_000): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.writeUInt8(8, 8); // bit depth
  ihdr.writeUInt8(0, 9); // greyscale
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.alloc(width + 1))),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

/** Uploads one file as the browser's form would. */
export function upload(agent: Agent, data: Buffer, fileName: string, fields: Record<string, string> = {}) {
  let req = agent.post('/api/media');
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  // `filepath` makes form-data send the name as given (with `filename` it would keep only the base name).
  return req.attach('file', data, { filepath: fileName, contentType: 'application/octet-stream' } as unknown as {
    filename: string;
  });
}

/** Every file under the uploads folder (originals, renditions, tmp), relative to it. */
export function storedFiles(root = config.uploadsDir): string[] {
  if (!fs.existsSync(root)) return [];
  return fs
    .readdirSync(root, { recursive: true, withFileTypes: true })
    .filter((e) => e.isFile() && e.name !== '.gitkeep')
    .map((e) => path.relative(root, path.join(e.parentPath, e.name)));
}

/** Empties the uploads folder this run uses (UPLOADS_DIR; never the development uploads/ when it is set). */
export function clearUploads(root = config.uploadsDir): void {
  fs.rmSync(root, { recursive: true, force: true });
  fs.mkdirSync(root, { recursive: true });
}
