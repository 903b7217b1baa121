import type { Extensions } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import { EyeSafetyNotice } from './nodes/eye-safety-notice.ts';
import { MediaImage } from './nodes/media-image.ts';
import { StatementRef } from './nodes/statement-ref.ts';

/** Link schemes a page may use; anything else (javascript:, data:, file:) is refused. */
export const SAFE_LINK_SCHEMES = ['http', 'https', 'mailto'] as const;

/** True when a link target is an absolute http(s) or mailto URL. */
export function isSafeHref(href: unknown): href is string {
  if (typeof href !== 'string' || href.length > 2000) return false;
  // Control characters and whitespace inside a scheme are how "java\nscript:" slips past checks.
  if (/[\u0000-\u001f\u007f]/.test(href)) return false;
  const match = /^([a-z][a-z0-9+.-]*):/i.exec(href.trim());
  return !!match && (SAFE_LINK_SCHEMES as readonly string[]).includes(match[1].toLowerCase());
}

/** Heading levels a page body uses: the page title is the only level 1. */
export const PAGE_HEADING_LEVELS = [2, 3] as const;

/**
 * The one list of page extensions (schema only). StarterKit is limited to what pages need:
 * headings, paragraphs, lists, quotes, links, bold and italic, line breaks. The client adds node
 * views with `.extend()`; the server validates and renders with the same list.
 */
export const pageExtensions: Extensions = [
  StarterKit.configure({
    heading: { levels: [...PAGE_HEADING_LEVELS] },
    code: false,
    codeBlock: false,
    horizontalRule: false,
    strike: false,
    underline: false,
    link: {
      openOnClick: false,
      autolink: true,
      defaultProtocol: 'https',
      protocols: [],
      HTMLAttributes: { target: null, rel: null, class: null },
      isAllowedUri: (url) => isSafeHref(url),
    },
  }),
  StatementRef,
  EyeSafetyNotice,
  MediaImage,
];
