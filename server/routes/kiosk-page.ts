import fs from 'node:fs';
import path from 'node:path';
import type { RequestHandler } from 'express';

/**
 * GET /kiosk: the player's own HTML entry (kiosk.html in the build). Never cached, so a new
 * player reaches screens at their next reload; the service worker keeps a copy for outages. Its
 * Content-Security-Policy allows framing by this site only, for the staff app's live preview.
 * @param dist the build folder
 */
export function kioskPage(dist: string): RequestHandler {
  const file = path.join(dist, 'kiosk.html');
  return (_req, res, next) => {
    if (!fs.existsSync(file)) return next();
    const csp = String(res.getHeader('Content-Security-Policy') ?? '').replace(
      "frame-ancestors 'none'",
      "frame-ancestors 'self'",
    );
    res.set({ 'Cache-Control': 'no-cache', 'Content-Security-Policy': csp, 'X-Frame-Options': 'SAMEORIGIN' });
    // `dotfiles: 'allow'`: the build folder may sit under a dot folder (e.g. .data/dist-…).
    res.sendFile(file, { dotfiles: 'allow' });
  };
}
