import os from 'node:os';
import { Piscina } from 'piscina';
import { config } from '../config.ts';
import { HttpError } from '../errors.ts';

let pool: Piscina | undefined;

/** How many hashes may run at once: one thread per core but one, at least one, at most the setting. */
function threadCount(): number {
  return Math.max(1, Math.min(config.passwordHashThreads, os.availableParallelism() - 1 || 1));
}

function getPool(): Piscina {
  pool ??= new Piscina({
    filename: new URL('./hash-worker.mjs', import.meta.url).href,
    minThreads: 0,
    maxThreads: threadCount(),
    maxQueue: config.passwordHashQueue,
    idleTimeout: 30_000,
    // The worker is plain JavaScript: no TypeScript loader needed in the thread.
    execArgv: [],
  });
  return pool;
}

/** Seconds a refused caller is told to wait: about the time the queue ahead takes to drain. */
export const BUSY_RETRY_SECONDS = 5;

/**
 * Runs one bcrypt job in the worker pool, off the thread that answers requests. When the queue is
 * full the job is refused at once (429 `busy` with Retry-After) instead of waiting for many seconds.
 * @throws HttpError 429 `busy`
 */
export async function runHashJob<R>(
  task: { op: 'hash'; password: string; cost: number } | { op: 'compare'; password: string; hash: string },
): Promise<R> {
  try {
    return (await getPool().run(task)) as R;
  } catch (err) {
    if (err instanceof Error && /queue is at limit|No task queue available/i.test(err.message))
      throw new HttpError(429, 'busy', 'Too many people are signing in at this moment. Try again in a few seconds.', undefined, {
        retryAfterSeconds: BUSY_RETRY_SECONDS,
      });
    throw err;
  }
}

/** How many hash jobs the pool has finished since it started (tests count comparisons with it). */
export function hashJobsCompleted(): number {
  return pool?.completed ?? 0;
}

/** Stops the worker threads (shutdown, tests). */
export async function closePasswordPool(): Promise<void> {
  const p = pool;
  pool = undefined;
  await p?.destroy();
}
