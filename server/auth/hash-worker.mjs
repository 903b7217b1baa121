// Runs in a worker thread (see password-pool.ts). Plain JavaScript so that it loads the same way
// under tsx, Vitest and plain Node, none of which register a TypeScript loader inside workers alike.
import bcrypt from 'bcryptjs';

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
