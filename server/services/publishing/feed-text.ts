/** Small text helpers shared by the kiosk feed and the public API (no DOM on the server). */

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for HTML or XML content and attribute values. */
export function escapeMarkup(value: string): string {
  return value.replace(/[&<>"']/g, (c) => ESCAPES[c]);
}

/**
 * Removes characters XML 1.0 cannot carry at all (most C0 controls, lone surrogates, U+FFFE/FFFF),
 * which would make an Atom document ill-formed even when escaped.
 */
export function xmlSafe(value: string): string {
  return value.replace(
    /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]|[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/g,
    '',
  );
}

const NAMED: Record<string, string> = { amp: '&', lt: '<', gt: '>', quot: '"', apos: "'", nbsp: '\u00A0' };

/** Decodes the entities our own renderer writes (named basics and numeric references). */
export function decodeEntities(value: string): string {
  return value.replace(/&(#x[0-9a-f]+|#\d+|[a-z]+);/gi, (whole, ref: string) => {
    if (ref[0] === '#') {
      const code = ref[1] === 'x' || ref[1] === 'X' ? parseInt(ref.slice(2), 16) : parseInt(ref.slice(1), 10);
      return Number.isFinite(code) && code > 0 && code <= 0x10ffff ? String.fromCodePoint(code) : whole;
    }
    return NAMED[ref.toLowerCase()] ?? whole;
  });
}

/**
 * The first paragraph of sanitized page HTML as plain text, shortened at a word to at most
 * `max` characters (with an ellipsis), for a kiosk slide or a public summary.
 */
export function firstParagraphText(html: string, max = 240): string {
  const match = /<p[\s>][\s\S]*?<\/p>/i.exec(html);
  const text = decodeEntities((match?.[0] ?? '').replace(/<[^>]*>/g, ''))
    .replace(/\s+/g, ' ')
    .trim();
  if (text.length <= max) return text;
  const cut = text.slice(0, max - 1);
  const space = cut.lastIndexOf(' ');
  return `${(space > max * 0.6 ? cut.slice(0, space) : cut).replace(/[\s,;:.–—-]+$/, '')}…`;
}

/** Library image ids in sanitized page HTML, in document order, without repeats. */
export function mediaIdsInHtml(html: string): string[] {
  const ids = [...html.matchAll(/data-media-id="([0-9a-f-]{36})"/gi)].map((m) => m[1]);
  return [...new Set(ids)];
}

/** A URL-safe name from a title: lower-case ASCII letters, digits and hyphens. */
export function slugify(title: string): string {
  const slug = title
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 80)
    .replace(/-+$/, '');
  return slug || 'page';
}
