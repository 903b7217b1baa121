import type { Request, RequestHandler } from 'express';
import { config } from '../config.ts';
import { HttpError } from '../errors.ts';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * This site's origin (scheme, host and port): PUBLIC_URL's when set; otherwise the scheme and
 * host the request came to, where X-Forwarded-Proto and X-Forwarded-Host count only from a
 * trusted proxy (Express's `req.protocol` and `req.host` follow the `trust proxy` setting).
 */
function ownOrigin(req: Request): string | undefined {
  if (config.publicUrl) {
    try {
      return new URL(config.publicUrl).origin;
    } catch {
      return undefined;
    }
  }
  return req.host ? `${req.protocol}://${req.host}` : undefined;
}

function originOf(value: string): string | undefined {
  try {
    return new URL(value).origin;
  } catch {
    return undefined;
  }
}

const refused = () => new HttpError(403, 'cross_site_request', 'This request came from another site and was refused.');

/**
 * Cross-site request forgery guard for state-changing requests: the browser's Origin (or, when a
 * browser omits it, Sec-Fetch-Site) must name this site, scheme included. Non-browser clients send
 * neither and carry no victim's cookie, so they pass. Together with SameSite=Lax cookies this is
 * our CSRF defence.
 */
export const sameOrigin: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const origin = req.get('origin');
  if (origin) {
    const theirs = originOf(origin);
    // `new URL('null').origin` does not parse; an opaque origin never matches.
    if (!theirs || theirs === 'null' || theirs !== ownOrigin(req)) return next(refused());
    return next();
  }
  const site = req.get('sec-fetch-site');
  if (site && site !== 'same-origin' && site !== 'none') return next(refused());
  next();
};
