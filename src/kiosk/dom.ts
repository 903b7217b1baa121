/** A tiny element builder: text goes in as text nodes only, never as HTML. */
export function h<K extends keyof HTMLElementTagNameMap>(
  tag: K,
  attrs: Record<string, string | undefined> = {},
  ...children: Array<Node | string | null | false>
): HTMLElementTagNameMap[K] {
  const el = document.createElement(tag);
  for (const [key, value] of Object.entries(attrs)) if (value !== undefined) el.setAttribute(key, value);
  for (const child of children) if (child !== null && child !== false) el.append(child);
  return el;
}
