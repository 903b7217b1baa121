import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { AuthenticationError } from '../errors.ts';
import { User } from '../models/index.ts';

declare module 'express-session' {
  interface SessionData {
    userId?: string;
  }
}

declare global {
  namespace Express {
    interface Request {
      /** The signed-in, active user; set by loadUser. */
      user?: User;
    }
  }
}

/** Loads the session's user; a deactivated or deleted user's session is ended here as well. */
export const loadUser: RequestHandler = async (req, _res, next) => {
  const userId = req.session?.userId;
  if (!userId) return next();
  const user = await User.findByPk(userId);
  if (!user?.active) {
    await new Promise<void>((resolve) => req.session.destroy(() => resolve()));
    return next();
  }
  req.user = user;
  next();
};

/** Refuses anonymous requests with 401. */
export function requireUser(req: Request, _res: Response, next: NextFunction) {
  if (!req.user) return next(AuthenticationError());
  next();
}

/** The signed-in user; for handlers behind requireUser (any request, whatever its validated body or query). */
export function currentUser(req: Pick<Request, 'user'>): User {
  if (!req.user) throw AuthenticationError();
  return req.user;
}
