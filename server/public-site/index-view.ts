import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { html, type Html } from './html.ts';
import { longDate } from './dates.ts';
import { aboutLine, description } from './page-view.ts';
import { pagePath } from './paths.ts';

/** A venue whose sky tonight has a public view. */
export interface VenueLink {
  name: string;
  url: string;
}

/**
 * The index of published pages, newest first, and the venues' skies tonight.
 * @param pages the published pages
 * @param venues venues with their "sky tonight" address
 */
export function indexMain(pages: PublicPageDto[], venues: VenueLink[]): Html {
  const list = pages.length
    ? html`<ul class="cards">${pages.map(
        (p) => html`<li class="card" lang="${p.locale}">
<h3><a href="${pagePath(p.slug)}">${p.title}</a></h3>
<p class="kicker">${aboutLine(p.object)}</p>
<p>${description(p)}</p>
${p.publishedAt ? html`<p class="meta">Published <time datetime="${p.publishedAt}">${longDate(p.publishedAt, p.locale)}</time></p>` : ''}
</li>`,
      )}</ul>`
    : html`<p>Nothing has been published yet. Come back soon.</p>`;
  const skies = venues.length
    ? html`<section aria-labelledby="sky-h"><h2 id="sky-h">The sky tonight</h2><ul class="venues">${venues.map(
        (v) => html`<li><a href="${v.url}">The sky tonight from ${v.name}</a></li>`,
      )}</ul></section>`
    : '';
  return html`<h1>Explore the sky</h1>
<p class="lead">Pages about objects in the sky. Every figure on them was worked out from sourced measurements and checked by our reviewers: open “How we know” under a figure to see the measurements, their sources and how the figure follows.</p>
<section aria-labelledby="pages-h"><h2 id="pages-h">Pages</h2>${list}</section>
${skies}`;
}
