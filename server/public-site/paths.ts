/**
 * Root-relative addresses for moving around the public site: they work whatever host the visitor
 * reached us by. Addresses given to others (canonical, Open Graph, feeds, sitemap) are absolute,
 * from the publishing service's URL builder.
 */
export const EXPLORE_PATH = '/explore';

/** A published page's path on this site. */
export const pagePath = (slug: string): string => `${EXPLORE_PATH}/${encodeURIComponent(slug)}`;

/** A venue's sky tonight on this site. */
export const venueSkyPath = (venueSlug: string): string => `${EXPLORE_PATH}/venues/${encodeURIComponent(venueSlug)}/sky-tonight`;
