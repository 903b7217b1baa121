import type { Readable } from 'node:stream';
import { config } from '../config.ts';
import { LocalStorage } from './local-storage.ts';
import { S3Storage, type S3Settings } from './s3-storage.ts';

/** How a stored file is written. */
export interface PutOptions {
  contentType: string;
  /** Sent with the file by object stores and CDNs (renditions are immutable). */
  cacheControl?: string;
}

/**
 * Where image files live. Keys look like `originals/<sha256>.<ext>` or `renditions/<sha256>.<ext>`;
 * both drivers refuse any other shape, so a key can never reach outside its folder or bucket prefix.
 */
export interface MediaStorage {
  readonly driver: 'local' | 's3';
  /** Stores a file from disk; a key that already exists is left alone (same name, same bytes). */
  putFile(key: string, filePath: string, options: PutOptions): Promise<void>;
  /** Stores bytes from memory, with the same rule. */
  putBuffer(key: string, body: Buffer, options: PutOptions): Promise<void>;
  /** Opens a stored file, or null when there is none. */
  read(key: string): Promise<{ stream: Readable; bytes: number } | null>;
  exists(key: string): Promise<boolean>;
  /** Removes a file; removing a missing file is not an error. */
  delete(key: string): Promise<void>;
}

const KEY_PATTERN = /^(originals|renditions)\/[0-9a-f]{64}\.[a-z0-9]{2,5}$/;

/**
 * Refuses keys that are not ours.
 * @throws Error for any other shape
 */
export function assertKey(key: string): void {
  if (!KEY_PATTERN.test(key)) throw new Error(`Not a media storage key: ${JSON.stringify(key)}`);
}

/** The storage settings from the configuration: STARPROOF_STORAGE=local (default) or s3. */
export function storageSettingsFromConfig(): { driver: 'local'; root: string } | ({ driver: 's3' } & S3Settings) {
  const { driver, bucket, ...s3 } = config.storage;
  if (driver === 'local') return { driver, root: config.uploadsDir };
  if (!bucket) throw new Error('STARPROOF_STORAGE=s3 needs STARPROOF_S3_BUCKET.');
  return { driver, bucket, ...s3 };
}

/** Builds a driver from settings. */
export function createStorage(settings: ReturnType<typeof storageSettingsFromConfig>): MediaStorage {
  return settings.driver === 'local' ? new LocalStorage(settings.root) : new S3Storage(settings);
}

let current: MediaStorage | undefined;

/** The configured storage, created on first use so the environment can be set before it. */
export function getStorage(): MediaStorage {
  current ??= createStorage(storageSettingsFromConfig());
  return current;
}
