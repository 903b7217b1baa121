/**
 * A worker thread that computes statement batches (see evaluation-pool.ts): the engine's Monte
 * Carlo is CPU work that would otherwise hold up every request the server is answering.
 */
import { parentPort } from 'node:worker_threads';
import { evaluateBatch, type BatchJob } from './evaluate-batch.ts';

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
