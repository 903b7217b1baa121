import { getSequelize } from '../../db.ts';
import { AuthenticationError, TooManyRequestsError } from '../../errors.ts';
import { User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { verifyPassword } from './passwords.ts';

/** Free attempts before an account is slowed down. */
const FREE_ATTEMPTS = 5;
const MAX_DELAY_MS = 15 * 60_000;

/** After the free attempts each failure doubles the wait: 30 s, 1 min, 2 min … up to 15 min. */
export function throttleDelayMs(failedAttempts: number): number {
  if (failedAttempts < FREE_ATTEMPTS) return 0;
  return Math.min(MAX_DELAY_MS, 30_000 * 2 ** (failedAttempts - FREE_ATTEMPTS));
}

const wrongDetails = () =>
  AuthenticationError('That e-mail address and password do not match an active account.', 'wrong_credentials');

/**
 * Checks the credentials, with per-account throttling kept in the database (so it holds across
 * server instances). Unknown users and wrong passwords get the same answer.
 * @throws HttpError 401 `wrong_credentials`, 429 `too_many_attempts`
 */
export async function signIn(email: string, password: string, ip: string | undefined): Promise<User> {
  const user = await User.findOne({ where: { email } });
  if (user?.throttledUntil && user.throttledUntil.getTime() > Date.now()) {
    const seconds = Math.ceil((user.throttledUntil.getTime() - Date.now()) / 1000);
    throw TooManyRequestsError(
      `Too many failed attempts for this account. Try again in ${seconds} seconds, or reset your password.`,
      'too_many_attempts',
    );
  }
  const ok = await verifyPassword(password, user?.passwordHash);
  if (!user || !ok || !user.active) {
    if (user) {
      // Count atomically: parallel guesses must not slip past the limit.
      const [rows] = await getSequelize().query(
        'UPDATE users SET failed_sign_ins = failed_sign_ins + 1 WHERE id = :id RETURNING failed_sign_ins',
        { replacements: { id: user.id } },
      );
      const failures = Number((rows as Array<{ failed_sign_ins: number }>)[0]?.failed_sign_ins ?? user.failedSignIns + 1);
      const delay = throttleDelayMs(failures);
      if (delay > 0) await User.update({ throttledUntil: new Date(Date.now() + delay) }, { where: { id: user.id } });
      await recordAudit({ actorId: null, action: 'auth.sign_in_failed', subjectType: 'user', subjectId: user.id, ip });
    }
    throw wrongDetails();
  }
  user.set({ failedSignIns: 0, throttledUntil: null, lastSignInAt: new Date() });
  await user.save();
  await recordAudit({ actorId: user.id, action: 'auth.signed_in', subjectType: 'user', subjectId: user.id, ip });
  return user;
}
