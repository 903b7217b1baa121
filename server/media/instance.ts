import os from 'node:os';
import path from 'node:path';
import { mediaSettings } from './settings.ts';

const started = Date.now();
const host =
  os
    .hostname()
    .replace(/[^A-Za-z0-9.-]/g, '-')
    .slice(0, 100) || 'host';

/**
 * This server process (machine, pid, start time), signed on the temporary files and journal notes
 * it leaves while it works, so the next start can tell a crashed server's leftovers from a live one's.
 */
export const INSTANCE_TAG = `${host}_${process.pid}_${started}`;

/** Where this process streams uploads while they are checked: its own folder under uploads/tmp. */
export const instanceTmpDir = (): string => path.join(mediaSettings().tmpDir, INSTANCE_TAG);

/**
 * Whether a tag names a process on this machine that is no longer running (it crashed or was
 * killed), so what it left can go at once. Another machine's tag, or a pid that is running (perhaps
 * reused by another program), is not known to be gone: the sweep's grace period covers those.
 * @param tag an INSTANCE_TAG, or null for notes written before tags existed
 */
export function instanceGone(tag: string | null): boolean {
  const match = /^(.+)_(\d+)_(\d+)$/.exec(tag ?? '');
  if (!match || match[1] !== host) return false;
  const pid = Number(match[2]);
  // Our own pid with another start time: an earlier life of this server (a container's pid 1).
  if (pid === process.pid) return Number(match[3]) !== started;
  try {
    process.kill(pid, 0);
    return false;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'ESRCH';
  }
}
