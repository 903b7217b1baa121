import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { AuthenticationError, HttpError } from '../../errors.ts';
import { User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { verifyPassword } from './passwords.ts';

/** Free attempts before an address is slowed down. */
export const FREE_ATTEMPTS = 5;
// After the free attempts each failure doubles the wait (30 s, 1 min, 2 min …) up to this (in the SQL below).
const MAX_DELAY_MS = 15 * 60_000;

const wrongDetails = () =>
  AuthenticationError('That e-mail address and password do not match an active account.', 'wrong_credentials');

/**
 * Takes one attempt for the address before any password is compared: one statement counts it and
 * (from the FREE_ATTEMPTS-th on) locks the address, so however many guesses arrive at once, at most
 * one per free attempt, or per expired lock, is ever compared. Counted per address typed, known or
 * not, so the lock does not tell which addresses have accounts.
 * @throws HttpError 429 `too_many_attempts` while the address is locked
 */
async function takeAttempt(email: string): Promise<void> {
  const taken = await getSequelize().query<{ failed: number }>(
    `INSERT INTO sign_in_attempts AS a (email, failed, throttled_until, updated_at)
     VALUES (:email, 1, NULL, now())
     ON CONFLICT (email) DO UPDATE SET
       failed = a.failed + 1,
       throttled_until = CASE WHEN a.failed + 1 >= :free
         THEN now() + make_interval(secs => LEAST(:maxSeconds, 30 * power(2, a.failed + 1 - :free)))
         ELSE NULL END,
       updated_at = now()
     WHERE a.throttled_until IS NULL OR a.throttled_until <= now()
     RETURNING a.failed`,
    { replacements: { email, free: FREE_ATTEMPTS, maxSeconds: MAX_DELAY_MS / 1000 }, type: QueryTypes.SELECT },
  );
  if (taken.length) return;
  const [lock] = await getSequelize().query<{ seconds: number }>(
    'SELECT ceil(extract(epoch FROM throttled_until - now()))::int AS seconds FROM sign_in_attempts WHERE email = :email',
    { replacements: { email }, type: QueryTypes.SELECT },
  );
  const seconds = Math.max(1, lock?.seconds ?? 1);
  throw new HttpError(
    429,
    'too_many_attempts',
    `Too many failed attempts for this account. Try again in ${seconds} seconds, or reset your password.`,
    undefined,
    { retryAfterSeconds: seconds },
  );
}

/** A correct password (or a completed reset) gives the address its free attempts back. */
export async function releaseAttempts(email: string): Promise<void> {
  await getSequelize().query('DELETE FROM sign_in_attempts WHERE email = :email', { replacements: { email } });
}

/**
 * Checks the credentials, with per-address throttling kept in the database (so it holds across
 * server instances). Unknown users and wrong passwords get the same answer, in the same time: a
 * dummy hash is compared when there is no account. No database connection is held while hashing.
 * @param email already trimmed and lower-cased by the shared schema
 * @throws HttpError 401 `wrong_credentials`, 429 `too_many_attempts` or `busy`
 */
export async function signIn(email: string, password: string, ip: string | undefined): Promise<User> {
  await takeAttempt(email);
  const user = await User.findOne({ where: { email } });
  const ok = await verifyPassword(password, user?.passwordHash);
  if (!user || !ok || !user.active) {
    if (user) await recordAudit({ actorId: null, action: 'auth.sign_in_failed', subjectType: 'user', subjectId: user.id, ip });
    throw wrongDetails();
  }
  await releaseAttempts(email);
  user.set({ lastSignInAt: new Date() });
  await user.save();
  await recordAudit({ actorId: user.id, action: 'auth.signed_in', subjectType: 'user', subjectId: user.id, ip });
  return user;
}

/**
 * Forgets attempt counts that have not moved for a day and hold no running lock (guesses at
 * addresses without accounts would otherwise stay forever). Housekeeping, next to purgeOldTokens.
 * @returns how many were removed
 */
export async function purgeOldSignInAttempts(): Promise<number> {
  const [, result] = await getSequelize().query(
    `DELETE FROM sign_in_attempts
     WHERE updated_at < now() - interval '1 day' AND (throttled_until IS NULL OR throttled_until < now())`,
  );
  return (result as { rowCount?: number }).rowCount ?? 0;
}
