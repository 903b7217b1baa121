import path from 'node:path';
import { MediaLimits } from '@shared/media/limits.ts';
import { config } from '../config.ts';

/** Imagery settings from the environment, read once. */
export interface MediaSettings {
  /** Largest upload accepted (STARPROOF_UPLOAD_MAX_MB, default 100 MB). */
  uploadMaxBytes: number;
  /** Most pixels an image may declare (STARPROOF_UPLOAD_MAX_MEGAPIXELS, default 100 MP). */
  maxPixels: number;
  /** Where uploads are streamed while they are checked; always on this machine. */
  tmpDir: string;
  /**
   * When renditions sit behind a CDN (STARPROOF_MEDIA_PUBLIC_URL, e.g. https://cdn.example.org),
   * their URLs point there; otherwise this server streams them under /media/files/.
   */
  publicBaseUrl: string | null;
}

function positive(value: string | undefined, fallback: number, name: string): number {
  if (value === undefined || value === '') return fallback;
  const n = Number(value);
  if (!Number.isFinite(n) || n <= 0) throw new Error(`${name} must be a positive number, not "${value}".`);
  return n;
}

let cached: MediaSettings | undefined;

/** The current imagery settings. */
export function mediaSettings(): MediaSettings {
  cached ??= {
    uploadMaxBytes: Math.round(
      positive(process.env.STARPROOF_UPLOAD_MAX_MB, MediaLimits.defaultUploadMaxMb, 'STARPROOF_UPLOAD_MAX_MB') * 1024 * 1024,
    ),
    maxPixels: Math.round(
      positive(process.env.STARPROOF_UPLOAD_MAX_MEGAPIXELS, MediaLimits.defaultMaxMegapixels, 'STARPROOF_UPLOAD_MAX_MEGAPIXELS') *
        1_000_000,
    ),
    tmpDir: path.join(config.uploadsDir, 'tmp'),
    publicBaseUrl: process.env.STARPROOF_MEDIA_PUBLIC_URL?.replace(/\/+$/, '') || null,
  };
  return cached;
}
