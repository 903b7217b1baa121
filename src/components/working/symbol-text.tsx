import { Fragment, type ReactNode } from 'react';

// "_x" and "_{xy}" become subscripts, "^x" superscripts, as the engine writes them in plain text.
const SCRIPT = /([_^])(\{[^}]*\}|[\p{L}\p{N}′]+)/gu;

/**
 * Sets a symbol or formula written in plain text ("Ω_m", "t_H", "∫₀^z") with real
 * subscripts and superscripts, so it reads as it would in print.
 * @param props.text the plain-text symbol or formula
 */
export function SymbolText({ text }: { text: string }) {
  const parts: ReactNode[] = [];
  let last = 0;
  for (const match of text.matchAll(SCRIPT)) {
    const index = match.index ?? 0;
    if (index > last) parts.push(text.slice(last, index));
    const body = match[2].startsWith('{') ? match[2].slice(1, -1) : match[2];
    parts.push(
      match[1] === '_' ? (
        <sub key={index} className="text-[0.72em]">
          {body}
        </sub>
      ) : (
        <sup key={index} className="text-[0.72em]">
          {body}
        </sup>
      ),
    );
    last = index + match[0].length;
  }
  if (last < text.length) parts.push(text.slice(last));
  return <Fragment>{parts}</Fragment>;
}
