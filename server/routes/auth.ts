import { Router, type Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import {
  ChangePasswordSchema,
  RequestPasswordResetSchema,
  SignInSchema,
  TokenPasswordSchema,
  type ChangePasswordInput,
  type RequestPasswordResetInput,
  type SignInInput,
  type TokenPasswordInput,
} from '@shared/schemas/auth.ts';
import { TokenLifetimes } from '@shared/validations.ts';
import { getSequelize } from '../db.ts';
import { HttpError } from '../errors.ts';
import { sendMail } from '../mail/mailer.ts';
import { passwordResetMail } from '../mail/templates.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate } from '../middlewares/validate.ts';
import { User } from '../models/index.ts';
import { presentSessionUser } from '../presenters/user.ts';
import { recordAudit } from '../services/audit.ts';
import { consumeToken, countRecentTokens, issueToken, revokeTokens } from '../services/auth-tokens.ts';
import { assertAcceptablePassword, hashPassword, verifyPassword } from '../services/passwords.ts';
import { releaseAttempts, signIn } from '../services/sign-in.ts';
import { endUserSessions } from '../services/user-sessions.ts';

/** Per-address throttle for sign-in and reset requests (per-account throttling is in the database). */
function addressLimiter(limit: number) {
  return rateLimit({
    windowMs: 15 * 60_000,
    limit: Number(process.env.STARPROOF_SIGNIN_LIMIT ?? limit),
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new HttpError(429, 'too_many_requests', 'Too many attempts from this address. Wait a few minutes and try again.')),
  });
}

/** Starts a fresh session for the user: a new id defeats session fixation. */
function startSession(req: Request, user: User): Promise<void> {
  return new Promise((resolve, reject) =>
    req.session.regenerate((err) => {
      if (err) return reject(err);
      req.session.userId = user.id;
      req.session.save((saveErr) => (saveErr ? reject(saveErr) : resolve()));
    }),
  );
}

/** Reset e-mails per account per hour. */
export const RESETS_PER_HOUR = 3;

export const authRouter = Router();

authRouter.get('/me', requireUser, (req, res) => {
  res.json({ data: presentSessionUser(currentUser(req)) });
});

authRouter.post('/sign-in', addressLimiter(30), validate(SignInSchema), async (req, res) => {
  const { email, password } = req.body as SignInInput;
  const user = await signIn(email, password, req.ip);
  await startSession(req, user);
  res.json({ data: presentSessionUser(user) });
});

authRouter.post('/sign-out', async (req, res) => {
  const userId = req.session.userId;
  await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
  if (userId)
    await recordAudit({ actorId: userId, action: 'auth.signed_out', subjectType: 'user', subjectId: userId, ip: req.ip });
  res.clearCookie('starproof.sid');
  res.status(204).end();
});

authRouter.post('/password', requireUser, validate(ChangePasswordSchema), async (req, res) => {
  const user = currentUser(req);
  const { currentPassword, newPassword } = req.body as ChangePasswordInput;
  if (!(await verifyPassword(currentPassword, user.passwordHash))) {
    throw new HttpError(400, 'wrong_password', 'currentPassword: Your current password is not right.', {
      currentPassword: 'Your current password is not right.',
    });
  }
  assertAcceptablePassword(newPassword, user.email);
  user.passwordHash = await hashPassword(newPassword);
  await getSequelize().transaction(async (transaction) => {
    await user.save({ transaction });
    // Other devices signed in with the old password are signed out, and reset links mailed earlier die.
    await endUserSessions(user.id, req.sessionID, transaction);
    await revokeTokens(user.id, 'password_reset', transaction);
    await recordAudit(
      { actorId: user.id, action: 'auth.password_changed', subjectType: 'user', subjectId: user.id, ip: req.ip },
      transaction,
    );
  });
  res.status(204).end();
});

authRouter.post('/password-reset', addressLimiter(10), validate(RequestPasswordResetSchema), async (req, res) => {
  const { email } = req.body as RequestPasswordResetInput;
  const user = await User.findOne({ where: { email, active: true } });
  // At most RESETS_PER_HOUR mails per account, however many addresses ask: the answer is the same either way.
  if (user?.passwordHash && (await countRecentTokens(user.id, 'password_reset', 3_600_000)) < RESETS_PER_HOUR) {
    const token = await issueToken(user.id, 'password_reset', TokenLifetimes.passwordResetMinutes * 60_000, undefined, {
      keepEarlier: true,
    });
    await sendMail(passwordResetMail(user.email, user.name, token));
    await recordAudit({
      actorId: null,
      action: 'auth.password_reset_requested',
      subjectType: 'user',
      subjectId: user.id,
      ip: req.ip,
    });
  }
  // The same answer whether or not the address has an account.
  res.status(202).json({ data: { message: 'If that address has an account, a reset link is on its way.' } });
});

/** Shared by invitation acceptance and password reset: consume the token, set the password, sign in. */
function completeWithToken(purpose: 'invitation' | 'password_reset') {
  return async (req: Request, res: import('express').Response) => {
    const { token, newPassword } = req.body as TokenPasswordInput;
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
          ip: req.ip,
        },
        transaction,
      );
      return found;
    });
    await releaseAttempts(user.email);
    await startSession(req, user);
    res.json({ data: presentSessionUser(user) });
  };
}

authRouter.post('/invitation/accept', addressLimiter(30), validate(TokenPasswordSchema), completeWithToken('invitation'));
authRouter.post(
  '/password-reset/complete',
  addressLimiter(30),
  validate(TokenPasswordSchema),
  completeWithToken('password_reset'),
);
