import { QueryTypes } from 'sequelize';
import { allowLongStatements, getSequelize } from '../db.ts';

/** An arbitrary, fixed advisory-lock key: "Starproof start-up" (0x5354_4152 spells STAR). */
const START_UP_LOCK = 0x5354_4152;

/**
 * Runs the start-up work that must not run twice at once (migrations, the demo seed) while holding
 * one database-wide advisory lock, so several servers started together against one database take
 * turns: the first migrates, the others find nothing left to do. The lock is held by a transaction
 * that only waits (the work runs on other pooled connections) and ends with it, even if the process dies.
 * @param work what to run under the lock
 */
export async function underStartUpLock<T>(work: () => Promise<T>): Promise<T> {
  return getSequelize().transaction(async (transaction) => {
    // Waiting for another server's migrations may take longer than one query is normally allowed.
    await allowLongStatements(transaction, 600);
    await getSequelize().query('SELECT pg_advisory_xact_lock(:key)', {
      replacements: { key: START_UP_LOCK },
      type: QueryTypes.SELECT,
      transaction,
    });
    return work();
  });
}
