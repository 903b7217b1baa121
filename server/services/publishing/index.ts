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
export {
  getPublicPages,
  invalidatePublicPages,
  negotiatedList,
  negotiatedPage,
  type PublicPages,
  prepare,
  type Prepared,
} from './public-pages.ts';
export { listPublicVenues, venueSkyTonight } from './public-sky.ts';
export { exploreIndexUrl, publicBaseUrl, publicPageUrl } from './public-urls.ts';
export type { ChannelDetailContext } from './channel-view.ts';
export type { ChannelRowContext } from './channel-view.ts';
export { listChannels } from './channel-view.ts';
export { loadChannelDetail } from './channel-view.ts';
export { loadChannelRows } from './channel-view.ts';
export { addScreen } from './kiosk-screens.ts';
export { countScreens } from './kiosk-screens.ts';
export { countScreensByVenue } from './kiosk-screens.ts';
export { listScreens } from './kiosk-screens.ts';
export { removeScreen } from './kiosk-screens.ts';
export { recordHeartbeat } from './kiosk-screens.ts';
export { setScreenLanguage } from './kiosk-screens.ts';
export { setScreenOrientation } from './kiosk-screens.ts';
export { reportSilentScreens, runScreenSilenceJob, SCREEN_SILENCE_JOB } from './screen-silence.ts';
export { playerAddress } from './player-address.ts';
