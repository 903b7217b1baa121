import { createHash } from 'node:crypto';
import fs from 'node:fs';
import { pipeline } from 'node:stream/promises';
import sharp from 'sharp';
import { ACCEPTED_IMAGE_TYPES } from '@shared/media/limits.ts';
import { HttpError } from '../errors.ts';
import { sniffFile, type SniffedFormat } from './sniff.ts';

/** What the checks learned about an accepted upload. */
export interface InspectedImage {
  format: SniffedFormat;
  /** Upright size: width and height after the EXIF orientation is applied. */
  width: number;
  height: number;
  sha256: string;
}

const refuse = (code: string, message: string) => new HttpError(400, code, message, { file: message });
const grouped = (n: number) => n.toLocaleString('en-GB');

/**
 * Checks an uploaded file is a whole, still raster image within the pixel limit, reading its
 * content (never its name). Nothing is stored here.
 * @param filePath the temporary file
 * @param bytes its size
 * @param maxPixels the decompression-bomb limit (width × height)
 * @throws HttpError 400 with a code per refusal (empty_file, not_an_image, svg_refused, heic_refused,
 *   too_many_pixels, animated_refused, multi_page_refused, damaged_image)
 */
export async function inspectUpload(filePath: string, bytes: number, maxPixels: number): Promise<InspectedImage> {
  if (bytes === 0)
    throw refuse('empty_file', 'The file is empty (0 bytes). Choose the image again; it may not have finished downloading.');

  const sniffed = await sniffFile(filePath);
  if ('refused' in sniffed) {
    if (sniffed.refused === 'svg') {
      throw refuse(
        'svg_refused',
        'SVG drawings are not accepted, because they can carry scripts and links. Export the drawing as PNG and upload that.',
      );
    }
    if (sniffed.refused === 'heic')
      throw refuse('heic_refused', 'HEIC photos are not accepted. Export the photo as JPEG and upload that.');
    throw refuse(
      'not_an_image',
      `This file is not an image Starproof can read, whatever its name says. Accepted: ${ACCEPTED_IMAGE_TYPES.join(', ')}.`,
    );
  }

  // The header only: nothing is decoded until the declared size has passed the limit.
  const meta = await sharp(filePath, { limitInputPixels: false, failOn: 'none' })
    .metadata()
    .catch(() => {
      throw refuse('damaged_image', 'The image is damaged or incomplete, so it cannot be read. Upload the complete file.');
    });
  const width = meta.autoOrient?.width ?? meta.width;
  const height = meta.autoOrient?.height ?? meta.height;
  if (!width || !height)
    throw refuse('damaged_image', 'The image does not say how large it is, so it cannot be read. Upload the complete file.');
  const pixels = width * height;
  if (pixels > maxPixels) {
    throw refuse(
      'too_many_pixels',
      `This image is ${grouped(width)} × ${grouped(height)} pixels (${grouped(Math.round(pixels / 1e6))} megapixels); the limit is ${grouped(maxPixels / 1e6)} megapixels. Reduce it before uploading.`,
    );
  }
  const pages = meta.pages ?? 1;
  if (pages > 1 && (sniffed.format === 'gif' || sniffed.format === 'webp')) {
    throw refuse(
      'animated_refused',
      'Animated images are not accepted: kiosk slides must not flash or move quickly (WCAG 2.3.1). Upload one still frame as PNG or JPEG.',
    );
  }
  if (pages > 1) throw refuse('multi_page_refused', `This file holds ${pages} pictures. Upload one picture per file.`);

  // A full decode finds what the header cannot: a file cut short, or corrupt compressed data.
  await sharp(filePath, { limitInputPixels: maxPixels, failOn: 'truncated' })
    .resize(64, 64, { fit: 'inside' })
    .raw()
    .toBuffer()
    .catch(() => {
      throw refuse(
        'damaged_image',
        'The image is damaged or incomplete (it may have been cut off while copying). Upload the complete file.',
      );
    });

  return { format: sniffed.format, width, height, sha256: await sha256File(filePath) };
}

/** The SHA-256 of a file, in hex. */
export async function sha256File(filePath: string): Promise<string> {
  const hash = createHash('sha256');
  await pipeline(fs.createReadStream(filePath), hash);
  return hash.digest('hex');
}
