import fsp from 'node:fs/promises';
import path from 'node:path';
import { logger } from '../../logger.ts';
import { INSTANCE_TAG, instanceGone } from '../../media/instance.ts';
import { mediaSettings } from '../../media/settings.ts';
import { settleFiles, staleNotes } from './media-file-journal.ts';

/** What a sweep found. */
export interface SweepReport {
  /** Temporary upload files removed. */
  temporary: number;
  /** Noted files settled (removed unless a row uses them). */
  settled: number;
}

/** Removes a temporary file last written before the cut-off; returns how many files went (0 or 1). */
async function removeIfOlder(file: string, cutoff: number): Promise<number> {
  const stat = await fsp.stat(file).catch(() => null);
  if (!stat?.isFile() || stat.mtimeMs >= cutoff) return 0;
  await fsp.rm(file, { force: true });
  return 1;
}

/**
 * Clears what a crash can leave behind: temporary upload files, and stored files noted in the
 * journal but never settled (an upload or re-render cut short, a delete whose files were not all
 * removed). It never lists the storage, so it cannot touch files another database owns even when
 * two installations share a folder or bucket. What a server on this machine left when it crashed
 * or was killed goes at once; other young entries are kept, since another server may be in the
 * middle of that upload. Call once at start-up, after migrations.
 * @param options.graceMs how old an entry must be before it is cleared (default 15 minutes)
 */
export async function sweepOrphanMedia({ graceMs = 15 * 60_000 }: { graceMs?: number } = {}): Promise<SweepReport> {
  const cutoff = Date.now() - graceMs;
  const report: SweepReport = { temporary: 0, settled: 0 };

  const tmpDir = mediaSettings().tmpDir;
  for (const entry of await fsp.readdir(tmpDir, { withFileTypes: true }).catch(() => [])) {
    const where = path.join(tmpDir, entry.name);
    if (entry.isFile()) report.temporary += await removeIfOlder(where, cutoff);
    if (!entry.isDirectory() || entry.name === INSTANCE_TAG) continue;
    // A process folder: all of it when that server is gone, else only what outlived the grace period.
    const gone = instanceGone(entry.name);
    for (const name of await fsp.readdir(where).catch(() => [] as string[])) {
      report.temporary += await removeIfOlder(path.join(where, name), gone ? Infinity : cutoff);
    }
    const folder = await fsp.stat(where).catch(() => null);
    if (gone || (folder && folder.mtimeMs < cutoff)) await fsp.rmdir(where).catch(() => undefined);
  }

  const stale = await staleNotes(new Date(cutoff));
  await settleFiles(stale);
  report.settled = stale.length;
  if (report.temporary + report.settled > 0) logger.info({ report }, 'cleared media left over from an interrupted run');
  return report;
}
