import { appBaseUrl } from '../../config.ts';

/**
 * The addresses of the public site, shared by every output that links to it (public API, Atom,
 * kiosk feed, the public pages themselves, and the QR codes on kiosk slides). All absolute, from
 * PUBLIC_URL (or the address the server listens on), never from a request's Host header.
 */

/** The configured base without a trailing slash, e.g. https://starproof.example.org. */
export const publicBaseUrl = (): string => appBaseUrl().replace(/\/+$/, '');

/** The index of published pages: `${appBaseUrl()}/explore`. */
export const exploreIndexUrl = (): string => `${publicBaseUrl()}/explore`;

/**
 * The public page of a published page: `${appBaseUrl()}/explore/<slug>`.
 * @param slug the slug the public pages give it (public-pages.ts), never a title
 */
export const publicPageUrl = (slug: string): string => `${exploreIndexUrl()}/${encodeURIComponent(slug)}`;

/**
 * An address made absolute against the public base: one that is already absolute (a CDN's) is
 * kept as it is; a path on this server (`/media/files/…`) gets the base in front.
 */
export function absoluteUrl(url: string): string;
export function absoluteUrl(url: string | null): string | null;
export function absoluteUrl(url: string | null): string | null {
  if (url === null || /^[a-z][a-z0-9+.-]*:/i.test(url)) return url;
  return `${publicBaseUrl()}${url.startsWith('/') ? '' : '/'}${url}`;
}

/**
 * Page HTML with this server's image addresses made absolute, so the HTML can be shown on another
 * site as it is. Only `src` and `href` values that start with one "/" are touched (our renderer
 * writes image sources as `/media/files/…`; links are http, https or mailto already).
 */
export function absoluteHtml(html: string): string {
  return html.replace(/\s(src|href)="\/(?!\/)/g, (_whole, attr: string) => ` ${attr}="${publicBaseUrl()}/`);
}
