/** Socket errors and PostgreSQL's "shutting down / cannot connect" codes, from pg directly (the session store, pg-boss) or wrapped by Sequelize. */
const DOWN_CODES = new Set([
  'ECONNREFUSED',
  'ECONNRESET',
  'ETIMEDOUT',
  'EPIPE',
  '57P01',
  '57P02',
  '57P03',
  '08000',
  '08001',
  '08003',
  '08006',
  // query_canceled: our statement_timeout fired.
  '57014',
]);

/**
 * Whether an error only says the database is unreachable or going away (an outage), not a bug.
 * @param err anything thrown or rejected
 * @returns true for connection failures and PostgreSQL shutdown codes
 */
export function isDatabaseDown(err: unknown): boolean {
  const e = err as { code?: string; parent?: { code?: string }; message?: string } | undefined;
  if (!e) return false;
  if (DOWN_CODES.has(e.code ?? '') || DOWN_CODES.has(e.parent?.code ?? '')) return true;
  return /Connection terminated|connect ECONNREFUSED|timeout exceeded when trying to connect|Query read timeout|statement timeout/i.test(
    e.message ?? '',
  );
}
