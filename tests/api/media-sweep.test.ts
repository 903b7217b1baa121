import { spawnSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it, vi } from 'vitest';

vi.hoisted(() => {
  process.env.UPLOADS_DIR ??= '.data/test-uploads';
});

import fs from 'node:fs';
import path from 'node:path';
import { config } from '../../server/config.ts';
import { getSequelize } from '../../server/db.ts';
import { INSTANCE_TAG, instanceGone } from '../../server/media/instance.ts';
import { sweepOrphanMedia } from '../../server/services/media/media-sweep.ts';
import { getTestApp } from '../support/app.ts';

const host = INSTANCE_TAG.replace(/_\d+_\d+$/, '');
// A process that has run and exited (and been reaped): its pid is not running.
const deadPid = spawnSync(process.execPath, ['-e', '']).pid!;

/** A young temporary file in a process folder, and a young journal note (with its stored file) signed by that process. */
async function leftBy(tag: string) {
  const tmpFile = path.join(config.uploadsDir, 'tmp', tag, `upload-${randomUUID()}`);
  fs.mkdirSync(path.dirname(tmpFile), { recursive: true });
  fs.writeFileSync(tmpFile, 'partial upload');
  const key = `originals/${randomUUID().replace(/-/g, '')}${'0'.repeat(32)}.jpg`;
  fs.mkdirSync(path.join(config.uploadsDir, 'originals'), { recursive: true });
  fs.writeFileSync(path.join(config.uploadsDir, key), 'stored, never given a row');
  await getSequelize().query('INSERT INTO media_file_intents (storage_key, created_at, owner) VALUES (:key, now(), :tag)', {
    replacements: { key, tag },
  });
  const noted = async () =>
    (await getSequelize().query('SELECT 1 FROM media_file_intents WHERE storage_key = :key', { replacements: { key } }))[0]
      .length === 1;
  return { tmpFile, stored: path.join(config.uploadsDir, key), noted };
}

beforeAll(async () => {
  await getTestApp();
});

describe('the start-up sweep and the server that left things behind', () => {
  it('tells a gone server on this machine from a live one or another machine', () => {
    expect(instanceGone(INSTANCE_TAG)).toBe(false);
    expect(instanceGone(`${host}_${deadPid}_1`)).toBe(true);
    expect(instanceGone(`${host}_${process.pid}_1`)).toBe(true); // an earlier life of this pid
    expect(instanceGone(`${host}_${process.ppid}_1`)).toBe(false);
    expect(instanceGone(`another-machine.example_${deadPid}_1`)).toBe(false);
    expect(instanceGone(null)).toBe(false);
    expect(instanceGone('upload-1234')).toBe(false);
  });

  it('clears at once what a killed server left, and keeps the young leftovers of servers that may still be working', async () => {
    const killed = await leftBy(`${host}_${deadPid}_${Date.now() - 5_000}`);
    const earlierLife = await leftBy(`${host}_${process.pid}_${Date.now() - 60_000}`);
    const live = await leftBy(`${host}_${process.ppid}_${Date.now() - 60_000}`);
    const elsewhere = await leftBy(`another-machine.example_${deadPid}_${Date.now() - 5_000}`);

    const report = await sweepOrphanMedia();
    expect(report.temporary).toBeGreaterThanOrEqual(2);
    for (const gone of [killed, earlierLife]) {
      expect(fs.existsSync(gone.tmpFile)).toBe(false);
      expect(fs.existsSync(path.dirname(gone.tmpFile))).toBe(false);
      expect(fs.existsSync(gone.stored)).toBe(false);
      expect(await gone.noted()).toBe(false);
    }
    for (const kept of [live, elsewhere]) {
      expect(fs.existsSync(kept.tmpFile)).toBe(true);
      expect(fs.existsSync(kept.stored)).toBe(true);
      expect(await kept.noted()).toBe(true);
    }
    // Past the grace period they go as well.
    await sweepOrphanMedia({ graceMs: 0 });
    for (const late of [live, elsewhere]) {
      expect(fs.existsSync(late.tmpFile)).toBe(false);
      expect(fs.existsSync(late.stored)).toBe(false);
      expect(await late.noted()).toBe(false);
    }
  });
});
