import type { RequestHandler } from 'express';
import { config } from '../config.ts';
import { ChannelScreen, type KioskScreen } from '../models/index.ts';
import { logger } from '../logger.ts';
import { checkKioskToken, refuseKiosk } from './kiosk-auth.ts';

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
/**
 * From this age on, a request still answers from the remembered check but starts the next check in
 * the background, so a screen polling steadily never waits for the database: without it, every
 * request in flight when the trust ran out queued for its own lookup, which made the feed's tail.
 */
const RECHECK_MS = TRUST_MS / 2;
const MAX_ENTRIES = 5000;

interface Trusted {
  screen: KioskScreen;
  channelId: string | null;
  checkedAt: number;
}

/** A check's outcome: the screen and its channel, or the challenge of a refused token. */
type Outcome = Trusted | { challenge: string };

const trusted = new Map<string, Trusted>();
/** One database check per header at a time; concurrent requests share it. */
const checking = new Map<string, Promise<Outcome>>();
/** Bumped by every forget, so a check that was already running then does not bring back what was forgotten. */
let generation = 0;

/**
 * Ends the remembered sign-in of a revoked screen at once (the wiring calls it on `screenRevoked`).
 * @param screenId the revoked screen
 */
export function forgetKioskScreen(screenId: string): void {
  generation += 1;
  for (const [key, t] of trusted) if (t.screen.id === screenId) trusted.delete(key);
  checking.clear();
}

/** Forgets every remembered channel assignment: a screen moved, or its channel was removed (`channelChanged`). */
export function forgetKioskAssignments(): void {
  generation += 1;
  trusted.clear();
  checking.clear();
}

async function lookUp(header: string): Promise<Outcome> {
  const startedGeneration = generation;
  const checkedAt = Date.now();
  const check = await checkKioskToken(header);
  if ('challenge' in check) {
    trusted.delete(header);
    return check;
  }
  const row = await ChannelScreen.findByPk(check.screen.id);
  const outcome: Trusted = { screen: check.screen, channelId: row?.channelId ?? null, checkedAt };
  if (generation === startedGeneration) {
    if (trusted.size >= MAX_ENTRIES) trusted.clear();
    trusted.set(header, outcome);
  }
  return outcome;
}

/** The running check for this header, or a new one. */
function checkShared(header: string): Promise<Outcome> {
  const running = checking.get(header);
  if (running) return running;
  const job = lookUp(header).finally(() => {
    if (checking.get(header) === job) checking.delete(header);
  });
  checking.set(header, job);
  return job;
}

/**
 * The remembered check of this Authorization header while it is still trusted (and, past half its
 * time, the next check started in the background), without waiting; else undefined.
 * @param header the request's Authorization header
 */
export function trustedKioskCheck(header: string): { screen: KioskScreen; channelId: string | null } | undefined {
  const hit = trusted.get(header);
  if (!hit) return undefined;
  const age = Date.now() - hit.checkedAt;
  if (age >= TRUST_MS) return undefined;
  if (age >= RECHECK_MS && !checking.has(header)) {
    // A failed background check is only logged: the next request past the trust checks again and answers for it.
    checkShared(header).catch((error: unknown) => logger.warn({ err: error }, 'kiosk token recheck failed'));
  }
  return hit;
}

/**
 * requireKiosk for the feed, which players poll every half minute and which must answer a 304
 * without touching the database: the same check (Bearer token of a paired, unrevoked screen, else
 * 401 `kiosk_token_invalid`), remembered for a second together with the screen's channel and
 * renewed in the background before it runs out.
 * Sets req.kioskScreen and req.kioskChannelId.
 */
export const requireKioskFeed: RequestHandler = (req, res, next) => {
  const header = req.headers.authorization ?? '';
  const hit = trustedKioskCheck(header);
  if (hit) {
    req.kioskScreen = hit.screen;
    req.kioskChannelId = hit.channelId;
    return next();
  }
  checkShared(header).then((outcome) => {
    if ('challenge' in outcome) return refuseKiosk(res, next, outcome.challenge);
    req.kioskScreen = outcome.screen;
    req.kioskChannelId = outcome.channelId;
    next();
  }, next);
};
