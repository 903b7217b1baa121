import fs from 'node:fs';
import path from 'node:path';

const TICKS = 100; // USER_HZ on Linux

/**
 * CPU seconds used so far by a local cluster: the postmaster, its live children, and the children
 * it has reaped (Linux /proc).
 * @param dataDir the cluster's folder (its postmaster.pid names the postmaster)
 */
export function postgresCpuSeconds(dataDir: string): number {
  const pid = Number(fs.readFileSync(path.join(dataDir, 'postmaster.pid'), 'utf8').split('\n')[0]);
  const stat = (p: number | string) => fs.readFileSync(`/proc/${p}/stat`, 'utf8').split(') ')[1].split(' ');
  // Fields after the command: state ppid … utime (12th) stime cutime cstime.
  const own = stat(pid);
  let ticks = Number(own[11]) + Number(own[12]) + Number(own[13]) + Number(own[14]);
  for (const entry of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const f = stat(entry);
      if (Number(f[1]) === pid) ticks += Number(f[11]) + Number(f[12]);
    } catch {
      // The process ended meanwhile; the postmaster's cutime has it.
    }
  }
  return ticks / TICKS;
}
