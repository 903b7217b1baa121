import { html, type Html } from './html.ts';

/** What a visitor reads at an address with no published page: in words, with a way back. */
export function notFoundMain(home: string): Html {
  return html`<h1>We could not find that page</h1>
<p class="lead">There is no published page at this address. It may have been taken down, or its title (and so its address) may have changed.</p>
<p><a href="${home}">See every published page</a></p>`;
}
