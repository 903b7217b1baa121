import type { IncomingMessage, ServerResponse } from 'node:http';
import type { Request, RequestHandler, Response } from 'express';
import type { FrontAnswer } from '../front-door.ts';
import { currentKiosk } from '../middlewares/kiosk-auth.ts';
import { requireKioskFeed, trustedKioskCheck } from '../middlewares/kiosk-feed-auth.ts';
import { etagMatches, sendCached } from '../middlewares/http-cache.ts';
import { type CachedFeed, freshKioskFeed, getKioskFeed } from '../services/publishing/index.ts';

/**
 * `no-cache`: a player (or a cache in between) may keep the feed but must revalidate it every
 * time; revalidation is a cheap 304. `private`: the answer depends on the screen's token. A short
 * max-age would let a slide linger on screen after its page was unpublished.
 */
export const FEED_CACHE_CONTROL = 'private, no-cache';
export const FEED_CONTENT_TYPE = 'application/feed+json; charset=utf-8';

function sendFeed(req: Request, res: Response, feed: CachedFeed): void {
  res.setHeader('Vary', 'Authorization');
  sendCached(req, res, feed.body, feed.etag, FEED_CONTENT_TYPE, FEED_CACHE_CONTROL);
}

/**
 * The revalidation every screen makes every 30 s, answered with the headers sendCached would set
 * (a kiosk request never has a signed-in user, so the cache rule is the feed's own), set directly:
 * no header object to build, and the validator already compared. Only these: a 304 carries the
 * validators and cache rule of the answer it stands for (RFC 9110, 15.4.5) and the player or cache
 * keeps the other headers, the security headers among them, from the 200 it revalidates (RFC 9111, 4.3.4).
 */
function sendNotModified(res: ServerResponse, feed: CachedFeed): void {
  res.setHeader('Vary', 'Authorization');
  res.setHeader('ETag', feed.etag);
  res.setHeader('Cache-Control', FEED_CACHE_CONTROL);
  res.statusCode = 304;
  res.end();
}

/** The feed a screen polls, as cached: its channel (or its venue's, with none), in its language. */
function targetOf(screen: { venueId: string; language?: string | null }, channelId: string | null | undefined) {
  return { channelId: channelId ?? null, venueId: screen.venueId, language: screen.language ?? null };
}

/**
 * A revalidation from a screen whose token is trusted, of the feed in memory: answered 304 at once
 * (true), before the security headers (which a 304 does not carry) and the handlers below; else
 * false, having written nothing. Most requests a kiosk server answers are this one, so it does the
 * least work there is: one map lookup per step and three headers.
 */
function notModifiedFromMemory(req: IncomingMessage, res: ServerResponse): boolean {
  const validator = req.headers['if-none-match'];
  if (!validator) return false;
  const check = trustedKioskCheck(req.headers.authorization ?? '');
  const ready = check && freshKioskFeed(targetOf(check.screen, check.channelId));
  if (!ready || !etagMatches(validator, ready.etag)) return false;
  sendNotModified(res, ready);
  return true;
}

/** GET /api/kiosk/feed, exactly, answered ahead of Express when it can be a 304 from memory (server/front-door.ts). */
export const answerFeedNotModified: FrontAnswer = (req, res) =>
  req.method === 'GET' && req.url === '/api/kiosk/feed' && notModifiedFromMemory(req, res);

/** The same in the app, first on the feed's route, for the forms the front door leaves (a query string, HEAD). */
export const kioskFeedNotModified: RequestHandler = (req, res, next) => {
  if (!notModifiedFromMemory(req, res)) next();
};

/**
 * GET /api/kiosk/feed: the screen's channel as JSON Feed 1.1, with a strong ETag. Mounted by the app
 * as a route of its own (`app.get`) rather than a router, so a poll passes no mount or nested router;
 * a feed in memory is answered in the same tick, without a promise.
 */
export const kioskFeed: RequestHandler[] = [
  requireKioskFeed,
  (req, res, next) => {
    const target = targetOf(currentKiosk(req), req.kioskChannelId);
    const ready = freshKioskFeed(target);
    const validator = req.headers['if-none-match'];
    if (ready && validator && etagMatches(validator, ready.etag)) return sendNotModified(res, ready);
    if (ready && !validator) return sendFeed(req, res, ready);
    // A validator we do not hold may be newer than ours (another server served it): answer from a
    // check begun after this request arrived, so a player never steps back to an older feed.
    getKioskFeed(target, validator ? Date.now() : 0).then((feed) => sendFeed(req, res, feed), next);
  },
];
