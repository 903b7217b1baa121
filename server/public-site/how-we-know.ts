import type { PublicStatementDto } from '@shared/schemas/public-page.ts';
import { html, type Html, trusted } from './html.ts';
import { longDate } from './dates.ts';

const EXCERPT = 70;

/** A link only for http(s) addresses: a source's stored URL is typed by staff and is never trusted as a scheme. */
export const safeLink = (url: string | null, text: string): Html =>
  url && /^https?:\/\//i.test(url) ? html`<a href="${url}" rel="noopener noreferrer">${text}</a>` : html`${text}`;

function excerpt(text: string): string {
  if (text.length <= EXCERPT) return text;
  const cut = text.slice(0, EXCERPT - 1);
  const space = cut.lastIndexOf(' ');
  return `${space > EXCERPT * 0.6 ? cut.slice(0, space) : cut}…`;
}

/**
 * One statement's "How we know" disclosure: the measurements with their sources (links), the
 * model and the formula in words, every other source the working names, and when it was last
 * checked. A closed `<details>`, so the page reads without it and works without JavaScript.
 * @param statement the statement as the public API gives it
 * @param id the disclosure's id, stable for links (`how-2`)
 * @param locale the page's locale, for dates
 */
export function howWeKnow(statement: PublicStatementDto, id: string, locale: string): Html {
  const e = statement.howWeKnow;
  const summary = html`<summary><span class="how-label">How we know</span><span class="how-about">: “${excerpt(statement.text)}”</span></summary>`;
  if (!e)
    return html`<details class="how" id="${id}">${summary}<div class="how-body"><p>New data about this object came in after this page was checked. Our reviewers are checking the figure again; its working will be shown here once they have.</p><p class="how-checked">Figure as of <time datetime="${statement.asOf}">${longDate(statement.asOf, locale)}</time>.</p></div></details>`;
  const measured = e.measurements.length
    ? html`<dt>What was measured</dt><dd><ul>${e.measurements.map(
        (m) =>
          html`<li><span class="how-what">${m.what}</span>: <span class="num">${m.value}</span>, from ${safeLink(m.source.url, m.source.name)}</li>`,
      )}</ul></dd>`
    : '';
  const model = e.model ? html`<dt>The model of the universe</dt><dd>${e.model}</dd>` : '';
  const references = e.references.length
    ? html`<dt>Other sources in the working</dt><dd><ul>${e.references.map(
        (r) => html`<li>${r.source} <span class="how-for">(for ${r.usedFor.join('; ')})</span></li>`,
      )}</ul></dd>`
    : '';
  return html`<details class="how" id="${id}">${summary}<div class="how-body" lang="${e.lang}"><dl>${measured}${model}<dt>How it is worked out</dt><dd>${e.method}</dd>${references}<dt>Last checked</dt><dd><time datetime="${e.checkedAt}">${longDate(e.checkedAt, locale)}</time></dd></dl></div></details>`;
}

/**
 * The page's HTML with each statement's disclosure placed right after the paragraph (or list item's
 * paragraph) that holds it; statements elsewhere (a heading, say) get theirs in a list at the end.
 * @param pageHtml the sanitised page HTML from the public API
 * @param statements the page's statements
 * @param locale the page's locale
 * @param idPrefix what each disclosure's id starts with: `how-` on our pages; embedded fragments name
 *   the page too, so two of them on one host page do not share ids
 */
export function withDisclosures(pageHtml: string, statements: PublicStatementDto[], locale: string, idPrefix = 'how-'): Html {
  const byId = new Map(statements.map((s, i) => [s.id, { s, n: i + 1 }]));
  const placed = new Set<string>();
  const body = pageHtml.replace(/<p(?:\s[^>]*)?>[\s\S]*?<\/p>/g, (paragraph) => {
    const ids = [...paragraph.matchAll(/data-statement-id="([0-9a-f-]{36})"/g)].map((m) => m[1]);
    const details = ids.flatMap((id) => {
      const found = byId.get(id);
      if (!found || placed.has(id)) return [];
      placed.add(id);
      return [howWeKnow(found.s, `${idPrefix}${found.n}`, locale).value];
    });
    return paragraph + details.join('');
  });
  const rest = statements.filter((s) => !placed.has(s.id));
  const tail = rest.length
    ? html`<section class="how-rest" aria-labelledby="${idPrefix}rest"><h2 id="${idPrefix}rest">How we know the other figures</h2>${rest.map((s) => howWeKnow(s, `${idPrefix}${byId.get(s.id)!.n}`, locale))}</section>`
    : '';
  return html`${trusted(body)}${tail}`;
}
