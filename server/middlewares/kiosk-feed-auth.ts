import type { RequestHandler } from 'express';
import { config } from '../config.ts';
import { ChannelScreen, type KioskScreen } from '../models/index.ts';
import { requireKiosk } from './kiosk-auth.ts';

declare global {
  namespace Express {
    interface Request {
      /** The channel the kiosk screen shows (null: none assigned); set by requireKioskFeed. */
      kioskChannelId?: string | null;
    }
  }
}

/**
 * How long (ms) a checked token is trusted before the database is asked again. A revocation on
 * this instance ends it at once (event); on another instance, within this time.
 */
const TRUST_MS = config.kioskAuthCacheMs;
const MAX_ENTRIES = 5000;

interface Trusted {
  screen: KioskScreen;
  channelId: string | null;
  checkedAt: number;
}

const trusted = new Map<string, Trusted>();

/**
 * Ends the remembered sign-in of a revoked screen at once (the wiring calls it on `screenRevoked`).
 * @param screenId the revoked screen
 */
export function forgetKioskScreen(screenId: string): void {
  for (const [key, t] of trusted) if (t.screen.id === screenId) trusted.delete(key);
}

/** Forgets every remembered channel assignment: a screen moved, or its channel was removed (`channelChanged`). */
export function forgetKioskAssignments(): void {
  trusted.clear();
}

/**
 * requireKiosk for the feed, which players poll every half minute and which must answer a 304
 * without touching the database: the same check (Bearer token of a paired, unrevoked screen, else
 * 401 `kiosk_token_invalid`), remembered for a second together with the screen's channel.
 * Sets req.kioskScreen and req.kioskChannelId.
 */
export const requireKioskFeed: RequestHandler = (req, res, next) => {
  const header = req.get('authorization') ?? '';
  const hit = trusted.get(header);
  if (hit && Date.now() - hit.checkedAt < TRUST_MS) {
    req.kioskScreen = hit.screen;
    req.kioskChannelId = hit.channelId;
    return next();
  }
  trusted.delete(header);
  Promise.resolve(
    requireKiosk(req, res, async (err?: unknown) => {
      if (err || !req.kioskScreen) return next(err);
      try {
        const row = await ChannelScreen.findByPk(req.kioskScreen.id);
        req.kioskChannelId = row?.channelId ?? null;
        if (trusted.size >= MAX_ENTRIES) trusted.clear();
        trusted.set(header, { screen: req.kioskScreen, channelId: req.kioskChannelId, checkedAt: Date.now() });
        next();
      } catch (lookupError) {
        next(lookupError);
      }
    }),
  ).catch(next);
};
