import { Router, type Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import { PgRateLimitStore } from '../middlewares/rate-limit-store.ts';
import {
  ChangePasswordSchema,
  RequestPasswordResetSchema,
  SignInSchema,
  TokenCheckSchema,
  TokenPasswordSchema,
} from '@shared/schemas/auth.ts';
import { HttpError } from '../errors.ts';
import { currentUser, requireUser } from '../middlewares/authenticate.ts';
import { validate } from '../middlewares/validate.ts';
import type { User } from '../models/index.ts';
import { presentSessionUser } from '../presenters/user.ts';
import { config } from '../config.ts';
import {
  changePassword,
  checkToken,
  recordSignOut,
  requestPasswordReset,
  setPasswordWithToken,
  signIn,
} from '../services/users/index.ts';

/** Per-address throttle for sign-in and reset requests (per-account throttling is in the database). */
function addressLimiter(name: string, limit: number) {
  return rateLimit({
    windowMs: 15 * 60_000,
    limit: config.limits.signIn ?? limit,
    store: new PgRateLimitStore(name),
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

export const authRouter = Router();

authRouter.get('/me', requireUser, (req, res) => {
  res.json({ data: presentSessionUser(currentUser(req)) });
});

authRouter.post('/sign-in', addressLimiter('sign-in', 30), validate(SignInSchema), async (req, res) => {
  const { email, password } = req.body;
  const user = await signIn(email, password, req.ip);
  await startSession(req, user);
  res.json({ data: presentSessionUser(user) });
});

authRouter.post('/sign-out', async (req, res) => {
  const userId = req.session.userId;
  await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
  if (userId) await recordSignOut(userId, req.ip);
  res.clearCookie('starproof.sid');
  res.status(204).end();
});

authRouter.post('/password', requireUser, validate(ChangePasswordSchema), async (req, res) => {
  await changePassword(currentUser(req), req.body, req.sessionID, req.ip);
  res.status(204).end();
});

authRouter.post(
  '/password-reset',
  addressLimiter('password-reset', 10),
  validate(RequestPasswordResetSchema),
  async (req, res) => {
    await requestPasswordReset(req.body.email, req.ip);
    // The same answer whether or not the address has an account.
    res.status(202).json({ data: { message: 'If that address has an account, a reset link is on its way.' } });
  },
);

/**
 * Whether an invitation link still works, without using it, so the welcome page can say so before
 * anyone types a password. Answers only valid / invalid / used / expired; rate limited per address.
 */
authRouter.post('/invitation/check', addressLimiter('invitation-check', 60), validate(TokenCheckSchema), async (req, res) => {
  res.json({ data: { state: await checkToken(req.body.token, 'invitation') } });
});

/** Invitation acceptance and password reset: consume the token, set the password, sign in. */
for (const [path, purpose] of [
  ['/invitation/accept', 'invitation'],
  ['/password-reset/complete', 'password_reset'],
] as const) {
  authRouter.post(path, addressLimiter(purpose, 30), validate(TokenPasswordSchema), async (req, res) => {
    const user = await setPasswordWithToken(req.body.token, req.body.newPassword, purpose, req.ip);
    await startSession(req, user);
    res.json({ data: presentSessionUser(user) });
  });
}
