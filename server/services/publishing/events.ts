import { EventEmitter } from 'node:events';

/** What the kiosk feed and public API caches react to. Emitted after the change has committed. */
export interface PublishingEventMap {
  /** A page's live version appeared or changed (published, or published again). */
  pagePublished: [{ pageId: string }];
  /** A page was taken off the kiosks and the public API. */
  pageUnpublished: [{ pageId: string }];
  /** An image's credit, licence, alt text, source or focal point changed. */
  mediaChanged: [{ mediaId: string }];
  /** A channel's name, slides, order or screens changed, or the channel was removed. */
  channelChanged: [{ channelId: string }];
  /** A kiosk screen's token was revoked (its cached sign-in must end at once). */
  screenRevoked: [{ screenId: string }];
  /** A kiosk screen's settings changed (its language): its cached sign-in, which carries them, is read again. */
  screenChanged: [{ screenId: string }];
}

/**
 * Domain events for publishing. One process only: other server instances notice the same changes
 * through the feed cache's fingerprint check, so a missed event costs at most that check's delay.
 */
export const publishingEvents = new EventEmitter<PublishingEventMap>();
publishingEvents.setMaxListeners(50);
