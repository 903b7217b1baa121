/**
 * Clipboard HTML from word processors and web pages, reduced before the editor parses it: active
 * content, pasted pictures, styles and event handlers go first; the
 * schema already drops styles, scripts and unknown elements, but a link's `target`, `rel` and
 * `class` would otherwise be read into the link mark (pages carry none of them), and headings of
 * levels 1 and 4–6 would become plain paragraphs.
 * @param html the pasted or dropped HTML
 * @returns the same HTML without those attributes
 */
export function cleanPastedHtml(html: string): string {
  const doc = new DOMParser().parseFromString(html, 'text/html');
  // Pictures come from the media library only (with credit and licence); active content never.
  for (const el of Array.from(
    doc.querySelectorAll('script, style, iframe, object, embed, img, picture, video, audio, svg, link, meta, form'),
  ))
    el.remove();
  for (const el of Array.from(doc.body.querySelectorAll('*'))) {
    for (const attr of Array.from(el.attributes))
      if (/^on/i.test(attr.name) || attr.name === 'style') el.removeAttribute(attr.name);
  }
  for (const a of Array.from(doc.querySelectorAll('a'))) {
    for (const name of ['target', 'rel', 'class', 'title']) a.removeAttribute(name);
  }
  // The page title is the only level-1 heading: pasted headings keep their place as levels 2 and 3.
  for (const heading of Array.from(doc.querySelectorAll('h1, h2, h3, h4, h5, h6'))) {
    const level = Number(heading.tagName.slice(1));
    const renamed = doc.createElement(level <= 2 ? 'h2' : 'h3');
    renamed.innerHTML = heading.innerHTML;
    heading.replaceWith(renamed);
  }
  return doc.body.innerHTML;
}
