import type { FeedSky } from '@shared/schemas/kiosk-feed.ts';
import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { html, type Html } from './html.ts';
import { eyeSafety, withoutInlineNotice } from './page-view.ts';
import { withDisclosures } from './how-we-know.ts';
import { skyTonight } from './sky-view.ts';

/**
 * One page as an HTML fragment for another website: no document, no script, no style; every
 * address absolute; headings start at level 2 (the host page has its own h1); a link back to the
 * page on our site.
 * @param page the page as the public API gives it
 * @param siteName who publishes it
 */
export function pageFragment(page: PublicPageDto, siteName: string): Html {
  return html`<article class="starproof-embed" lang="${page.locale}">
<h2>${page.title}</h2>
${eyeSafety(page.eyeSafetyNotice)}
<div class="starproof-body">${withDisclosures(withoutInlineNotice(page), page.statements, page.locale, `starproof-${page.slug}-how-`)}</div>
<p class="starproof-source"><a href="${page.url}">Read this page and how we know each figure on ${siteName}</a></p>
</article>
`;
}

/** A venue's sky tonight as an HTML fragment for another website, with a link back to the full view. */
export function skyFragment(sky: FeedSky, fullUrl: string, siteName: string): Html {
  return html`<div class="starproof-embed">
${skyTonight(sky, 2)}
<p class="starproof-source"><a href="${fullUrl}">The sky tonight on ${siteName}</a></p>
</div>
`;
}
