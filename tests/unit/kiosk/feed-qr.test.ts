import jsQR from 'jsqr';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { qrFor } from '../../../server/services/publishing/feed-qr.ts';

/** Draws the feed's QR code as the player does (white square, four-module quiet zone, black path) and reads it back. */
async function readBack(path: string, size: number, scale = 8): Promise<string | null> {
  const box = size + 8;
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" viewBox="-4 -4 ${box} ${box}" width="${box * scale}" height="${box * scale}" shape-rendering="crispEdges"><rect x="-4" y="-4" width="${box}" height="${box}" fill="#fff"/><path d="${path}" fill="#000"/></svg>`;
  const { data, info } = await sharp(Buffer.from(svg)).ensureAlpha().raw().toBuffer({ resolveWithObject: true });
  return jsQR(new Uint8ClampedArray(data), info.width, info.height)?.data ?? null;
}

describe('QR codes on object slides', () => {
  it('draw a code that a reader decodes to the page’s public address', async () => {
    for (const url of [
      'http://127.0.0.1:4780/explore/how-far-away-is-the-andromeda-galaxy-demo',
      'https://planetarium.example/explore/3c-279-a-quasar-in-virgo-demo-1a2b3c4d',
    ]) {
      const qr = qrFor(url);
      expect(qr.url).toBe(url);
      expect(await readBack(qr.path, qr.size)).toBe(url);
    }
  });

  it('is made once per address', () => {
    expect(qrFor('https://planetarium.example/explore/a')).toBe(qrFor('https://planetarium.example/explore/a'));
  });
});
