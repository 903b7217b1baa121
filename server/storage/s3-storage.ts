import fs from 'node:fs';
import fsp from 'node:fs/promises';
import type { Readable } from 'node:stream';
import {
  DeleteObjectCommand,
  GetObjectCommand,
  HeadObjectCommand,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { assertKey, type MediaStorage, type PutOptions } from './storage.ts';

/** Where the bucket is. Credentials come from the SDK's usual chain (AWS_ACCESS_KEY_ID …) unless given. */
export interface S3Settings {
  bucket: string;
  region: string;
  /** For S3-compatible stores (MinIO, Ceph, R2 …); unset for AWS itself. */
  endpoint?: string;
  forcePathStyle?: boolean;
  /** Keys are stored under this prefix, e.g. `starproof/`, so one bucket can serve several uses. */
  prefix?: string;
  credentials?: { accessKeyId: string; secretAccessKey: string };
}

const isMissing = (err: unknown) =>
  err instanceof S3ServiceException &&
  (err.$metadata.httpStatusCode === 404 || err.name === 'NoSuchKey' || err.name === 'NotFound');

/** Files in an S3-compatible bucket, through @aws-sdk/client-s3. */
export class S3Storage implements MediaStorage {
  readonly driver = 's3' as const;
  private readonly client: S3Client;
  private readonly prefix: string;

  constructor(private readonly settings: S3Settings) {
    this.prefix = settings.prefix ?? '';
    this.client = new S3Client({
      region: settings.region,
      endpoint: settings.endpoint,
      forcePathStyle: settings.forcePathStyle,
      credentials: settings.credentials,
      // Newer SDKs add streaming checksums that many S3-compatible stores do not understand;
      // only send them when the operation requires one.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
  }

  private objectKey(key: string): string {
    assertKey(key);
    return `${this.prefix}${key}`;
  }

  async putFile(key: string, filePath: string, options: PutOptions): Promise<void> {
    if (await this.exists(key)) return;
    const { size } = await fsp.stat(filePath);
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.settings.bucket,
        Key: this.objectKey(key),
        Body: fs.createReadStream(filePath),
        ContentLength: size,
        ContentType: options.contentType,
        CacheControl: options.cacheControl,
      }),
    );
  }

  async putBuffer(key: string, body: Buffer, options: PutOptions): Promise<void> {
    if (await this.exists(key)) return;
    await this.client.send(
      new PutObjectCommand({
        Bucket: this.settings.bucket,
        Key: this.objectKey(key),
        Body: body,
        ContentType: options.contentType,
        CacheControl: options.cacheControl,
      }),
    );
  }

  async read(key: string): Promise<{ stream: Readable; bytes: number } | null> {
    try {
      const out = await this.client.send(new GetObjectCommand({ Bucket: this.settings.bucket, Key: this.objectKey(key) }));
      return { stream: out.Body as Readable, bytes: out.ContentLength ?? 0 };
    } catch (err) {
      if (isMissing(err)) return null;
      throw err;
    }
  }

  async exists(key: string): Promise<boolean> {
    try {
      await this.client.send(new HeadObjectCommand({ Bucket: this.settings.bucket, Key: this.objectKey(key) }));
      return true;
    } catch (err) {
      if (isMissing(err)) return false;
      throw err;
    }
  }

  async delete(key: string): Promise<void> {
    await this.client.send(new DeleteObjectCommand({ Bucket: this.settings.bucket, Key: this.objectKey(key) }));
  }

  /** Closes the client's sockets (tests, shutdown). */
  destroy(): void {
    this.client.destroy();
  }
}
