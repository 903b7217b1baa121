import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { KIND_LABELS, type SkyObjectKind } from '@shared/catalogue/kinds.ts';
import { html, type Html } from './html.ts';
import { EXPLORE_PATH } from './paths.ts';
import { longDate } from './dates.ts';
import { safeLink, withDisclosures } from './how-we-know.ts';

/** "Galaxy", or nothing for an unknown kind. */
export const kindLabel = (kind: string): string => KIND_LABELS[kind as SkyObjectKind] ?? '';

/** "Andromeda Galaxy · Galaxy"; the kind once when it is the name ("Sun"). */
export function aboutLine(object: PublicPageDto['object']): string {
  const kind = kindLabel(object.kind);
  return [object.name, kind.toLowerCase() === object.name.toLowerCase() ? '' : kind].filter(Boolean).join(' · ');
}

/** The eye-safety notice, first thing under the title, when the page is about looking at the Sun. */
export const eyeSafety = (notice: string | null): Html | '' =>
  notice ? html`<aside class="eye-safety" aria-label="Eye safety"><p><strong>Eye safety.</strong> ${notice}</p></aside>` : '';

/**
 * The page HTML without the writer's inline eye-safety notice when the same notice heads the page,
 * so a visitor reads it once, and first.
 */
export const withoutInlineNotice = (page: PublicPageDto): string =>
  page.eyeSafetyNotice ? page.html.replace(/<aside class="eye-safety-notice"[^>]*>[\s\S]*?<\/aside>/g, '') : page.html;

/** Every picture on the page with who made it, its licence and where it comes from. */
function pictureCredits(page: PublicPageDto): Html | '' {
  if (!page.images.length) return '';
  return html`<section class="credits" aria-labelledby="credits-h"><h2 id="credits-h">Picture credits</h2><ul>${page.images.map(
    (img) =>
      html`<li><span class="credit-alt">${img.altText}</span> — ${img.credit}. Licence: ${safeLink(img.licenceUrl, img.licence)}. ${safeLink(img.sourceUrl, 'Source of the picture')}.</li>`,
  )}</ul></section>`;
}

/**
 * The body of a page's public view: what it is about, its title and date, the eye-safety notice
 * where it applies, the page text with a "How we know" disclosure under each checked statement,
 * and the picture credits.
 * @param page the page as the public API gives it
 */
export function pageMain(page: PublicPageDto): Html {
  const about = aboutLine(page.object);
  return html`<article class="page" lang="${page.locale}">
<header class="page-head">
${about ? html`<p class="kicker">${about}</p>` : ''}<h1>${page.title}</h1>
${page.publishedAt ? html`<p class="meta">Published <time datetime="${page.publishedAt}">${longDate(page.publishedAt, page.locale)}</time></p>` : ''}
</header>
${eyeSafety(page.eyeSafetyNotice)}
<div class="page-body">${withDisclosures(withoutInlineNotice(page), page.statements, page.locale)}</div>
${pictureCredits(page)}
</article>
<p class="back"><a href="${EXPLORE_PATH}">All pages</a></p>`;
}

/** The page's first picture for link previews (Open Graph), if it has one with an address. */
export function previewImage(page: PublicPageDto): { url: string; alt: string } | null {
  const img = page.images.find((i) => i.url);
  return img ? { url: img.url!, alt: img.altText } : null;
}

/** An excerpt for a list or a link preview: the summary, or the title when the page opens without a paragraph. */
export const description = (page: PublicPageDto): string => page.summary || page.title;
