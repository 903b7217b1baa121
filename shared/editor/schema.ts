import { getSchema as tiptapGetSchema, type Extensions, type JSONContent } from '@tiptap/core';
import { Node as PMNode, type Schema } from '@tiptap/pm/model';
import { PageLimits } from '../validations.ts';
import { isSafeHref, pageExtensions } from './extensions.ts';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Builds the ProseMirror schema of a list of extensions without an editor. */
export function getSchema(extensions: Extensions = pageExtensions): Schema {
  return tiptapGetSchema(extensions);
}

let pageSchema: Schema | undefined;
/** The page schema, built once. */
export function getPageSchema(): Schema {
  pageSchema ??= getSchema(pageExtensions);
  return pageSchema;
}

/** What each attribute of our nodes and marks may hold; anything not listed is refused. */
type AttrRule = (value: unknown) => string | null;
const nullable =
  (rule: AttrRule): AttrRule =>
  (v) =>
    v === null || v === undefined ? null : rule(v);
const mustBeNull: AttrRule = (v) => (v === null || v === undefined ? null : 'must be empty');
const uuid: AttrRule = (v) => (typeof v === 'string' && UUID.test(v) ? null : 'must be a valid id');
const text =
  (max: number): AttrRule =>
  (v) =>
    typeof v === 'string' && v.length <= max ? null : `must be text of at most ${max} characters`;

const ATTRIBUTES: Record<string, Record<string, AttrRule>> = {
  heading: { level: (v) => (v === 2 || v === 3 ? null : 'must be 2 or 3') },
  orderedList: {
    start: (v) => (Number.isInteger(v) && (v as number) >= 0 && (v as number) < 1e6 ? null : 'must be a whole number'),
    type: nullable(text(4)),
  },
  statementRef: { statementId: uuid },
  mediaImage: { mediaId: uuid, caption: nullable(text(PageLimits.captionMax)) },
  link: {
    href: (v) => (isSafeHref(v) ? null : 'must be a web address (http or https) or a mailto: address'),
    title: nullable(text(300)),
    target: mustBeNull,
    rel: mustBeNull,
    class: mustBeNull,
  },
};

/** The result of checking a page document. */
export type DocCheck = { ok: true; doc: PMNode } | { ok: false; message: string };

function checkAttrs(kind: 'node' | 'mark', type: string, attrs: unknown, where: string): string | null {
  if (attrs === undefined || attrs === null)
    return ATTRIBUTES[type] && kind === 'node' && (type === 'statementRef' || type === 'mediaImage')
      ? `${where}: the ${type} has no id`
      : null;
  if (typeof attrs !== 'object' || Array.isArray(attrs)) return `${where}: attributes must be an object`;
  const rules = ATTRIBUTES[type] ?? {};
  for (const [key, value] of Object.entries(attrs)) {
    const rule = rules[key];
    if (!rule) return `${where}: the ${kind} “${type}” has no attribute “${key}”`;
    const problem = rule(value);
    if (problem) return `${where}: “${key}” of ${type} ${problem}`;
  }
  for (const [key, rule] of Object.entries(rules)) {
    if (!(key in (attrs as object)) && rule(undefined)) return `${where}: the ${type} needs “${key}”`;
  }
  return null;
}

/** Walks the raw JSON before ProseMirror sees it: attribute allow-lists, link schemes, depth. */
function walk(node: unknown, schema: Schema, where: string, depth: number): string | null {
  if (depth > PageLimits.maxDepth) return `${where}: the document is nested too deeply`;
  if (!node || typeof node !== 'object' || Array.isArray(node)) return `${where}: each node must be an object`;
  const n = node as JSONContent & Record<string, unknown>;
  for (const key of Object.keys(n)) {
    if (!['type', 'attrs', 'content', 'marks', 'text'].includes(key)) return `${where}: unexpected property “${key}”`;
  }
  if (typeof n.type !== 'string') return `${where}: a node has no type`;
  if (!schema.nodes[n.type]) return `${where}: “${n.type}” is not something a page can contain`;
  const attrProblem = checkAttrs('node', n.type, n.attrs, where);
  if (attrProblem) return attrProblem;
  if (n.text !== undefined && typeof n.text !== 'string') return `${where}: text must be a string`;
  if (n.marks !== undefined) {
    if (!Array.isArray(n.marks)) return `${where}: marks must be a list`;
    for (const mark of n.marks) {
      if (!mark || typeof mark !== 'object' || typeof mark.type !== 'string') return `${where}: a mark has no type`;
      if (!schema.marks[mark.type]) return `${where}: the mark “${mark.type}” is not allowed on a page`;
      const markProblem = checkAttrs('mark', mark.type, mark.attrs, where);
      if (markProblem) return markProblem;
    }
  }
  if (n.content !== undefined) {
    if (!Array.isArray(n.content)) return `${where}: content must be a list`;
    for (let i = 0; i < n.content.length; i++) {
      const problem = walk(n.content[i], schema, `${where} › ${n.content[i]?.type ?? 'node'} ${i + 1}`, depth + 1);
      if (problem) return problem;
    }
  }
  return null;
}

/**
 * Checks a page document as sent by a client: only our nodes, marks and attributes, only safe
 * link schemes, and content the schema allows where it is (ProseMirror's `Node.fromJSON` + `check()`).
 * @param json the tiptap JSON
 * @returns the parsed document, or a message a person can act on
 */
export function validateDoc(json: unknown): DocCheck {
  const schema = getPageSchema();
  if (!json || typeof json !== 'object' || Array.isArray(json) || (json as { type?: unknown }).type !== 'doc') {
    return {
      ok: false,
      message:
        typeof json === 'string'
          ? 'The page body must be editor JSON, not HTML or text. Paste into the editor instead.'
          : 'The page body must be an editor document (type “doc”).',
    };
  }
  const problem = walk(json, schema, 'page', 0);
  if (problem) return { ok: false, message: `The page cannot be saved: ${problem}.` };
  try {
    const doc = PMNode.fromJSON(schema, json);
    doc.check();
    return { ok: true, doc };
  } catch (error) {
    return { ok: false, message: `The page cannot be saved: its structure is not valid (${(error as Error).message}).` };
  }
}
