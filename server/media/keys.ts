import { createHash } from 'node:crypto';
import { FORMAT_FILES, type RenditionFormat } from '@shared/media/renditions.ts';
import { mediaSettings } from './settings.ts';
import type { SniffedFormat } from './sniff.ts';

const ORIGINAL_EXT: Record<SniffedFormat, string> = {
  jpeg: 'jpg',
  png: 'png',
  gif: 'gif',
  webp: 'webp',
  tiff: 'tif',
  avif: 'avif',
};
const ORIGINAL_MIME: Record<SniffedFormat, string> = {
  jpeg: 'image/jpeg',
  png: 'image/png',
  gif: 'image/gif',
  webp: 'image/webp',
  tiff: 'image/tiff',
  avif: 'image/avif',
};

/** Renditions never change under their name, so browsers and CDNs may keep them for a year. */
export const IMMUTABLE_CACHE = 'public, max-age=31536000, immutable';

/** The private key of an original: named by the SHA-256 of its bytes. */
export function originalKey(sha256: string, format: SniffedFormat): string {
  return `originals/${sha256}.${ORIGINAL_EXT[format]}`;
}

/** The MIME type of an original. */
export function originalMime(format: SniffedFormat): string {
  return ORIGINAL_MIME[format];
}

/** The public key of a rendition: named by the SHA-256 of its bytes, so new bytes get a new name. */
export function renditionKey(data: Buffer, format: RenditionFormat): string {
  return `renditions/${createHash('sha256').update(data).digest('hex')}.${FORMAT_FILES[format].ext}`;
}

/** MIME types of the files served publicly, by extension. */
export const RENDITION_MIME_BY_EXT: Record<string, string> = Object.fromEntries(
  Object.values(FORMAT_FILES).map((f) => [f.ext, f.mime]),
);

/** The URL a rendition is shown at: this server's /media/files/, or the CDN when one is configured. */
export function renditionUrl(key: string): string {
  const base = mediaSettings().publicBaseUrl;
  return base ? `${base}/${key}` : `/media/files/${key.slice('renditions/'.length)}`;
}
