import { diffArrays, diffWordsWithSpace } from 'diff';
import { blockTexts } from '@shared/editor/doc-text.ts';
import type { DiffPart, RevisionDiffDto } from '@shared/schemas/page.ts';
import type { PageRevision } from '../../models/index.ts';

const strip = (parts: Array<{ value: string | string[]; added?: boolean; removed?: boolean }>): DiffPart[] =>
  parts.map((p) => ({
    value: Array.isArray(p.value) ? p.value.join('\n') : p.value,
    ...(p.added ? { added: true } : {}),
    ...(p.removed ? { removed: true } : {}),
  }));

/**
 * A readable diff between two revisions: blocks compared as lines of plain text (statements shown
 * as ⟦statement⟧, images and notices as bracketed labels), and changed blocks compared word by word.
 */
export function diffRevisions(from: PageRevision, to: PageRevision, statementLabel: (id: string) => string): RevisionDiffDto {
  const lines = (r: PageRevision) =>
    blockTexts(r.doc, (id) => `⟦${statementLabel(id)}⟧`).map((b) => (b.type.startsWith('heading') ? `## ${b.text}` : b.text));
  const a = lines(from);
  const b = lines(to);
  const blocks: DiffPart[] = [];
  const chunks = diffArrays(a, b);
  for (let i = 0; i < chunks.length; i++) {
    const chunk = chunks[i];
    const next = chunks[i + 1];
    // Removed blocks followed by added ones are usually edits: pair them up and show words.
    if (chunk.removed && next?.added) {
      const pairs = Math.min(chunk.value.length, next.value.length);
      for (let j = 0; j < pairs; j++) {
        blocks.push(...strip(diffWordsWithSpace(chunk.value[j], next.value[j])));
        blocks.push({ value: '\n' });
      }
      for (const line of chunk.value.slice(pairs)) blocks.push({ value: `${line}\n`, removed: true });
      for (const line of next.value.slice(pairs)) blocks.push({ value: `${line}\n`, added: true });
      i += 1;
      continue;
    }
    for (const line of chunk.value)
      blocks.push({ value: `${line}\n`, ...(chunk.added ? { added: true } : {}), ...(chunk.removed ? { removed: true } : {}) });
  }
  return { from: from.number, to: to.number, title: strip(diffWordsWithSpace(from.title, to.title)), blocks };
}
