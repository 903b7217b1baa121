import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { escapeHtml } from './html.ts';

/**
 * A sitemap (sitemaps.org protocol 0.9) of the public site: the index, every published page with
 * the date it was published, and each venue's sky tonight. Addresses absolute, escaped for XML.
 * @param indexUrl the index's absolute address
 * @param pages the published pages (their `url` is absolute)
 * @param skyUrls each venue's sky tonight, absolute
 */
export function sitemapXml(indexUrl: string, pages: PublicPageDto[], skyUrls: string[]): string {
  const entry = (loc: string, lastmod?: string | null, changefreq?: string) =>
    `  <url><loc>${escapeHtml(loc)}</loc>${lastmod ? `<lastmod>${escapeHtml(lastmod)}</lastmod>` : ''}${changefreq ? `<changefreq>${changefreq}</changefreq>` : ''}</url>`;
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<urlset xmlns="http://www.sitemaps.org/schemas/sitemap/0.9">',
    entry(indexUrl, pages[0]?.publishedAt ?? null, 'daily'),
    ...pages.map((p) => entry(p.url, p.publishedAt)),
    ...skyUrls.map((u) => entry(u, null, 'daily')),
    '</urlset>',
    '',
  ].join('\n');
}
