import type { Request, RequestHandler, Response } from 'express';
import { currentKiosk } from '../middlewares/kiosk-auth.ts';
import { requireKioskFeed } from '../middlewares/kiosk-feed-auth.ts';
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
 * no header object to build, and the validator already compared.
 */
function sendNotModified(res: Response, feed: CachedFeed): void {
  res.setHeader('Vary', 'Authorization');
  res.setHeader('ETag', feed.etag);
  res.setHeader('Cache-Control', FEED_CACHE_CONTROL);
  res.statusCode = 304;
  res.end();
}

/**
 * GET /api/kiosk/feed: the screen's channel as JSON Feed 1.1, with a strong ETag. Mounted by the app
 * as a route of its own (`app.get`) rather than a router, so a poll passes no mount or nested router;
 * a feed in memory is answered in the same tick, without a promise.
 */
export const kioskFeed: RequestHandler[] = [
  requireKioskFeed,
  (req, res, next) => {
    const screen = currentKiosk(req);
    const target = { channelId: req.kioskChannelId ?? null, venueId: screen.venueId, language: screen.language ?? null };
    const ready = freshKioskFeed(target);
    const validator = req.headers['if-none-match'];
    if (ready && validator && etagMatches(validator, ready.etag)) return sendNotModified(res, ready);
    if (ready && !validator) return sendFeed(req, res, ready);
    // A validator we do not hold may be newer than ours (another server served it): answer from a
    // check begun after this request arrived, so a player never steps back to an older feed.
    getKioskFeed(target, validator ? Date.now() : 0).then((feed) => sendFeed(req, res, feed), next);
  },
];
