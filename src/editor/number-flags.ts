import { Extension } from '@tiptap/core';
import type { Node as PMNode } from '@tiptap/pm/model';
import { Plugin, PluginKey } from '@tiptap/pm/state';
import { Decoration, DecorationSet } from '@tiptap/pm/view';
import { STATEMENT_PLACEHOLDER } from '@shared/editor/doc-text.ts';
import { findNumbersInText, normaliseFlagText } from '@shared/editor/number-check.ts';

/** A hand-typed number found in the editor, with its document positions. */
export interface FlagRange {
  text: string;
  normalised: string;
  from: number;
  to: number;
}

/**
 * The shared number check over the live document. Each text block's text is built with one
 * character per position (statements become the placeholder, line breaks a newline), so offsets
 * from the check map straight onto document positions.
 */
export function flagRanges(doc: PMNode): FlagRange[] {
  const ranges: FlagRange[] = [];
  doc.descendants((node, pos) => {
    if (!node.isTextblock) return true;
    let text = '';
    node.forEach((child) => {
      if (child.isText) text += child.text;
      else if (child.type.name === 'hardBreak') text += '\n';
      else text += STATEMENT_PLACEHOLDER.repeat(child.nodeSize);
    });
    for (const m of findNumbersInText(text))
      ranges.push({ text: m.text, normalised: normaliseFlagText(m.text), from: pos + 1 + m.from, to: pos + 1 + m.to });
    return false;
  });
  return ranges;
}

/**
 * The text of the paragraph before and after a range (statements in it read "…"), so a writer sees
 * the whole sentence a replacement will sit in.
 */
export function surroundings(doc: PMNode, range: FlagRange): { before: string; text: string; after: string } {
  const $from = doc.resolve(range.from);
  const $to = doc.resolve(range.to);
  const read = (from: number, to: number) => doc.textBetween(from, to, '\n', '…');
  return { before: read($from.start(), range.from), text: range.text, after: read(range.to, $to.end()) };
}

export const numberFlagsKey = new PluginKey<DecorationSet>('numberFlags');

/** Underlines hand-typed numbers as the writer types (a wavy amber line, with a title saying why). */
export const NumberFlags = Extension.create({
  name: 'numberFlags',
  addProseMirrorPlugins() {
    const build = (doc: PMNode) =>
      DecorationSet.create(
        doc,
        flagRanges(doc).map((r) =>
          Decoration.inline(r.from, r.to, {
            class: 'number-flag',
            title: 'Hand-typed number: make it a statement, or a reviewer marks it as not measured',
          }),
        ),
      );
    return [
      new Plugin<DecorationSet>({
        key: numberFlagsKey,
        state: { init: (_, state) => build(state.doc), apply: (tr, old) => (tr.docChanged ? build(tr.doc) : old) },
        props: { decorations: (state) => numberFlagsKey.getState(state) },
      }),
    ];
  },
});
