/**
 * Markup for the public site, written as tagged templates: every value put into a template is
 * escaped unless it is already markup (`Html`), so a hostile title or caption stays text.
 */

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Markup that is safe to insert as it is: built by `html`, or our own sanitised page renderer's output. */
export class Html {
  constructor(readonly value: string) {}
  toString(): string {
    return this.value;
  }
}

/** Escapes text for HTML content and attribute values. */
export const escapeHtml = (value: string): string => value.replace(/[&<>"']/g, (c) => ESCAPES[c]);

/**
 * Marks markup as already safe. Only for HTML our own renderer sanitised (page bodies) or built here.
 * @param markup trusted markup
 */
export const trusted = (markup: string): Html => new Html(markup);

type Value = Html | string | number | null | undefined | false | readonly Value[];

function render(value: Value): string {
  if (value === null || value === undefined || value === false) return '';
  if (value instanceof Html) return value.value;
  if (Array.isArray(value)) return value.map(render).join('');
  return escapeHtml(String(value));
}

/** Builds markup: text values are escaped, `Html` values and arrays of them are inserted as they are. */
export function html(strings: TemplateStringsArray, ...values: Value[]): Html {
  let out = strings[0];
  for (let i = 0; i < values.length; i += 1) out += render(values[i]) + strings[i + 1];
  return new Html(out);
}
