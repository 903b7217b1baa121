import { html, type Html } from './html.ts';

/** Where the public site's own files are served (no slug starts with "_"). */
export const ASSETS_PATH = '/explore/_assets';

/** What the head of a public page says about it (Open Graph included). */
export interface PageHead {
  title: string;
  description: string;
  /** The page's own absolute address (canonical, og:url). */
  url: string;
  /** BCP 47, for `<html lang>` and Content-Language. */
  lang: string;
  /** The site's name (the publisher). */
  siteName: string;
  /** The public Atom feed, absolute. */
  atomUrl: string;
  /** The same content as JSON, when there is one. */
  jsonUrl?: string;
  ogType: 'article' | 'website';
  image?: { url: string; alt: string } | null;
  /** The stylesheet's address with its version, so it can be cached for a year. */
  stylesheet: string;
}

const ogLocale = (lang: string) => lang.replace('-', '_');

/**
 * A whole public document: head with Open Graph and the feed link, a skip link, the site header,
 * the main landmark and the footer.
 * @param head what the head says
 * @param main the content of `<main>`
 * @param home the index's address
 */
export function layout(head: PageHead, main: Html, home: string): Html {
  return html`<!doctype html>
<html lang="${head.lang}">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<title>${head.title} · ${head.siteName}</title>
<meta name="description" content="${head.description}">
<link rel="canonical" href="${head.url}">
<meta property="og:type" content="${head.ogType}">
<meta property="og:site_name" content="${head.siteName}">
<meta property="og:title" content="${head.title}">
<meta property="og:description" content="${head.description}">
<meta property="og:url" content="${head.url}">
<meta property="og:locale" content="${ogLocale(head.lang)}">
${head.image ? html`<meta property="og:image" content="${head.image.url}">\n<meta property="og:image:alt" content="${head.image.alt}">\n` : ''}<link rel="alternate" type="application/atom+xml" title="${head.siteName}: newly published pages" href="${head.atomUrl}">
${head.jsonUrl ? html`<link rel="alternate" type="application/json" href="${head.jsonUrl}">\n` : ''}<link rel="stylesheet" href="${head.stylesheet}">
</head>
<body>
<a class="skip" href="#main">Skip to the content</a>
<header class="site">
<div class="wrap"><a class="site-name" href="${home}">${head.siteName}</a> <span class="site-tag">Explore the sky, with the working shown</span></div>
</header>
<main id="main" class="wrap">
${main}
</main>
<footer class="site">
<div class="wrap">
<p>Every number marked <span class="statement-key">✓</span> was worked out from sourced measurements and checked by our reviewers; open “How we know” beside it to see how.</p>
<nav aria-label="Public site"><ul><li><a href="${home}">All pages</a></li><li><a href="${head.atomUrl}">Atom feed of new pages</a></li></ul></nav>
</div>
</footer>
</body>
</html>
`;
}
