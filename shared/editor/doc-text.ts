import type { JSONContent } from '@tiptap/core';

/** Stands in for a statement inside block text: a number next to it is never read as hand-typed. */
export const STATEMENT_PLACEHOLDER = '\uFFFC';

/** One block's text as a reader sees it, with where it sits in the document. */
export interface BlockText {
  /** Index of the text block in document order (0-based). */
  index: number;
  type: string;
  text: string;
}

const TEXT_BLOCKS = new Set(['paragraph', 'heading']);

/**
 * The text of every paragraph and heading in document order. Statements become a placeholder (or
 * their wording, when `statementText` is given); images and notices count as blocks of their own
 * so diffs show them.
 */
export function blockTexts(doc: JSONContent, statementText?: (id: string) => string): BlockText[] {
  const blocks: BlockText[] = [];
  const inline = (node: JSONContent): string => {
    if (node.type === 'text') return node.text ?? '';
    if (node.type === 'hardBreak') return '\n';
    if (node.type === 'statementRef')
      return statementText ? statementText(String(node.attrs?.statementId)) : STATEMENT_PLACEHOLDER;
    return (node.content ?? []).map(inline).join('');
  };
  const visit = (node: JSONContent) => {
    if (node.type && TEXT_BLOCKS.has(node.type)) {
      blocks.push({
        index: blocks.length,
        type: node.type === 'heading' ? `heading ${node.attrs?.level ?? ''}`.trim() : node.type,
        text: inline(node),
      });
      return;
    }
    if (node.type === 'mediaImage') {
      blocks.push({
        index: blocks.length,
        type: 'image',
        text: `[Image${node.attrs?.caption ? `: ${node.attrs.caption}` : ''}]`,
      });
      return;
    }
    if (node.type === 'eyeSafetyNotice') {
      blocks.push({ index: blocks.length, type: 'notice', text: '[Eye-safety notice]' });
      return;
    }
    for (const child of node.content ?? []) visit(child);
  };
  visit(doc);
  return blocks;
}

/** Every id of a node type's attribute, in document order, without repeats. */
function collect(doc: JSONContent, type: string, attr: string): string[] {
  const found = new Set<string>();
  const visit = (node: JSONContent) => {
    if (node.type === type && typeof node.attrs?.[attr] === 'string') found.add(node.attrs[attr] as string);
    for (const child of node.content ?? []) visit(child);
  };
  visit(doc);
  return [...found];
}

/** The statements a page uses. */
export const statementIdsIn = (doc: JSONContent) => collect(doc, 'statementRef', 'statementId');
/** The library images a page shows. */
export const mediaIdsIn = (doc: JSONContent) => collect(doc, 'mediaImage', 'mediaId');

/** True when the page carries the eye-safety notice block. */
export function hasEyeSafetyNotice(doc: JSONContent): boolean {
  const visit = (node: JSONContent): boolean => node.type === 'eyeSafetyNotice' || (node.content ?? []).some(visit);
  return visit(doc);
}
