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

let cached: MediaSettings | undefined;

/** The current imagery settings. */
export function mediaSettings(): MediaSettings {
  if (cached) return cached;
  const { media } = config;
  cached = {
    uploadMaxBytes: Math.round((media.uploadMaxMb ?? MediaLimits.defaultUploadMaxMb) * 1024 * 1024),
    maxPixels: Math.round((media.maxMegapixels ?? MediaLimits.defaultMaxMegapixels) * 1_000_000),
    tmpDir: path.join(config.uploadsDir, 'tmp'),
    publicBaseUrl: media.publicUrl,
  };
  return cached;
}
