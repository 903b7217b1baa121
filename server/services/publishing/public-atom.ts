import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { escapeMarkup, xmlSafe } from './feed-text.ts';

/** How many of the most recently published pages the Atom feed lists. */
export const ATOM_ENTRIES = 50;

const x = (value: string) => escapeMarkup(xmlSafe(value));
const EPOCH = '1970-01-01T00:00:00.000Z';

/**
 * An Atom 1.0 document (RFC 4287) of the most recently published pages: every text escaped, the
 * page HTML carried as escaped `type="html"` content, links absolute (each entry's public page first,
 * then its JSON).
 * @param pages published pages, newest first
 * @param baseUrl e.g. https://starproof.example.org (no trailing slash)
 * @param publisher the feed's author name
 */
export function atomDocument(pages: PublicPageDto[], baseUrl: string, publisher: string): string {
  const self = `${baseUrl}/api/public/pages.atom`;
  const recent = pages.slice(0, ATOM_ENTRIES);
  const updated = recent.reduce((latest, p) => (p.publishedAt && p.publishedAt > latest ? p.publishedAt : latest), EPOCH);
  const entries = recent.map((p) => {
    const at = p.publishedAt ?? EPOCH;
    return [
      '  <entry>',
      `    <id>urn:uuid:${x(p.id)}</id>`,
      `    <title type="text">${x(p.title)}</title>`,
      `    <updated>${x(at)}</updated>`,
      `    <published>${x(at)}</published>`,
      `    <link rel="alternate" type="text/html" href="${x(p.url)}"/>`,
      `    <link rel="alternate" type="application/json" href="${x(`${baseUrl}/api/public/pages/${encodeURIComponent(p.slug)}`)}"/>`,
      p.object.name ? `    <category term="${x(p.object.kind || 'object')}" label="${x(p.object.name)}"/>` : '',
      `    <summary type="text">${x(p.summary)}</summary>`,
      `    <content type="html">${x(p.html)}</content>`,
      '  </entry>',
    ]
      .filter(Boolean)
      .join('\n');
  });
  return [
    '<?xml version="1.0" encoding="utf-8"?>',
    '<feed xmlns="http://www.w3.org/2005/Atom">',
    `  <id>${x(self)}</id>`,
    `  <title type="text">${x(`${publisher}: newly published pages`)}</title>`,
    `  <updated>${updated}</updated>`,
    `  <link rel="self" type="application/atom+xml" href="${x(self)}"/>`,
    `  <author><name>${x(publisher)}</name></author>`,
    '  <generator>Starproof</generator>',
    ...entries,
    '</feed>',
    '',
  ].join('\n');
}
