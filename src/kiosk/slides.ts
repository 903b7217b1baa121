import type { FeedItem, FeedSky, FeedSlide, FeedStatement } from '@shared/schemas/kiosk-feed.ts';
import { keepDesignationsTogether as nb } from '@shared/text/designations.ts';
import { h } from './dom.ts';

/** The player's own words, per language of the slide (English when a slide names none we have). */
const WORDS = {
  en: { asOf: 'as of', image: 'Image: ' },
  fr: { asOf: 'en date du', image: 'Image\u00a0: ' },
} as const;
const wordsFor = (language: string | undefined) => (language?.toLowerCase().startsWith('fr') ? WORDS.fr : WORDS.en);

/** "as of 3 March 2026" / "en date du 3 mars 2026", in the venue's time zone and the slide's language. */
function asOfText(iso: string, timeZone: string, language: string | undefined): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return '';
  const words = wordsFor(language);
  try {
    const format = new Intl.DateTimeFormat(language ?? 'en-GB', { day: 'numeric', month: 'long', year: 'numeric', timeZone });
    return `${words.asOf} ${format.format(date)}`;
  } catch {
    return `${words.asOf} ${date.toISOString().slice(0, 10)}`;
  }
}

/**
 * Most statements a slide shows with their small print: beyond this (or beside a long body text)
 * the notes would push the statements off a 1080-line screen, so they are left to the page.
 */
const NOTES_UP_TO = 3;

function statementList(
  statements: FeedStatement[],
  timeZone: string,
  roomForNotes: boolean,
  language: string | undefined,
): HTMLElement | null {
  if (!statements.length) return null;
  const withNotes = roomForNotes && statements.length <= NOTES_UP_TO;
  return h(
    'ul',
    { class: 'statements' },
    ...statements.map((s) =>
      h(
        'li',
        {},
        h('span', { class: 'statement-text' }, nb(s.text)),
        ' ',
        h('span', { class: 'as-of' }, asOfText(s.as_of, timeZone, language)),
        withNotes && s.note ? h('small', { class: 'statement-note' }, s.note) : null,
      ),
    ),
  );
}

/** Credit and licence, always on screen with an image, bottom right. */
function creditLine(slide: FeedSlide, language: string | undefined): HTMLElement | null {
  if (!slide.image) return null;
  return h(
    'p',
    { class: 'credit' },
    h('span', { class: 'visually-hidden' }, wordsFor(language).image),
    slide.credit ?? '',
    ' · ',
    slide.licence ?? '',
  );
}

function picture(slide: FeedSlide, src: string): HTMLElement {
  const img = h('img', { class: 'picture', src, alt: slide.image!.alt, decoding: 'async' });
  img.style.objectPosition = `${(slide.image!.focal.x * 100).toFixed(1)}% ${(slide.image!.focal.y * 100).toFixed(1)}%`;
  return img;
}

function skyTable(sky: FeedSky): HTMLElement {
  const up = sky.planets.filter((p) => p.up_after_dusk);
  const down = sky.planets.filter((p) => !p.up_after_dusk);
  const head = h('tr', {}, ...['Planet', 'Rises', 'Highest', 'Sets', 'Light takes'].map((t) => h('th', { scope: 'col' }, t)));
  const rows = up.map((p) =>
    h(
      'tr',
      {},
      h('th', { scope: 'row' }, p.name),
      h('td', {}, p.rise),
      h('td', {}, p.highest),
      h('td', {}, p.set),
      h('td', {}, p.light_time),
    ),
  );
  return h(
    'div',
    { class: 'sky' },
    h(
      'p',
      { class: 'sky-summary' },
      `Sunset ${sky.sunset} · ${sky.dark_from.charAt(0).toUpperCase()}${sky.dark_from.slice(1)} · Moon ${sky.moon.phase.toLowerCase()}, ${sky.moon.illuminated_percent}% lit`,
    ),
    up.length
      ? h('table', {}, h('thead', {}, head), h('tbody', {}, ...rows))
      : h('p', { class: 'body' }, 'No planets are above the horizon after dusk tonight.'),
    down.length ? h('p', { class: 'sky-down' }, `Not up after dusk tonight: ${down.map((p) => p.name).join(', ')}.`) : null,
  );
}

/**
 * The DOM for one slide at 1920 × 1080 proportions (sizes scale with the screen): title, text,
 * statements with their "as of" date, the image with its credit and licence, or the sky table.
 * @param item the feed item
 * @param imageSrc the address to show the image from (a cached object URL when offline)
 * @param timeZone the venue's, for dates
 */
export function renderSlide(item: FeedItem, imageSrc: string | null, timeZone: string): HTMLElement {
  const slide = item._starproof.slide;
  const layer = h('section', {
    class: `slide layout-${slide.layout}`,
    'data-slide-id': item.id,
    'aria-label': item.title || 'Image',
  });
  // Screen readers, hyphenation and quotation marks follow the slide's language (a round of French slides is French).
  if (item.language) layer.setAttribute('lang', item.language);
  if (slide.layout === 'sky-table' && item._starproof.sky) {
    layer.append(
      h(
        'div',
        { class: 'panel' },
        h('h1', { class: 'title' }, item.title),
        h('p', { class: 'subtitle' }, slide.text),
        skyTable(item._starproof.sky),
      ),
    );
    return layer;
  }
  if (slide.image && imageSrc) layer.append(picture(slide, imageSrc), h('div', { class: 'shade' }));
  if (slide.layout === 'image') {
    if (slide.text) layer.append(h('p', { class: 'caption' }, nb(slide.text)));
  } else {
    layer.append(
      h(
        'div',
        { class: 'panel' },
        h('h1', { class: 'title' }, nb(item.title)),
        slide.text ? h('p', { class: 'body' }, nb(slide.text)) : null,
        statementList(slide.statements, timeZoneOr(timeZone), (slide.text ?? '').length <= 280, item.language),
      ),
    );
  }
  const credit = creditLine(slide, item.language);
  if (credit && imageSrc) layer.append(credit);
  return layer;
}

const timeZoneOr = (tz: string) => tz || 'UTC';

/** The calm screen shown when the channel has nothing to show (or before the first feed). */
export function renderHolding(venueName: string, note: string): HTMLElement {
  return h(
    'section',
    { class: 'slide layout-holding', 'aria-label': 'Nothing scheduled' },
    h('div', { class: 'holding' }, h('p', { class: 'holding-venue' }, venueName), h('p', { class: 'holding-note' }, note)),
  );
}
