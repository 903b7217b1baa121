import type { Request, Response } from 'express';

/**
 * If-None-Match against our ETag, with the weak comparison RFC 9110 §13.1.2 prescribes for this
 * header (a `W/` prefix is ignored); `*` matches anything.
 */
export function etagMatches(header: string | undefined, etag: string): boolean {
  if (!header) return false;
  // The usual case, a client sending back the tag it was given: no string work at all.
  if (header === etag) return true;
  if (header.trim() === '*') return true;
  const ours = etag.replace(/^W\//, '');
  return header.split(',').some((tag) => tag.trim().replace(/^W\//, '') === ours);
}

/**
 * Sends prepared bytes with a strong ETag, or 304 when the client already has them. The bytes are
 * never touched for a 304.
 * @param cacheControl the Cache-Control value for both answers
 */
export function sendCached(
  req: Request,
  res: Response,
  body: Buffer,
  etag: string,
  contentType: string,
  cacheControl: string,
): void {
  // A signed-in person's answers are never stored (see app.ts), public ones included.
  res.set({ ETag: etag, 'Cache-Control': req.user ? 'no-store' : cacheControl });
  if (etagMatches(req.get('if-none-match'), etag)) {
    res.status(304).end();
    return;
  }
  res.set({ 'Content-Type': contentType, 'Content-Length': String(body.length) });
  res.end(req.method === 'HEAD' ? undefined : body);
}
