import type { JSONContent } from '@tiptap/core';
import { renderToHTMLString, serializeAttrsToHTMLString } from '@tiptap/static-renderer/pm/html-string';
import { publicNote, publicStatements, publicText, type PublicStatement } from '../statements/index.ts';
import { Op } from 'sequelize';
import { isSafeHref, pageExtensions } from '@shared/editor/extensions.ts';
import { findLicence } from '@shared/media/licences.ts';
import { renditionUrl } from '../../media/keys.ts';
import { Media, MediaRendition, Page } from '../../models/index.ts';
import { getSettings } from '../settings/index.ts';

/** What the renderer needs to know about one library image. */
export interface RenderMedia {
  url: string | null;
  width: number | null;
  height: number | null;
  altText: string;
  credit: string;
  licence: string | null;
}

/** Everything looked up outside the document: statement wording, images, the notice text. */
export interface RenderContext {
  /** The wording to show for a statement (signed-off text when publishing); null when there is none. */
  statementText: (statementId: string) => string | null;
  media: ReadonlyMap<string, RenderMedia>;
  eyeSafetyNotice: string;
}

const escapeText = (value: string) =>
  value.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

type Mapped = { node: { attrs: Record<string, unknown> } };

/**
 * Renders a page document to sanitized HTML: only the elements our schema defines, text escaped,
 * no event attributes, links limited to http, https and mailto, statements as their given wording
 * with a `data-statement-id`, images with their page rendition, alt text, credit and licence.
 * The document should already have passed `validateDoc`; links are checked again here all the same.
 * @param doc the page's tiptap JSON
 * @param ctx statement wording, image details and the organisation's eye-safety notice
 * @returns an HTML fragment (no <html> or <body>)
 */
export function renderPageHtml(doc: JSONContent, ctx: RenderContext): string {
  return renderToHTMLString({
    content: doc,
    extensions: pageExtensions,
    options: {
      nodeMapping: {
        statementRef: ({ node }: Mapped) => {
          const id = String(node.attrs.statementId ?? '');
          const text = ctx.statementText(id);
          if (text === null)
            return `<span class="statement statement-missing"${serializeAttrsToHTMLString({ 'data-statement-id': id })}>[statement not available]</span>`;
          return `<span class="statement"${serializeAttrsToHTMLString({ 'data-statement-id': id })}>${escapeText(text)}</span>`;
        },
        eyeSafetyNotice: () =>
          `<aside class="eye-safety-notice" role="note"><strong>Eye safety</strong> <span>${escapeText(ctx.eyeSafetyNotice)}</span></aside>`,
        mediaImage: ({ node }: Mapped) => {
          const id = String(node.attrs.mediaId ?? '');
          const media = ctx.media.get(id);
          if (!media?.url) return '';
          const caption =
            typeof node.attrs.caption === 'string' && node.attrs.caption.trim()
              ? `<span class="caption">${escapeText(node.attrs.caption)}</span> `
              : '';
          const credit = [media.credit, media.licence]
            .filter((x): x is string => !!x)
            .map(escapeText)
            .join(' · ');
          const img = `<img${serializeAttrsToHTMLString({ src: media.url, alt: media.altText, width: media.width, height: media.height, loading: 'lazy' })}>`;
          return `<figure${serializeAttrsToHTMLString({ 'data-media-id': id })}>${img}<figcaption>${caption}<small class="credit">${credit}</small></figcaption></figure>`;
        },
      },
      markMapping: {
        link: ({ mark, children }: { mark: { attrs: Record<string, unknown> }; children?: string | string[] }) => {
          const inner = ([] as string[]).concat(children ?? []).join('');
          if (!isSafeHref(mark.attrs.href)) return inner;
          return `<a${serializeAttrsToHTMLString({ href: mark.attrs.href, rel: 'noopener noreferrer nofollow' })}>${inner}</a>`;
        },
      },
    },
  });
}

/**
 * Loads what the renderer needs for a set of images: the page-size rendition (JPEG, which every
 * device reads), alt text, credit and licence.
 * @param mediaIds library image ids
 */
export async function loadRenderMedia(mediaIds: string[]): Promise<Map<string, RenderMedia>> {
  if (!mediaIds.length) return new Map();
  const rows = await Media.findAll({
    where: { id: { [Op.in]: mediaIds } },
    include: [{ model: MediaRendition, as: 'renditions' }],
  });
  return new Map(
    rows.map((m) => {
      const renditions = m.renditions ?? [];
      const page = renditions.find((r) => r.name === 'page' && r.format === 'jpeg') ?? renditions.find((r) => r.name === 'page');
      return [
        m.id,
        {
          url: page ? renditionUrl(page.storageKey) : null,
          width: page?.width ?? null,
          height: page?.height ?? null,
          altText: m.altText,
          credit: m.credit,
          licence: findLicence(m.licenceId)?.label ?? null,
        },
      ];
    }),
  );
}

/**
 * Puts other wording into statements already rendered in a page's HTML (the spans renderPageHtml
 * writes), for statements that follow tonight on a page published nights ago.
 * @param html the page's rendered HTML
 * @param texts the wording to show, by statement id
 * @returns the HTML with those statements' text replaced
 */
export function withStatementTexts(html: string, texts: Map<string, string>): string {
  if (texts.size === 0) return html;
  // renderPageHtml escapes a statement's text, so its span holds no markup and ends at the first "<".
  return html.replace(
    /(<span class="statement" data-statement-id="([0-9a-f-]{36})">)([^<]*)(<\/span>)/g,
    (whole, open: string, id: string, _old: string, close: string) =>
      texts.has(id) ? `${open}${escapeText(texts.get(id)!)}${close}` : whole,
  );
}

/**
 * Numbers the small print of the statements in a page's HTML: a reference after each statement
 * that has a note, and the notes in a list at the end (one number per distinct note, so "Compared in
 * the Johnson V band." appears once however many statements it qualifies).
 * @param html the page's rendered HTML (statements as renderPageHtml writes them)
 * @param notes the note per statement id (statements without one are left as they are)
 * @returns the HTML with references and the list of notes
 */
export function withStatementNotes(html: string, notes: Map<string, string>): string {
  if (notes.size === 0) return html;
  const numbers = new Map<string, number>();
  const withRefs = html.replace(
    /(<span class="statement" data-statement-id="([0-9a-f-]{36})">[^<]*<\/span>)/g,
    (whole, _span: string, id: string) => {
      const note = notes.get(id);
      if (!note) return whole;
      if (!numbers.has(note)) numbers.set(note, numbers.size + 1);
      return `${whole}<sup class="statement-note-ref">${numbers.get(note)}</sup>`;
    },
  );
  if (numbers.size === 0) return html;
  const items = [...numbers].map(([note, n]) => `<li value="${n}">${escapeText(note)}</li>`).join('');
  // A label, not role="note": that role would take the list's semantics away from its items (axe: listitem).
  return `${withRefs}<ol class="statement-notes" aria-label="Notes">${items}</ol>`;
}

/**
 * A published page's statement wording and HTML as the public is shown them now: the signed
 * wording, with tonight's in place of it for statements that follow tonight, and the small print
 * that qualifies each (band, cosmology, night) where it belongs to the wording shown.
 * @param live the page's published snapshot (its HTML and the wording signed with it)
 * @param shown publicStatements for its statements
 * @param locale the page's locale
 * @returns the wording and notes by statement id; `html` with the notes, `textHtml` without (for summaries)
 */
export function publicPageTexts(
  live: { html: string; statementTexts: Record<string, string>; statementNotes?: Record<string, string> },
  shown: Map<string, PublicStatement>,
  locale: string,
): { statementTexts: Record<string, string>; notes: Record<string, string | null>; html: string; textHtml: string } {
  const moved = new Map<string, string>();
  const statementTexts: Record<string, string> = {};
  const notes: Record<string, string | null> = {};
  const noted = new Map<string, string>();
  for (const [id, signed] of Object.entries(live.statementTexts)) {
    statementTexts[id] = publicText(signed, shown.get(id), locale);
    if (statementTexts[id] !== signed) moved.set(id, statementTexts[id]);
    // Signed wording keeps the small print signed with it; tonight's wording (or a snapshot made
    // before notes were kept) takes the note computed with that wording.
    notes[id] =
      statementTexts[id] === signed && live.statementNotes
        ? (live.statementNotes[id] ?? null)
        : publicNote(statementTexts[id], shown.get(id), locale);
    if (notes[id]) noted.set(id, notes[id]!);
  }
  const textHtml = withStatementTexts(live.html, moved);
  return { statementTexts, notes, html: withStatementNotes(textHtml, noted), textHtml };
}

/** A page as the public (kiosk feed, public API) sees it. */
export interface PublishedPage {
  id: string;
  title: string;
  locale: string;
  objectId: string;
  html: string;
  revisionNumber: number;
  publishedAt: string | null;
  statementTexts: Record<string, string>;
}

/**
 * The live version of a page: the HTML stored when it was approved and published, with the
 * statement wording as signed off. It does not change when statements are recomputed (only a new
 * approval and publication replaces it), except that statements following tonight show the
 * night's wording, as the public pages and kiosks do (publicStatements).
 * @param pageId the page
 * @returns null when the page does not exist or nothing of it is published
 */
export async function renderPublishedPage(pageId: string): Promise<PublishedPage | null> {
  if (!/^[0-9a-f-]{36}$/i.test(pageId)) return null;
  const page = await Page.findByPk(pageId);
  const live = page?.publishedSnapshot;
  if (!page || !live) return null;
  const { statementTexts, html } = publicPageTexts(live, await publicStatements(Object.keys(live.statementTexts)), page.locale);
  return {
    id: page.id,
    title: live.title,
    locale: page.locale,
    objectId: page.skyObjectId,
    html,
    revisionNumber: live.revisionNumber,
    publishedAt: live.publishedAt ?? null,
    statementTexts,
  };
}

/**
 * Renders any document with the organisation's notice and the library's images.
 * @param doc the document
 * @param statementText wording per statement id
 */
export async function renderWithLookups(
  doc: JSONContent,
  mediaIds: string[],
  statementText: RenderContext['statementText'],
): Promise<string> {
  const [media, settings] = await Promise.all([loadRenderMedia(mediaIds), getSettings()]);
  return renderPageHtml(doc, { statementText, media, eyeSafetyNotice: settings.eyeSafetyNotice });
}
