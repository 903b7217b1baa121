import { describe, expect, it } from 'vitest';
import { LICENCES } from '../../../shared/media/licences.ts';
import { coverCrop, fitInside } from '../../../server/media/crop.ts';
import { sniffImage } from '../../../server/media/sniff.ts';

describe('kiosk crops', () => {
  const hd = { width: 1920, height: 1080 };
  it('keeps the whole height of a wide image and slides the window to the focal point', () => {
    expect(coverCrop(6000, 2000, hd, { x: 0.5, y: 0.5 })).toEqual({
      region: { left: 1222, top: 0, width: 3556, height: 2000 },
      output: hd,
    });
    expect(coverCrop(6000, 2000, hd, { x: 1, y: 0.5 }).region.left).toBe(6000 - 3556);
    expect(coverCrop(6000, 2000, hd, { x: 0, y: 0.5 }).region.left).toBe(0);
  });

  it('keeps the whole width of a tall image and never enlarges a small one', () => {
    expect(coverCrop(800, 1200, hd, { x: 0.5, y: 0.2 })).toEqual({
      region: { left: 0, top: 15, width: 800, height: 450 },
      output: { width: 800, height: 450 },
    });
  });

  it('fits inside a box without enlarging', () => {
    expect(fitInside(6000, 4000, { width: 1600, height: 1600 })).toEqual({ width: 1600, height: 1067 });
    expect(fitInside(300, 200, { width: 400, height: 400 })).toEqual({ width: 300, height: 200 });
  });
});

describe('content sniffing', () => {
  // Magic numbers from each format's specification (JPEG SOI, PNG signature, GIF87a/89a, RIFF…WEBP, ISO BMFF ftyp).
  it.each([
    [[0xff, 0xd8, 0xff, 0xe0], 'jpeg'],
    [[0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a], 'png'],
    [Buffer.from('GIF89a'), 'gif'],
    [Buffer.concat([Buffer.from('RIFF'), Buffer.alloc(4), Buffer.from('WEBP')]), 'webp'],
    [Buffer.from('II*\0'), 'tiff'],
    [Buffer.concat([Buffer.alloc(4), Buffer.from('ftypavif')]), 'avif'],
  ])('recognises %j as %s', (bytes, format) => {
    expect(sniffImage(Buffer.from(bytes as number[]))).toEqual({ format });
  });

  it('refuses SVG (with a BOM, white space or a doctype), HEIC and everything else', () => {
    expect(sniffImage(Buffer.from('\uFEFF\n  <svg xmlns="http://www.w3.org/2000/svg"/>'))).toEqual({ refused: 'svg' });
    expect(sniffImage(Buffer.from('<!DOCTYPE svg PUBLIC "-//W3C//DTD SVG 1.1//EN"><svg/>'))).toEqual({ refused: 'svg' });
    expect(sniffImage(Buffer.concat([Buffer.alloc(4), Buffer.from('ftypheic')]))).toEqual({ refused: 'heic' });
    expect(sniffImage(Buffer.from('%PDF-1.7'))).toEqual({ refused: 'unknown' });
    expect(sniffImage(Buffer.alloc(0))).toEqual({ refused: 'unknown' });
  });
});

describe('licences', () => {
  it('has the nine licences, with the Creative Commons deed URLs', () => {
    expect(LICENCES.map((l) => l.label)).toEqual([
      'CC0 1.0 (public domain dedication)',
      'CC BY 4.0',
      'CC BY-SA 4.0',
      'CC BY-NC 4.0',
      'CC BY-NC-SA 4.0',
      'CC BY-ND 4.0',
      'CC BY-NC-ND 4.0',
      'Public domain',
      'All rights reserved, used with permission',
    ]);
    // Deed URL pattern as published by Creative Commons (creativecommons.org/licenses/<code>/4.0/).
    expect(LICENCES.find((l) => l.id === 'cc-by-nc-sa-4.0')!.url).toBe('https://creativecommons.org/licenses/by-nc-sa/4.0/');
  });
});
