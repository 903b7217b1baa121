import { Router } from 'express';
import { currentKiosk } from '../middlewares/kiosk-auth.ts';
import { requireKioskFeed } from '../middlewares/kiosk-feed-auth.ts';
import { sendCached } from '../middlewares/http-cache.ts';
import { getKioskFeed } from '../services/publishing/index.ts';

/**
 * `no-cache`: a player (or a cache in between) may keep the feed but must revalidate it every
 * time; revalidation is a cheap 304. `private`: the answer depends on the screen's token. A short
 * max-age would let a slide linger on screen after its page was unpublished.
 */
export const FEED_CACHE_CONTROL = 'private, no-cache';
export const FEED_CONTENT_TYPE = 'application/feed+json; charset=utf-8';

/** GET /api/kiosk/feed: the screen's channel as JSON Feed 1.1, with a strong ETag. */
export const kioskFeedRouter = Router();

kioskFeedRouter.get('/', requireKioskFeed, async (req, res) => {
  const screen = currentKiosk(req);
  const feed = await getKioskFeed({ channelId: req.kioskChannelId ?? null, venueId: screen.venueId });
  res.set('Vary', 'Authorization');
  sendCached(req, res, feed.body, feed.etag, FEED_CONTENT_TYPE, FEED_CACHE_CONTROL);
});
