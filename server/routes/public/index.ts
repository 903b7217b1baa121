import { type Request, type RequestHandler, type Response, Router } from 'express';
import { PublicLangQuerySchema } from '@shared/schemas/page-version.ts';
import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { rateLimit } from 'express-rate-limit';
import { TalliedPgRateLimitStore } from '../../middlewares/rate-limit-store.ts';
import { appBaseUrl, config } from '../../config.ts';
import { HttpError, NotFoundError } from '../../errors.ts';
import { etagMatches, sendCached } from '../../middlewares/http-cache.ts';
import { validateQuery } from '../../middlewares/validate.ts';
import {
  atomDocument,
  getPublicPages,
  negotiatedList,
  negotiatedPage,
  type PublicPages,
  prepare,
} from '../../services/publishing/index.ts';

/**
 * Browsers and CDNs may reuse an answer for a minute, then must revalidate (a cheap 304). A page
 * taken down leaves the venue's website within that minute; kiosks revalidate every time.
 */
export const PUBLIC_CACHE_CONTROL = 'public, max-age=60, must-revalidate';
const PUBLISHER = config.publisherName;

const limiter = rateLimit({
  windowMs: 60_000,
  limit: config.limits.publicApi,
  store: new TalliedPgRateLimitStore('public'),
  standardHeaders: 'draft-8',
  legacyHeaders: false,
  handler: (_req, _res, next) =>
    next(
      new HttpError(
        429,
        'too_many_requests',
        'Too many requests to the public API from this address. Wait a minute and try again.',
      ),
    ),
});

/** Open CORS for reading only: any website may GET; no cookies are honoured across sites. */
const cors: RequestHandler = (req, res, next) => {
  res.set({
    'Access-Control-Allow-Origin': '*',
    'Access-Control-Allow-Methods': 'GET, HEAD, OPTIONS',
    'Access-Control-Allow-Headers': 'If-None-Match, Accept',
    'Access-Control-Expose-Headers': 'ETag, Link, RateLimit, RateLimit-Policy, Retry-After',
    'Access-Control-Max-Age': '86400',
    'Cross-Origin-Resource-Policy': 'cross-origin',
  });
  if (req.method === 'OPTIONS') {
    res.status(204).end();
    return;
  }
  if (req.method !== 'GET' && req.method !== 'HEAD') {
    res.set('Allow', 'GET, HEAD, OPTIONS');
    next(new HttpError(405, 'method_not_allowed', 'The public API is read-only.'));
    return;
  }
  next();
};

/**
 * Links in Atom must be absolute: always the configured base (PUBLIC_URL, else the address the
 * server listens on), never the request's Host header, which anyone can set and which would then
 * sit in a publicly cached document. Production refuses to start without PUBLIC_URL.
 */
const atomBaseUrl = () => appBaseUrl().replace(/\/+$/, '');

/** GET /api/public/…: published pages for the venue's website, read-only and without sign-in. */
export const publicRouter = Router();
publicRouter.use(cors, limiter);

/**
 * The published pages for this request. A validator (If-None-Match) this server does not hold may be
 * newer than its own answer (another server served it): then the answer comes from a check begun after
 * the request arrived, so a reader never steps back to an older version.
 * @param current the ETag this server would answer with, from the pages in memory
 */
async function pagesFor(req: Request, current: (pages: PublicPages) => string | undefined): Promise<PublicPages> {
  const validator = req.get('if-none-match');
  const arrived = Date.now();
  const pages = await getPublicPages();
  if (!validator || etagMatches(validator, current(pages) ?? '')) return pages;
  return getPublicPages(arrived);
}

/**
 * The reader's Accept-Language ranges, best first (negotiator, through Express: q-values, `q=0`
 * left out, ties in the header's order), or null when the header is absent or empty.
 */
function rankedLanguages(req: Request): string[] | null {
  if (!req.get('accept-language')?.trim()) return null;
  return req.acceptsLanguages();
}

/** The headers of a negotiated answer: which language it is in, its alternates, and that it varies by Accept-Language. */
function languageHeaders(res: Response, page: PublicPageDto | null): void {
  res.vary('Accept-Language');
  if (!page) return;
  res.set('Content-Language', page.locale);
  if (page.alternates.length > 1) {
    const links = page.alternates.map((a) => `<${a.href}>; rel="alternate"; hreflang="${a.hreflang}"`);
    const fallback = page.alternates.find((a) => a.isDefault);
    if (fallback) links.push(`<${fallback.href}>; rel="alternate"; hreflang="x-default"`);
    res.set('Link', links.join(', '));
  }
}

/** Every published page; with `?lang=` or Accept-Language, one language version of each. */
publicRouter.get('/pages', validateQuery(PublicLangQuerySchema), async (req, res) => {
  const ranked = rankedLanguages(req);
  const pages = await pagesFor(req, (p) => negotiatedList(p, req.query.lang, ranked).etag);
  const list = negotiatedList(pages, req.query.lang, ranked);
  languageHeaders(res, null);
  sendCached(req, res, list.body, list.etag, 'application/json; charset=utf-8', PUBLIC_CACHE_CONTROL);
});

publicRouter.get('/pages.atom', async (req, res) => {
  const base = atomBaseUrl();
  const published = await pagesFor(req, (pages) => pages.atom.get(base)?.etag);
  let doc = published.atom.get(base);
  if (!doc) {
    // One base in use; the map only outlives a change of setting in tests.
    if (published.atom.size >= 8) published.atom.clear();
    doc = prepare(atomDocument(published.pages, base, PUBLISHER));
    published.atom.set(base, doc);
  }
  sendCached(req, res, doc.body, doc.etag, 'application/atom+xml; charset=utf-8', PUBLIC_CACHE_CONTROL);
});

/**
 * One published page, in the language version the reader asks for (`?lang=`, else Accept-Language,
 * else the version the address names; the page's default version when their languages are not there).
 */
publicRouter.get('/pages/:slugOrId', validateQuery(PublicLangQuerySchema), async (req, res) => {
  const slugOrId = String((req.params as { slugOrId: string }).slugOrId).toLowerCase();
  const ranked = rankedLanguages(req);
  const pages = await pagesFor(req, (p) => negotiatedPage(p, slugOrId, req.query.lang, ranked)?.prepared.etag);
  const found = negotiatedPage(pages, slugOrId, req.query.lang, ranked);
  if (!found) throw NotFoundError('There is no published page with this name or id.');
  languageHeaders(res, found.page);
  sendCached(req, res, found.prepared.body, found.prepared.etag, 'application/json; charset=utf-8', PUBLIC_CACHE_CONTROL);
});

publicRouter.use((req, _res, next) =>
  next(NotFoundError(`There is no public API endpoint ${req.method} ${req.originalUrl.split('?')[0]}.`)),
);
