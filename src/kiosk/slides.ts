import type { FeedItem, FeedQr, FeedSky, FeedSlide, FeedStatement } from '@shared/schemas/kiosk-feed.ts';
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

const SVG = 'http://www.w3.org/2000/svg';

/**
 * The QR code to the page's public address, drawn from the feed's path (dark modules on a light
 * square with the standard four-module quiet zone, ISO/IEC 18004), beside a line saying what it opens.
 */
function qrCode(qr: FeedQr, place: 'in-text' | 'on-picture' = 'in-text'): HTMLElement {
  const svg = document.createElementNS(SVG, 'svg');
  const box = qr.size + 8;
  svg.setAttribute('viewBox', `-4 -4 ${box} ${box}`);
  svg.setAttribute('class', 'qr-code');
  svg.setAttribute('shape-rendering', 'crispEdges');
  svg.setAttribute('aria-hidden', 'true');
  const ground = document.createElementNS(SVG, 'rect');
  for (const [k, v] of [
    ['x', '-4'],
    ['y', '-4'],
    ['width', String(box)],
    ['height', String(box)],
    ['fill', '#fff'],
  ])
    ground.setAttribute(k, v);
  const modules = document.createElementNS(SVG, 'path');
  modules.setAttribute('d', qr.path);
  modules.setAttribute('fill', '#000');
  svg.append(ground, modules);
  return h(
    'figure',
    { class: `qr qr-${place}`, 'data-url': qr.url },
    svg,
    h('figcaption', {}, 'Scan for the whole page, with how we know each number'),
  );
}

function picture(slide: FeedSlide, src: string): HTMLElement {
  const img = h('img', { class: 'picture', src, alt: slide.image!.alt, decoding: 'async' });
  img.style.objectPosition = `${(slide.image!.focal.x * 100).toFixed(1)}% ${(slide.image!.focal.y * 100).toFixed(1)}%`;
  return img;
}

/** "04:05 tomorrow" as the time and a smaller day word, which a narrow (portrait) table puts on its own line. */
function timeCell(text: string): HTMLElement {
  const m = /^(\d\d:\d\d) (tomorrow|on \d{4}-\d\d-\d\d)$/.exec(text);
  return m ? h('td', {}, m[1], ' ', h('span', { class: 'day' }, m[2])) : h('td', {}, text);
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
      timeCell(p.rise),
      timeCell(p.highest),
      timeCell(p.set),
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
 * The DOM for one slide, laid out by kiosk.css for 1920 × 1080 or 1080 × 1920 (sizes scale with the screen): title, text,
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
        slide.qr && slide.layout === 'text' ? qrCode(slide.qr) : null,
      ),
    );
    // Beside a picture the text column has no room to spare: the code sits on the picture's lower left.
    if (slide.qr && slide.layout === 'image-text') layer.append(qrCode(slide.qr, 'on-picture'));
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
