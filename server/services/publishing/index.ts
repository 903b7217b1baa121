/**
 * Publishing: kiosk channels, slides and screens, the kiosk feed, and the public API and Atom feed.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { createChannel, deleteChannel, updateChannel } from './channel-save.ts';
export { assignScreens } from './channel-screens.ts';
export { addSlide, removeSlide, reorderSlides, updateSlide } from './channel-slides.ts';
export { channelsUsingMedia } from './channel-media.ts';
export { loadSlideSources } from './channel-sources.ts';
export { publishingEvents } from './events.ts';
export { inWindow } from './feed-build.ts';
export { type CachedFeed, freshKioskFeed, getKioskFeed, invalidateKioskFeeds } from './feed-cache.ts';
export { issuePairingCode, pairScreen, revokeScreen } from './kiosk-pairing.ts';
export { atomDocument } from './public-atom.ts';
export { getPublicPages, invalidatePublicPages, prepare } from './public-pages.ts';
