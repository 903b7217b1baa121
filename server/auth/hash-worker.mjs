// Runs in a worker thread (see password-pool.ts). Plain JavaScript so that it loads the same way
// under tsx, Vitest and plain Node, none of which register a TypeScript loader inside workers alike.
import fs from 'node:fs';
import os from 'node:os';
import bcrypt from 'bcryptjs';

/** The nice value of a hashing thread: below the thread that answers requests (0), which preempts it. */
const HASHING_NICE = 10;

// On Linux a thread is a task with its own id and nice value: this lowers this thread only. A burst
// of sign-ins keeps every hashing thread busy; without this they shared the cores equally with the
// request thread, which then waited for a core with 200 requests in hand. Elsewhere it is skipped.
try {
  const threadId = Number(fs.readlinkSync('/proc/thread-self').split('/').pop());
  if (Number.isInteger(threadId) && threadId > 0) os.setPriority(threadId, HASHING_NICE);
} catch {
  // No /proc (not Linux) or not allowed: the thread keeps the process's priority.
}

/**
 * One hashing job, and how long it took in the thread (the pool judges queue waits from it).
 * @param {{ op: 'hash', password: string, cost: number } | { op: 'compare', password: string, hash: string }} task
 * @returns {Promise<{ result: string | boolean, ms: number }>}
 */
export default async function run(task) {
  const started = performance.now();
  const result =
    task.op === 'hash' ? await bcrypt.hash(task.password, task.cost) : await bcrypt.compare(task.password, task.hash);
  return { result, ms: performance.now() - started };
}
