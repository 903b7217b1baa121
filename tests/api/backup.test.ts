import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { beforeAll, describe, expect, it } from 'vitest';
import { restoreBackup, writeBackup } from '../../server/backup/archive.ts';
import { ensureDatabase } from '../../server/db/local-postgres.ts';
import { buildUser, getTestApp, resetDatabase } from '../support/app.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

async function snapshot(url: string) {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const tables = (
      await client.query("SELECT tablename FROM pg_tables WHERE schemaname = 'public' ORDER BY tablename")
    ).rows.map((r) => r.tablename as string);
    const counts: Record<string, number> = {};
    for (const t of tables) counts[t] = (await client.query(`SELECT count(*)::int AS n FROM "${t}"`)).rows[0].n;
    const users = (await client.query('SELECT id, email, name, role, password_hash FROM users ORDER BY email')).rows;
    return { tables, counts, users };
  } finally {
    await client.end();
  }
}

describe('backup and restore', () => {
  it('round-trips the database and the uploads into an empty database', async () => {
    await buildUser({ role: 'admin', name: 'Backup Admin' });
    await buildUser({ role: 'writer', name: 'Backup Writer' });
    const work = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-backup-test-'));
    const uploads = path.join(work, 'uploads');
    fs.mkdirSync(path.join(uploads, 'originals'), { recursive: true });
    fs.writeFileSync(path.join(uploads, 'originals', 'abc.jpg'), Buffer.from([0xff, 0xd8, 0xff, 0xd9]));
    const sourceUrl = process.env.DATABASE_URL!;
    const archive = path.join(work, 'backup.tar.gz');

    const manifest = writeBackup(sourceUrl, uploads, archive);
    expect(manifest.uploadsFiles).toBe(1);

    const target = new URL(sourceUrl);
    target.pathname = '/starproof_restore_test';
    await ensureDatabase({ port: Number(target.port), database: 'starproof_restore_test' }, { recreate: true });
    const restoredUploads = path.join(work, 'restored-uploads');
    await restoreBackup(archive, target.toString(), restoredUploads);

    expect(await snapshot(target.toString())).toEqual(await snapshot(sourceUrl));
    expect(fs.readFileSync(path.join(restoredUploads, 'originals', 'abc.jpg'))).toEqual(
      fs.readFileSync(path.join(uploads, 'originals', 'abc.jpg')),
    );

    // A second restore into the now non-empty database is refused, not merged.
    await expect(restoreBackup(archive, target.toString(), restoredUploads)).rejects.toThrow(/not empty/);
    fs.rmSync(work, { recursive: true, force: true });
  });

  it('refuses a file that is not a backup', async () => {
    const work = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-backup-test-'));
    const bogus = path.join(work, 'bogus.tar.gz');
    fs.writeFileSync(path.join(work, 'note.txt'), 'hello');
    const { spawnSync } = await import('node:child_process');
    spawnSync('tar', ['-czf', bogus, '-C', work, 'note.txt']);
    await expect(restoreBackup(bogus, process.env.DATABASE_URL!, path.join(work, 'u'))).rejects.toThrow(/not a Starproof backup/);
    fs.rmSync(work, { recursive: true, force: true });
  });
});
