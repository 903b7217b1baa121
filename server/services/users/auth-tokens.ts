import crypto from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { BadRequestError } from '../../errors.ts';
import { logger } from '../../logger.ts';
import { purgeOldSignInAttempts } from './sign-in.ts';
import type { TokenState } from '@shared/schemas/auth.ts';
import { AuthToken, User, type TokenPurpose } from '../../models/index.ts';

/** SHA-256 of the token: a leaked table row cannot be turned back into a working link. */
export const hashToken = (raw: string) => crypto.createHash('sha256').update(raw).digest('hex');

/**
 * Issues a single-use token and returns it in the clear (for the e-mail only). Earlier unused
 * tokens of the same purpose for this user stop working, unless `keepEarlier` (password resets: a
 * second request must not silently kill a link that is still fresh in someone's inbox).
 */
export async function issueToken(
  userId: string,
  purpose: TokenPurpose,
  lifetimeMs: number,
  transaction?: Transaction,
  { keepEarlier = false } = {},
): Promise<string> {
  const raw = crypto.randomBytes(32).toString('base64url');
  if (!keepEarlier) await revokeTokens(userId, purpose, transaction);
  await AuthToken.create(
    { userId, purpose, tokenHash: hashToken(raw), expiresAt: new Date(Date.now() + lifetimeMs) },
    { transaction },
  );
  return raw;
}

/**
 * Marks a token used and returns its user. The row is locked so the same link cannot be used twice
 * by two requests at once.
 * @throws HttpError 400 `invalid_token` when unknown, used, expired or the account is deactivated
 */
export async function consumeToken(raw: string, purpose: TokenPurpose, transaction: Transaction): Promise<User> {
  const token = await AuthToken.findOne({
    where: { tokenHash: hashToken(raw), purpose },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
  const what = purpose === 'invitation' ? 'invitation link' : 'password reset link';
  if (!token) throw BadRequestError(`This ${what} is not valid. Ask for a new one.`, 'invalid_token');
  if (token.usedAt) throw BadRequestError(`This ${what} has already been used. Ask for a new one.`, 'invalid_token');
  if (token.expiresAt.getTime() < Date.now())
    throw BadRequestError(`This ${what} has expired. Ask for a new one.`, 'invalid_token');
  const user = await User.findByPk(token.userId, { transaction });
  if (!user?.active) throw BadRequestError('This account has been deactivated.', 'invalid_token');
  token.usedAt = new Date();
  await token.save({ transaction });
  return user;
}

/**
 * What a link's token is now, without using it: valid, used, expired, or invalid (unknown, or its
 * account deactivated). Read only; the page checks it before showing the password form.
 */
export async function checkToken(raw: string, purpose: TokenPurpose): Promise<TokenState> {
  const token = await AuthToken.findOne({ where: { tokenHash: hashToken(raw), purpose } });
  if (!token) return 'invalid';
  if (token.usedAt) return 'used';
  if (token.expiresAt.getTime() < Date.now()) return 'expired';
  const user = await User.findByPk(token.userId, { attributes: ['active'] });
  return user?.active ? 'valid' : 'invalid';
}

/** Every outstanding token of the purpose for this user stops working (a password change revokes reset links). */
export async function revokeTokens(userId: string, purpose: TokenPurpose, transaction?: Transaction): Promise<void> {
  await AuthToken.update({ usedAt: new Date() }, { where: { userId, purpose, usedAt: null }, transaction });
}

/** How many tokens of the purpose were issued to this user within the last `windowMs`. */
export function countRecentTokens(userId: string, purpose: TokenPurpose, windowMs: number): Promise<number> {
  return AuthToken.count({ where: { userId, purpose, createdAt: { [Op.gte]: new Date(Date.now() - windowMs) } } });
}

/** Removes tokens that expired over 30 days ago (a used or refused link needs no row after that); run daily by TOKEN_PURGE_JOB. */
export async function purgeOldTokens(): Promise<number> {
  return AuthToken.destroy({ where: { expiresAt: { [Op.lt]: new Date(Date.now() - 30 * 86_400_000) } } });
}

/** The job kind of the daily token clean-up. */
export const TOKEN_PURGE_JOB = 'users.purge-old-tokens';

/** The daily clean-up job: sign-in links (invitations, resets) that expired over 30 days ago go. */
export async function runTokenPurgeJob(): Promise<void> {
  const removed = await purgeOldTokens();
  if (removed) logger.info({ removed }, 'expired sign-in links removed');
  // Attempt counts for addresses nobody has tried for a day (guessed addresses included) go too.
  const forgotten = await purgeOldSignInAttempts();
  if (forgotten) logger.info({ forgotten }, 'idle sign-in attempt counts removed');
}
