/**
 * A worker thread that computes statement batches (see evaluation-pool.ts): the engine's Monte
 * Carlo is CPU work that would otherwise hold up every request the server is answering.
 */
import { readlinkSync } from 'node:fs';
import { setPriority } from 'node:os';
import { parentPort } from 'node:worker_threads';
import { evaluateBatch, type BatchJob } from './evaluate-batch.ts';

/**
 * How much lower than the server's thread the workers run (a nice value). With both workers busy,
 * the server's thread and PostgreSQL share the cores with them, and the event loop waited for its
 * turn (tens of milliseconds inside a socket write); at a lower priority the workers take what the
 * others leave (measured, 20,000 statements: loop max 31–35 ms against 38–44 ms at the same
 * priority, same wall time). Linux gives each thread its own nice value (/proc/thread-self names this one);
 * elsewhere the workers keep the process's.
 */
const WORKER_NICE = 5;
try {
  const thread = Number(readlinkSync('/proc/thread-self').split('/').pop());
  if (thread > 0) setPriority(thread, WORKER_NICE);
} catch {
  // No /proc (not Linux), or not allowed: the same priority as the server's thread.
}

export interface WorkerRequest {
  id: number;
  job: BatchJob;
}

export type WorkerReply =
  | { id: number; ok: true; result: ReturnType<typeof evaluateBatch> }
  | { id: number; ok: false; message: string };

parentPort!.on('message', ({ id, job }: WorkerRequest) => {
  let reply: WorkerReply;
  try {
    reply = { id, ok: true, result: evaluateBatch(job) };
  } catch (error) {
    reply = { id, ok: false, message: error instanceof Error ? error.message : String(error) };
  }
  parentPort!.postMessage(reply);
});
