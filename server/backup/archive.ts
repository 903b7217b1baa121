import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { findPgBinary } from '../db/local-postgres.ts';

/** What a backup archive holds besides the dump and the files. */
export interface BackupManifest {
  format: 'starproof-backup';
  version: 1;
  createdAt: string;
  database: string;
  uploadsFiles: number;
}

function run(cmd: string, args: string[], env: NodeJS.ProcessEnv = process.env): void {
  const result = spawnSync(cmd, args, { encoding: 'utf8', env });
  if (result.status !== 0) throw new Error(`${path.basename(cmd)} failed: ${result.stderr || result.stdout}`);
}

function countFiles(dir: string): number {
  if (!fs.existsSync(dir)) return 0;
  return fs.readdirSync(dir, { recursive: true, withFileTypes: true }).filter((e) => e.isFile() && e.name !== '.gitkeep').length;
}

/**
 * Writes one .tar.gz with the database (pg_dump custom format), the uploads folder and a manifest.
 * The dump is consistent (one snapshot); uploads written during the dump may be newer than it.
 * @returns the manifest written
 */
export function writeBackup(databaseUrl: string, uploadsDir: string, archivePath: string): BackupManifest {
  const work = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-backup-'));
  try {
    run(findPgBinary('pg_dump'), [
      '--format=custom',
      '--no-owner',
      '--no-privileges',
      `--file=${path.join(work, 'database.dump')}`,
      databaseUrl,
    ]);
    fs.mkdirSync(path.join(work, 'uploads'));
    if (fs.existsSync(uploadsDir)) fs.cpSync(uploadsDir, path.join(work, 'uploads'), { recursive: true });
    const manifest: BackupManifest = {
      format: 'starproof-backup',
      version: 1,
      createdAt: new Date().toISOString(),
      database: new URL(databaseUrl).pathname.slice(1),
      uploadsFiles: countFiles(uploadsDir),
    };
    fs.writeFileSync(path.join(work, 'manifest.json'), JSON.stringify(manifest, null, 2));
    fs.mkdirSync(path.dirname(path.resolve(archivePath)), { recursive: true });
    run('tar', ['-czf', path.resolve(archivePath), '-C', work, 'manifest.json', 'database.dump', 'uploads']);
    return manifest;
  } finally {
    fs.rmSync(work, { recursive: true, force: true });
  }
}

/**
 * Restores an archive into an empty database and an uploads folder. Refuses a database that already
 * has tables, so a restore never mixes two histories.
 * @throws Error when the archive is not ours or the database is not empty
 */
export async function restoreBackup(archivePath: string, databaseUrl: string, uploadsDir: string): Promise<BackupManifest> {
  const work = fs.mkdtempSync(path.join(os.tmpdir(), 'starproof-restore-'));
  try {
    run('tar', ['-xzf', path.resolve(archivePath), '-C', work]);
    const manifestPath = path.join(work, 'manifest.json');
    if (!fs.existsSync(manifestPath)) throw new Error('This file is not a Starproof backup (no manifest.json).');
    const manifest = JSON.parse(fs.readFileSync(manifestPath, 'utf8')) as BackupManifest;
    if (manifest.format !== 'starproof-backup') throw new Error('This file is not a Starproof backup.');
    const pg = await import('pg');
    const client = new pg.default.Client({ connectionString: databaseUrl });
    await client.connect();
    try {
      const tables = await client.query(
        "SELECT count(*)::int AS n FROM pg_tables WHERE schemaname NOT IN ('pg_catalog','information_schema')",
      );
      if (tables.rows[0].n > 0) throw new Error('The target database is not empty; restore into a new, empty database.');
    } finally {
      await client.end();
    }
    run(findPgBinary('pg_restore'), [
      '--no-owner',
      '--no-privileges',
      '--exit-on-error',
      `--dbname=${databaseUrl}`,
      path.join(work, 'database.dump'),
    ]);
    fs.mkdirSync(uploadsDir, { recursive: true });
    fs.cpSync(path.join(work, 'uploads'), uploadsDir, { recursive: true });
    return manifest;
  } finally {
    fs.rmSync(work, { recursive: true, force: true });
  }
}
