import type { RequestHandler } from 'express';
import { HttpError } from '../errors.ts';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Cross-site request forgery guard for state-changing requests: the browser's Origin (or, when a
 * browser omits it, Sec-Fetch-Site) must name this site. Non-browser clients send neither and carry
 * no victim's cookie, so they pass. Together with SameSite=Lax cookies this is our CSRF defence.
 */
export const sameOrigin: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const origin = req.get('origin');
  if (origin) {
    const host = req.get('x-forwarded-host') ?? req.get('host');
    let originHost: string | undefined;
    try {
      originHost = new URL(origin).host;
    } catch {
      originHost = undefined;
    }
    if (originHost !== host)
      return next(new HttpError(403, 'cross_site_request', 'This request came from another site and was refused.'));
    return next();
  }
  const site = req.get('sec-fetch-site');
  if (site && site !== 'same-origin' && site !== 'none') {
    return next(new HttpError(403, 'cross_site_request', 'This request came from another site and was refused.'));
  }
  next();
};
