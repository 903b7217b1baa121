// Runs in a worker thread (see password-pool.ts). Plain JavaScript so that it loads the same way
// under tsx, Vitest and plain Node, none of which register a TypeScript loader inside workers alike.
import bcrypt from 'bcryptjs';

/**
 * One hashing job.
 * @param {{ op: 'hash', password: string, cost: number } | { op: 'compare', password: string, hash: string }} task
 * @returns {Promise<string | boolean>}
 */
export default function run(task) {
  return task.op === 'hash' ? bcrypt.hash(task.password, task.cost) : bcrypt.compare(task.password, task.hash);
}
