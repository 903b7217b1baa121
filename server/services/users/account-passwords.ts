import { TokenLifetimes } from '@shared/validations.ts';
import { getSequelize } from '../../db.ts';
import { BadRequestError } from '../../errors.ts';
import { sendMail } from '../../mail/mailer.ts';
import { passwordResetMail } from '../../mail/templates.ts';
import { User } from '../../models/index.ts';
import { recordAudit } from '../audit.ts';
import { consumeToken, countRecentTokens, issueToken, revokeTokens } from './auth-tokens.ts';
import { assertAcceptablePassword, hashPassword, verifyPassword } from './passwords.ts';
import { releaseAttempts } from './sign-in.ts';
import { endUserSessions } from './user-sessions.ts';

/** Reset e-mails one account may be sent in an hour, however many addresses ask. */
export const RESETS_PER_HOUR = 3;

/**
 * Changes a signed-in user's password. Their other sessions (devices signed in with the old
 * password) end in the same transaction; the session that asked stays signed in.
 * @param keepSessionId the session that asked
 * @throws HttpError 400 `wrong_password`, or the reason the new password is refused
 */
export async function changePassword(
  user: User,
  passwords: { currentPassword: string; newPassword: string },
  keepSessionId: string,
  ip?: string,
): Promise<void> {
  if (!(await verifyPassword(passwords.currentPassword, user.passwordHash))) {
    throw BadRequestError('currentPassword: Your current password is not right.', 'wrong_password', {
      currentPassword: 'Your current password is not right.',
    });
  }
  assertAcceptablePassword(passwords.newPassword, user.email);
  user.passwordHash = await hashPassword(passwords.newPassword);
  await getSequelize().transaction(async (transaction) => {
    await user.save({ transaction });
    // Other devices signed in with the old password are signed out, and reset links mailed earlier die.
    await endUserSessions(user.id, keepSessionId, transaction);
    await revokeTokens(user.id, 'password_reset', transaction);
    await recordAudit(
      { actorId: user.id, action: 'auth.password_changed', subjectType: 'user', subjectId: user.id, ip },
      transaction,
    );
  });
}

/**
 * Mails a reset link to an active account that has a password; does nothing for any other address,
 * so the caller answers the same either way.
 */
export async function requestPasswordReset(email: string, ip?: string): Promise<void> {
  const user = await User.findOne({ where: { email, active: true } });
  if (!user?.passwordHash) return;
  if ((await countRecentTokens(user.id, 'password_reset', 3_600_000)) >= RESETS_PER_HOUR) return;
  // A new request keeps the earlier link working while it is still fresh.
  const token = await issueToken(user.id, 'password_reset', TokenLifetimes.passwordResetMinutes * 60_000, undefined, {
    keepEarlier: true,
  });
  await sendMail(passwordResetMail(user.email, user.name, token));
  await recordAudit({ actorId: null, action: 'auth.password_reset_requested', subjectType: 'user', subjectId: user.id, ip });
}

/**
 * Invitation acceptance and password reset: consumes the one-time token, sets the password, clears
 * the sign-in throttle and ends the account's other sessions, all in one transaction.
 * @returns the user, for the caller to start a session for
 * @throws HttpError 400 for a token that is unknown, used or expired, or a refused password
 */
export async function setPasswordWithToken(
  token: string,
  newPassword: string,
  purpose: 'invitation' | 'password_reset',
  ip?: string,
): Promise<User> {
  // Hashed before the transaction: no database connection is held while a worker hashes.
  const passwordHash = await hashPassword(newPassword);
  const user = await getSequelize().transaction(async (transaction) => {
    const found = await consumeToken(token, purpose, transaction);
    assertAcceptablePassword(newPassword, found.email);
    found.set({ passwordHash });
    await found.save({ transaction });
    await endUserSessions(found.id, undefined, transaction);
    // The new password replaces every other reset link still in a mailbox.
    await revokeTokens(found.id, 'password_reset', transaction);
    await recordAudit(
      {
        actorId: found.id,
        action: purpose === 'invitation' ? 'user.invitation_accepted' : 'auth.password_reset',
        subjectType: 'user',
        subjectId: found.id,
        ip,
      },
      transaction,
    );
    return found;
  });
  await releaseAttempts(user.email);
  return user;
}

/** Records a sign-out (the session itself is ended by the caller). */
export async function recordSignOut(userId: string, ip?: string): Promise<void> {
  await recordAudit({ actorId: userId, action: 'auth.signed_out', subjectType: 'user', subjectId: userId, ip });
}
