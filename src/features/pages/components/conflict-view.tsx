import type { JSONContent } from '@tiptap/core';
import { blockTexts } from '@shared/editor/doc-text.ts';
import { Button } from '@/components/ui/button.tsx';
import { Notice } from '@/components/ui/notice.tsx';

function Version({ heading, title, doc }: { heading: string; title: string; doc: JSONContent }) {
  return (
    <div className="min-w-0 rounded-lg border border-rule bg-panel p-4">
      <p className="mb-2 text-xs font-semibold uppercase tracking-wide text-muted">{heading}</p>
      <h3 className="mb-2 font-serif text-lg font-semibold">{title}</h3>
      <div className="space-y-2 font-serif text-[15px] leading-relaxed">
        {blockTexts(doc, () => '⟦statement⟧').map((b) => (
          <p key={b.index} className={b.type.startsWith('heading') ? 'font-semibold' : ''}>
            {b.text || '\u00a0'}
          </p>
        ))}
      </div>
    </div>
  );
}

/** After a 409: the writer's version and the saved one side by side; nothing is thrown away unasked. */
export function ConflictView({
  message,
  mine,
  theirs,
  onKeepMine,
  onTakeTheirs,
}: {
  message: string;
  mine: { title: string; doc: JSONContent };
  theirs: { title: string; doc: JSONContent; by: string | null };
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}) {
  return (
    <section aria-label="Two versions of this page" className="space-y-3">
      <Notice tone="warning" title="Someone else saved this page">
        {message}
      </Notice>
      <div className="grid gap-4 md:grid-cols-2">
        <Version heading="Your version (kept in this browser)" title={mine.title} doc={mine.doc} />
        <Version heading={`Saved version${theirs.by ? ` by ${theirs.by}` : ''}`} title={theirs.title} doc={theirs.doc} />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button onClick={onKeepMine}>Keep my version</Button>
        <Button variant="secondary" onClick={onTakeTheirs}>
          Use the saved version
        </Button>
        <p className="self-center text-xs text-muted">
          Keeping yours saves it as a new revision; the saved version stays in the page’s history.
        </p>
      </div>
    </section>
  );
}
