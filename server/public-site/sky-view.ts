import type { FeedSky } from '@shared/schemas/kiosk-feed.ts';
import { html, type Html } from './html.ts';
import { longDate } from './dates.ts';

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

/**
 * The sky tonight at a venue as a table: sunset, darkness, the Moon, and each planet's times,
 * distance and light time, all in the venue's local time.
 * @param sky the table the kiosks show
 * @param headingLevel 1 on its own page, 2 inside someone else's page
 */
export function skyTonight(sky: FeedSky, headingLevel: 1 | 2): Html {
  const heading = `The sky tonight from ${sky.venue_name}`;
  const night = longDate(`${sky.local_date}T12:00:00Z`, 'en-GB');
  return html`<section class="sky" aria-labelledby="sky-title-${sky.local_date}">
${headingLevel === 1 ? html`<h1 id="sky-title-${sky.local_date}">${heading}</h1>` : html`<h2 id="sky-title-${sky.local_date}">${heading}</h2>`}
<p>The evening of <time datetime="${sky.local_date}">${night}</time>, local time (${sky.time_zone}). Sunset ${sky.sunset}; ${sky.dark_from}. ${capital(sky.darkness)}</p>
<p>The Moon: ${sky.moon.phase.toLowerCase()}, ${sky.moon.illuminated_percent} % lit; rises ${sky.moon.rise}, sets ${sky.moon.set}.</p>
<div class="table-wrap" role="region" aria-labelledby="sky-caption-${sky.local_date}" tabindex="0">
<table>
<caption id="sky-caption-${sky.local_date}">The planets tonight</caption>
<thead><tr><th scope="col">Planet</th><th scope="col">Up between dusk and dawn</th><th scope="col">Rises</th><th scope="col">Highest</th><th scope="col">Sets</th><th scope="col">Distance</th><th scope="col">Its light takes</th></tr></thead>
<tbody>${sky.planets.map(
    (p) =>
      html`<tr><th scope="row">${p.name}</th><td>${p.up_after_dusk ? 'Yes' : 'No'}</td><td>${p.rise}</td><td>${p.highest}</td><td>${p.set}</td><td class="num">${p.distance}</td><td class="num">${p.light_time}</td></tr>`,
  )}</tbody>
</table>
</div>
<p class="meta">Worked out from the planets’ orbits (Meeus’s methods with the VSOP87 theory) for this place and night.</p>
</section>`;
}
