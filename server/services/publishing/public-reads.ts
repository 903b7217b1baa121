import { QueryTypes } from 'sequelize';
import { config } from '../../config.ts';
import { getSequelize, hasReadReplica, readFromPrimary, readFromReplica } from '../../db.ts';
import { logger } from '../../logger.ts';

/** After the replica failed to answer, public reads use the primary without asking it for this long (ms). */
const REPLICA_REST_MS = 5_000;
/** How often (ms) a lagging replica is asked again while a public read waits for it. */
const POLL_MS = 20;

let replicaRestsUntil = 0;

/** "16/B374D848" as a number, so two WAL positions compare. */
function lsnValue(lsn: string): bigint {
  const [high, low] = lsn.split('/');
  return (BigInt(`0x${high}`) << 32n) + BigInt(`0x${low}`);
}

async function oneLsn(sql: string): Promise<string | null> {
  const [row] = await getSequelize().query<{ lsn: string | null }>(sql, { type: QueryTypes.SELECT });
  return row?.lsn ?? null;
}

/**
 * Whether the replica has replayed at least the primary's current WAL position, waiting up to
 * STARPROOF_REPLICA_MAX_LAG_MS for it. True means: every transaction committed on the primary before
 * this call began is visible on the replica.
 */
async function replicaCaughtUp(): Promise<boolean> {
  if (Date.now() < replicaRestsUntil) return false;
  // Asked of the primary even when this read is nested in another on the replica (the kiosk feed
  // names each page's public address from the public pages, which read for themselves).
  const primary = lsnValue((await readFromPrimary(() => oneLsn('SELECT pg_current_wal_lsn()::text AS lsn')))!);
  const deadline = Date.now() + config.replicaMaxLagMs;
  try {
    for (;;) {
      const replayed = await readFromReplica(() => oneLsn('SELECT pg_last_wal_replay_lsn()::text AS lsn'));
      // null: the database behind DATABASE_READ_URL is not a replica at all; it is then as fresh as it gets.
      if (replayed === null || lsnValue(replayed) >= primary) return true;
      if (Date.now() >= deadline) return false;
      await new Promise((resolve) => setTimeout(resolve, POLL_MS));
    }
  } catch (err) {
    replicaRestsUntil = Date.now() + REPLICA_REST_MS;
    logger.warn({ err }, 'read replica unreachable: public reads use the primary for a few seconds');
    return false;
  }
}

/**
 * Runs a public read (the kiosk feed, the public API, the Atom feed) on the read replica when one is
 * configured and it has caught up with the primary, else on the primary. The rule: the replica is
 * used only once it has replayed the primary's WAL position taken at the start of the read (waiting
 * at most STARPROOF_REPLICA_MAX_LAG_MS), so a public read never misses a change committed before it
 * began, whichever database it reads. A replica that is down or lags more than that bound is passed
 * over for the primary.
 * @param work the reading; `asOf` is a time before which every committed change is visible to it
 */
export async function readForPublic<T>(work: (asOf: number) => Promise<T>): Promise<T> {
  const asOf = Date.now();
  if (hasReadReplica() && (await replicaCaughtUp())) {
    return readFromReplica(() => work(asOf));
  }
  return work(asOf);
}
