import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import type { StatementLocale } from '@shared/statements/index.ts';
import { logger } from '../../logger.ts';
import { evaluateBatch, type BatchJob, type PreviewChange, type WriteBatchResult } from './evaluate-batch.ts';
import type { WorkerReply } from './evaluation-worker.ts';
import { config } from '../../config.ts';

/**
 * Worker threads that compute statement batches, so a recompute of the whole catalogue uses every
 * core and leaves the server's own thread free for requests and for the database traffic.
 * Size: STARPROOF_STATEMENT_WORKERS (0 computes inline), else one per core up to four. Workers
 * start at the first batch and then wait idle without keeping the process alive.
 */

interface Slot {
  worker: Worker;
  busy: number;
}

interface Pending {
  resolve: (result: WriteBatchResult | PreviewChange[]) => void;
  reject: (error: Error) => void;
  slot: Slot;
}

const WORKER_FILE = new URL('./evaluation-worker.ts', import.meta.url).href;
// A worker does not inherit the TypeScript loader: register it before importing the worker module.
const BOOT = WORKER_FILE.endsWith('.ts')
  ? `import('tsx/esm/api').then(({ register }) => { register(); return import(${JSON.stringify(WORKER_FILE)}); })`
  : `import(${JSON.stringify(WORKER_FILE)})`;

let slots: Slot[] | null = null;
const pending = new Map<number, Pending>();
let nextId = 1;

/** How many workers the pool runs (0: compute inline). */
export function poolSize(): number {
  const configured = config.statementWorkers;
  if (configured !== undefined) return configured;
  return Math.min(availableParallelism(), 4);
}

function startWorker(): Slot {
  const worker = new Worker(BOOT, { eval: true });
  const slot: Slot = { worker, busy: 0 };
  worker.unref();
  worker.on('message', (reply: WorkerReply) => {
    const waiting = pending.get(reply.id);
    if (!waiting) return;
    pending.delete(reply.id);
    slot.busy--;
    if (reply.ok) waiting.resolve(reply.result);
    else waiting.reject(new Error(reply.message));
  });
  worker.on('error', (error) => logger.error({ err: error }, 'statement worker failed'));
  worker.on('exit', (code) => {
    // Whatever it was computing is lost: fail those batches (the job is retried) and replace it.
    for (const [id, waiting] of pending)
      if (waiting.slot === slot) {
        pending.delete(id);
        waiting.reject(new Error(`A statement worker stopped (exit code ${code}) in the middle of a batch.`));
      }
    if (slots) slots = slots.filter((s) => s !== slot);
  });
  return slot;
}

function leastBusy(size: number): Slot {
  slots ??= [];
  while (slots.length < size) slots.push(startWorker());
  return slots.reduce((a, b) => (b.busy < a.busy ? b : a));
}

/**
 * Computes a batch on the least busy worker, or inline when the pool is off or the work is too
 * small to be worth a worker's start (a scope of one batch).
 * @param job the batch (plain data)
 * @param options.inline compute on this thread
 * @returns what evaluateBatch returns for it
 */
export function runBatch(
  job: BatchJob & { previewLocale: StatementLocale },
  options?: { inline?: boolean },
): Promise<PreviewChange[]>;
export function runBatch(job: BatchJob, options?: { inline?: boolean }): Promise<WriteBatchResult>;
export function runBatch(
  job: BatchJob,
  { inline = false }: { inline?: boolean } = {},
): Promise<WriteBatchResult | PreviewChange[]> {
  const size = poolSize();
  if (size === 0 || inline) {
    try {
      return Promise.resolve(evaluateBatch(job));
    } catch (error) {
      return Promise.reject(error);
    }
  }
  const slot = leastBusy(size);
  const id = nextId++;
  slot.busy++;
  return new Promise((resolve, reject) => {
    pending.set(id, { resolve, reject, slot });
    slot.worker.postMessage({ id, job });
  });
}

/** Stops the workers (at shutdown, and between tests that change the pool size). */
export async function stopEvaluationPool(): Promise<void> {
  const stopping = slots ?? [];
  slots = null;
  await Promise.all(stopping.map((s) => s.worker.terminate()));
}
