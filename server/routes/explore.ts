import fs from 'node:fs';
import { createRequire } from 'node:module';
import { Router, type Request, type RequestHandler, type Response } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { config } from '../config.ts';
import { HttpError, NotFoundError } from '../errors.ts';
import { sendCached } from '../middlewares/http-cache.ts';
import {
  exploreIndexUrl,
  getPublicPages,
  listPublicVenues,
  prepare,
  type Prepared,
  publicBaseUrl,
  venueSkyTonight,
} from '../services/publishing/index.ts';
import { pageFragment, skyFragment } from '../public-site/embed-view.ts';
import type { Html } from '../public-site/html.ts';
import { indexMain } from '../public-site/index-view.ts';
import { ASSETS_PATH, layout, type PageHead } from '../public-site/layout.ts';
import { notFoundMain } from '../public-site/not-found-view.ts';
import { description, pageMain, previewImage } from '../public-site/page-view.ts';
import { EXPLORE_PATH, venueSkyPath } from '../public-site/paths.ts';
import { sitemapXml } from '../public-site/sitemap.ts';
import { skyTonight } from '../public-site/sky-view.ts';
import { PUBLIC_CACHE_CONTROL } from './public/index.ts';
import { TalliedPgRateLimitStore } from '../middlewares/rate-limit-store.ts';

const HTML = 'text/html; charset=utf-8';
const SITE_NAME = config.publisherName;
/** The words around the pages (header, footer, index, notices) are English; a page's own text is in its locale. */
const SITE_LANG = 'en';

const require = createRequire(import.meta.url);
const stylesheet = prepare(fs.readFileSync(new URL('../public-site/explore.css', import.meta.url)));
const STYLESHEET_URL = `${ASSETS_PATH}/explore.css?v=${stylesheet.etag.slice(1, 13)}`;
/** Our two typefaces, served from their packages (the staff app bundles the same files). */
const FONTS: Record<string, string> = {
  'serif.woff2': '@fontsource-variable/source-serif-4/files/source-serif-4-latin-wght-normal.woff2',
  'sans.woff2': '@fontsource-variable/inter/files/inter-latin-wght-normal.woff2',
};
const fonts = new Map(Object.entries(FONTS).map(([name, file]) => [name, prepare(fs.readFileSync(require.resolve(file)))]));
const IMMUTABLE = 'public, max-age=31536000, immutable';

const limiter = rateLimit({
  windowMs: 60_000,
  limit: config.limits.publicApi,
  store: new TalliedPgRateLimitStore('explore'),
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  handler: (_req, _res, next) =>
    next(new HttpError(429, 'too_many_requests', 'Too many requests from this address. Wait a minute and try again.')),
});

const head = (over: Partial<PageHead> & Pick<PageHead, 'title' | 'description' | 'url'>): PageHead => ({
  lang: SITE_LANG,
  siteName: SITE_NAME,
  atomUrl: `${publicBaseUrl()}/api/public/pages.atom`,
  ogType: 'website',
  stylesheet: STYLESHEET_URL,
  ...over,
});

const document = (h: PageHead, main: Html) => `${layout(h, main, EXPLORE_PATH).value}`;

/** Sends rendered HTML with its ETag and the language of its content. */
function sendHtml(req: Request, res: Response, page: Prepared, lang: string, type = HTML): void {
  res.set('Content-Language', lang);
  sendCached(req, res, page.body, page.etag, type, PUBLIC_CACHE_CONTROL);
}

/** Renders once per build of the published pages (the map is dropped whenever they change). */
async function rendered(key: string, make: (pages: PublicPageDto[]) => Promise<string> | string): Promise<Prepared> {
  const published = await getPublicPages();
  let found = published.rendered.get(key);
  if (!found) {
    found = prepare(await make(published.pages));
    published.rendered.set(key, found);
  }
  return found;
}

const findPage = async (slugOrId: string) =>
  (await getPublicPages()).pages.find((p) => p.slug === slugOrId.toLowerCase() || p.id === slugOrId.toLowerCase());

const venueLinks = async () => (await listPublicVenues()).map((v) => ({ name: v.name, url: venueSkyPath(v.slug) }));

/** Fragments may be read by any website (fetch with CORS) and shown there; nothing else about them is open. */
const openToOtherSites: RequestHandler = (req, res, next) => {
  res.set({
    'Access-Control-Allow-Origin': '*',
    'Access-Control-Allow-Methods': 'GET, HEAD, OPTIONS',
    'Access-Control-Allow-Headers': 'If-None-Match, Accept',
    'Access-Control-Expose-Headers': 'ETag, Content-Language',
    'Access-Control-Max-Age': '86400',
    'Cross-Origin-Resource-Policy': 'cross-origin',
  });
  if (req.method === 'OPTIONS') {
    res.status(204).end();
    return;
  }
  next();
};

/**
 * The public site: server-rendered pages that show their working (`/explore`), the sitemap, and
 * HTML fragments other websites can embed (`/embed`). No sign-in, no session, no script.
 */
export const exploreRouter = Router();
// Our own stylesheet and fonts are not counted: a class on one school network reading pages at once
// would otherwise use up the allowance four times as fast.
exploreRouter.get(`${ASSETS_PATH}/explore.css`, (req, res) => {
  sendCached(req, res, stylesheet.body, stylesheet.etag, 'text/css; charset=utf-8', IMMUTABLE);
});

exploreRouter.get(`${ASSETS_PATH}/:font`, (req, res) => {
  const font = fonts.get(req.params.font);
  if (!font) throw NotFoundError('There is no such file.');
  sendCached(req, res, font.body, font.etag, 'font/woff2', IMMUTABLE);
});

exploreRouter.use([EXPLORE_PATH, '/embed', '/sitemap.xml'], limiter);

exploreRouter.get(EXPLORE_PATH, async (req, res) => {
  const venues = await venueLinks();
  const page = await rendered(`index:${venues.map((v) => v.url).join(',')}`, (pages) =>
    document(
      head({
        title: 'Explore the sky',
        description: 'Pages about objects in the sky, with every figure worked out from sourced measurements and checked.',
        url: exploreIndexUrl(),
      }),
      indexMain(pages, venues),
    ),
  );
  sendHtml(req, res, page, SITE_LANG);
});

exploreRouter.get(`${EXPLORE_PATH}/venues/:venue/sky-tonight`, async (req, res) => {
  const found = await venueSkyTonight(String(req.params.venue));
  if (!found) return notFound(res);
  const body = document(
    head({
      title: `The sky tonight from ${found.venue.name}`,
      description: `Sunset, darkness, the Moon and the planets tonight from ${found.venue.name}, in local time.`,
      url: `${publicBaseUrl()}${venueSkyPath(found.venue.slug)}`,
    }),
    skyTonight(found.sky, 1),
  );
  sendHtml(req, res, prepare(body), SITE_LANG);
});

exploreRouter.get(`${EXPLORE_PATH}/:slug`, async (req, res) => {
  const found = await findPage(String(req.params.slug));
  if (!found) return notFound(res);
  const page = await rendered(`page:${found.id}`, () =>
    document(
      head({
        title: found.title,
        description: description(found),
        url: found.url,
        lang: found.locale,
        ogType: 'article',
        image: previewImage(found),
        jsonUrl: `${publicBaseUrl()}/api/public/pages/${encodeURIComponent(found.slug)}`,
      }),
      pageMain(found),
    ),
  );
  sendHtml(req, res, page, found.locale);
});

exploreRouter.get('/sitemap.xml', async (req, res) => {
  const venues = await listPublicVenues();
  const skyUrls = venues.map((v) => `${publicBaseUrl()}${venueSkyPath(v.slug)}`);
  const map = await rendered(`sitemap:${skyUrls.join(',')}`, (pages) => sitemapXml(exploreIndexUrl(), pages, skyUrls));
  sendCached(req, res, map.body, map.etag, 'application/xml; charset=utf-8', PUBLIC_CACHE_CONTROL);
});

exploreRouter.use('/embed', openToOtherSites);

exploreRouter.get('/embed/pages/:slug', async (req, res) => {
  const found = await findPage(String(req.params.slug));
  if (!found) throw NotFoundError('There is no published page with this name or id.');
  const fragment = await rendered(`embed:${found.id}`, () => pageFragment(found, SITE_NAME).value);
  sendHtml(req, res, fragment, found.locale);
});

exploreRouter.get('/embed/venues/:venue/sky-tonight', async (req, res) => {
  const found = await venueSkyTonight(String(req.params.venue));
  if (!found) throw NotFoundError('There is no venue with this name or id.');
  const full = `${publicBaseUrl()}${venueSkyPath(found.venue.slug)}`;
  sendHtml(req, res, prepare(skyFragment(found.sky, full, SITE_NAME).value), SITE_LANG);
});

exploreRouter.get(`${EXPLORE_PATH}/{*rest}`, (_req, res) => notFound(res));

/** An address under /explore with nothing published there: a page in words, with the way back. */
function notFound(res: Response): void {
  const body = document(
    head({ title: 'Page not found', description: 'There is no published page at this address.', url: exploreIndexUrl() }),
    notFoundMain(EXPLORE_PATH),
  );
  res.status(404).set({ 'Content-Type': HTML, 'Content-Language': SITE_LANG, 'Cache-Control': 'public, max-age=60' }).send(body);
}
