import { restoreBackup } from '../backup/archive.ts';
import { config } from '../config.ts';
import { startLocalPostgres } from '../db/local-postgres.ts';

// npm run restore -- archive.tar.gz: into an empty database (set DATABASE_URL, or a fresh STARPROOF_PGDATA).
const archive = process.argv[2];
if (!archive) {
  console.error('Usage: npm run restore -- <backup.tar.gz>');
  process.exit(2);
}
const url = config.databaseUrl ?? (await startLocalPostgres(config.localPostgres));
try {
  const manifest = await restoreBackup(archive, url, config.uploadsDir);
  console.log(`Restored the backup of ${manifest.createdAt} (${manifest.uploadsFiles} uploaded files).`);
} catch (error) {
  console.error(error instanceof Error ? error.message : String(error));
  process.exit(1);
}
