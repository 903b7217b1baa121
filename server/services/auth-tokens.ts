import crypto from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { HttpError } from '../errors.ts';
import { AuthToken, User, type TokenPurpose } from '../models/index.ts';

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
  if (!token) throw new HttpError(400, 'invalid_token', `This ${what} is not valid. Ask for a new one.`);
  if (token.usedAt) throw new HttpError(400, 'invalid_token', `This ${what} has already been used. Ask for a new one.`);
  if (token.expiresAt.getTime() < Date.now())
    throw new HttpError(400, 'invalid_token', `This ${what} has expired. Ask for a new one.`);
  const user = await User.findByPk(token.userId, { transaction });
  if (!user || !user.active) throw new HttpError(400, 'invalid_token', 'This account has been deactivated.');
  token.usedAt = new Date();
  await token.save({ transaction });
  return user;
}

/** Every outstanding token of the purpose for this user stops working (a password change revokes reset links). */
export async function revokeTokens(userId: string, purpose: TokenPurpose, transaction?: Transaction): Promise<void> {
  await AuthToken.update({ usedAt: new Date() }, { where: { userId, purpose, usedAt: null }, transaction });
}

/** How many tokens of the purpose were issued to this user within the last `windowMs`. */
export function countRecentTokens(userId: string, purpose: TokenPurpose, windowMs: number): Promise<number> {
  return AuthToken.count({ where: { userId, purpose, createdAt: { [Op.gte]: new Date(Date.now() - windowMs) } } });
}

/** Removes long-expired tokens; housekeeping only. */
export async function purgeOldTokens(): Promise<number> {
  return AuthToken.destroy({ where: { expiresAt: { [Op.lt]: new Date(Date.now() - 30 * 86_400_000) } } });
}
