import fsp from 'node:fs/promises';
import path from 'node:path';
import { logger } from '../logger.ts';
import { mediaSettings } from '../media/settings.ts';
import { settleFiles, staleNotes } from './media-file-journal.ts';

/** What a sweep found. */
export interface SweepReport {
  /** Temporary upload files removed. */
  temporary: number;
  /** Noted files settled (removed unless a row uses them). */
  settled: number;
}

/**
 * Clears what a crash can leave behind: temporary upload files on this machine, and stored files
 * noted in the journal but never settled (an upload or re-render cut short, a delete whose files
 * were not all removed). It never lists the storage, so it cannot touch files another database
 * owns even when two installations share a folder or bucket. Young entries are kept: another
 * server may be in the middle of that upload. Call once at start-up, after migrations.
 * @param options.graceMs how old an entry must be before it is cleared (default 15 minutes)
 */
export async function sweepOrphanMedia({ graceMs = 15 * 60_000 }: { graceMs?: number } = {}): Promise<SweepReport> {
  const cutoff = Date.now() - graceMs;
  const report: SweepReport = { temporary: 0, settled: 0 };

  const tmpDir = mediaSettings().tmpDir;
  for (const name of await fsp.readdir(tmpDir).catch(() => [] as string[])) {
    const file = path.join(tmpDir, name);
    const stat = await fsp.stat(file).catch(() => null);
    if (stat?.isFile() && stat.mtimeMs < cutoff) {
      await fsp.rm(file, { force: true });
      report.temporary += 1;
    }
  }

  const stale = await staleNotes(new Date(cutoff));
  await settleFiles(stale);
  report.settled = stale.length;
  if (report.temporary + report.settled > 0) logger.info({ report }, 'cleared media left over from an interrupted run');
  return report;
}
