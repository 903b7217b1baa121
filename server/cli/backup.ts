import path from 'node:path';
import { writeBackup } from '../backup/archive.ts';
import { config } from '../config.ts';
import { startLocalPostgres } from '../db/local-postgres.ts';

// npm run backup [-- archive.tar.gz]: the database and the uploads in one archive.
const target =
  process.argv[2] ?? path.join('.data', 'backups', `starproof-${new Date().toISOString().replace(/[:.]/g, '-')}.tar.gz`);
// With a read replica the dump is taken there (DATABASE_READ_URL), so the primary serves on undisturbed.
const url = config.databaseReadUrl ?? config.databaseUrl ?? (await startLocalPostgres(config.localPostgres));
const manifest = writeBackup(url, config.uploadsDir, target);
console.log(`Backup written to ${target} (database ${manifest.database}, ${manifest.uploadsFiles} uploaded files).`);
