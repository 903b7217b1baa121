import type { NextFunction, Request, RequestHandler, Response } from 'express';
import { HttpError } from '../errors.ts';
import { KioskScreen } from '../models/index.ts';
import { hashToken } from '../services/users/index.ts';

declare global {
  namespace Express {
    interface Request {
      /** The kiosk screen whose token came with the request; set by requireKiosk. */
      kioskScreen?: KioskScreen;
    }
  }
}

const invalid = () =>
  new HttpError(
    401,
    'kiosk_token_invalid',
    'This screen is not paired, or its pairing was revoked. Pair it again with a code from an admin.',
  );

/**
 * Accepts only `Authorization: Bearer <token>` of a screen that is paired and not revoked, and
 * sets req.kioskScreen. Anything else is 401 `kiosk_token_invalid`, so the player shows its
 * pairing screen.
 */
export const requireKiosk: RequestHandler = async (req: Request, res: Response, next: NextFunction) => {
  const match = /^Bearer\s+(\S{10,200})$/i.exec(req.get('authorization') ?? '');
  if (!match) {
    res.set('WWW-Authenticate', 'Bearer realm="kiosk"');
    return next(invalid());
  }
  const screen = await KioskScreen.findOne({ where: { tokenHash: hashToken(match[1]) } });
  if (!screen || screen.revokedAt) {
    res.set('WWW-Authenticate', 'Bearer realm="kiosk", error="invalid_token"');
    return next(invalid());
  }
  req.kioskScreen = screen;
  next();
};

/** The authenticated screen; for handlers behind requireKiosk. */
export function currentKiosk(req: Request): KioskScreen {
  if (!req.kioskScreen) throw invalid();
  return req.kioskScreen;
}

/**
 * Refuses a kiosk acting for a screen or venue other than its own.
 * @throws HttpError 403 `kiosk_wrong_screen`
 */
export function assertOwnScreen(screen: KioskScreen, target: { screenId?: string; venueId?: string }): void {
  if (
    (target.screenId !== undefined && target.screenId !== screen.id) ||
    (target.venueId !== undefined && target.venueId !== screen.venueId)
  ) {
    throw new HttpError(403, 'kiosk_wrong_screen', 'A kiosk token acts only for its own screen and venue.');
  }
}
