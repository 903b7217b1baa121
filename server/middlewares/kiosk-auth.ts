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

/** What a kiosk's Authorization header comes to: its screen, or the challenge to send with the 401. */
export type KioskTokenCheck = { screen: KioskScreen } | { challenge: string };

/**
 * Looks up the paired, unrevoked screen whose `Bearer` token the header carries.
 * @param authorization the request's Authorization header ('' when absent)
 */
export async function checkKioskToken(authorization: string): Promise<KioskTokenCheck> {
  const match = /^Bearer\s+(\S{10,200})$/i.exec(authorization);
  if (!match) return { challenge: 'Bearer realm="kiosk"' };
  const screen = await KioskScreen.findOne({ where: { tokenHash: hashToken(match[1]) } });
  if (!screen || screen.revokedAt) return { challenge: 'Bearer realm="kiosk", error="invalid_token"' };
  return { screen };
}

/**
 * Refuses a failed kiosk token check: sets the WWW-Authenticate challenge and passes on
 * 401 `kiosk_token_invalid`, so the player shows its pairing screen.
 */
export function refuseKiosk(res: Response, next: NextFunction, challenge: string): void {
  res.set('WWW-Authenticate', challenge);
  next(invalid());
}

/**
 * Accepts only `Authorization: Bearer <token>` of a screen that is paired and not revoked, and
 * sets req.kioskScreen. Anything else is 401 `kiosk_token_invalid`, so the player shows its
 * pairing screen.
 */
export const requireKiosk: RequestHandler = async (req: Request, res: Response, next: NextFunction) => {
  const check = await checkKioskToken(req.get('authorization') ?? '');
  if ('challenge' in check) return refuseKiosk(res, next, check.challenge);
  req.kioskScreen = check.screen;
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
