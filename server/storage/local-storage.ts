import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import fsp from 'node:fs/promises';
import path from 'node:path';
import { assertKey, type MediaStorage, type PutOptions } from './storage.ts';

/** Files in a folder on this machine (`uploads/` by default, UPLOADS_DIR to move it). */
export class LocalStorage implements MediaStorage {
  readonly driver = 'local' as const;

  constructor(readonly root: string) {}

  private pathOf(key: string): string {
    assertKey(key);
    return path.join(this.root, key);
  }

  async putFile(key: string, filePath: string, _options: PutOptions): Promise<void> {
    await this.write(key, (partial) => fsp.copyFile(filePath, partial));
  }

  async putBuffer(key: string, body: Buffer, _options: PutOptions): Promise<void> {
    await this.write(key, (partial) => fsp.writeFile(partial, body));
  }

  // Written in tmp/ (same file system) and renamed, so a reader never sees half a file and a
  // crash leaves its remains where the start-up sweep clears them.
  private async write(key: string, fill: (partial: string) => Promise<void>): Promise<void> {
    const target = this.pathOf(key);
    if (await this.exists(key)) return;
    await fsp.mkdir(path.dirname(target), { recursive: true });
    await fsp.mkdir(path.join(this.root, 'tmp'), { recursive: true });
    const partial = path.join(this.root, 'tmp', `store-${randomBytes(8).toString('hex')}.part`);
    try {
      await fill(partial);
      await fsp.rename(partial, target);
    } finally {
      await fsp.rm(partial, { force: true });
    }
  }

  async read(key: string): Promise<{ stream: fs.ReadStream; bytes: number } | null> {
    const file = this.pathOf(key);
    const stat = await fsp.stat(file).catch(() => null);
    if (!stat?.isFile()) return null;
    return { stream: fs.createReadStream(file), bytes: stat.size };
  }

  async exists(key: string): Promise<boolean> {
    return fsp.stat(this.pathOf(key)).then(
      (s) => s.isFile(),
      () => false,
    );
  }

  async delete(key: string): Promise<void> {
    await fsp.rm(this.pathOf(key), { force: true });
  }
}
