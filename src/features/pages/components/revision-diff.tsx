import { Fragment } from 'react';
import type { DiffPart, RevisionDiffDto } from '@shared/schemas/page.ts';

function Parts({ parts }: { parts: DiffPart[] }) {
  return (
    <>
      {parts.map((p, i) => (
        // biome-ignore lint/suspicious/noArrayIndexKey: a computed diff shown whole and never reordered; the same words can repeat, so the position is the identity
        <Fragment key={i}>
          {p.added ? (
            <ins className="bg-ok/15 text-ok no-underline decoration-0">{p.value}</ins>
          ) : p.removed ? (
            <del className="bg-broken/10 text-broken">{p.value}</del>
          ) : (
            <span>{p.value}</span>
          )}
        </Fragment>
      ))}
    </>
  );
}

/** Two revisions compared: inserted words marked "ins", removed words "del" (with colour and strike-through, not colour alone). */
export function RevisionDiff({ diff }: { diff: RevisionDiffDto }) {
  return (
    <article
      aria-label={`Changes from revision ${diff.from} to ${diff.to}`}
      className="min-w-0 rounded-lg border border-rule bg-panel p-5 [overflow-wrap:anywhere]"
    >
      <p className="mb-3 text-xs font-semibold uppercase tracking-wide text-muted">
        Revision {diff.from} → {diff.to}
      </p>
      <h2 className="mb-3 font-serif text-xl font-semibold">
        <Parts parts={diff.title} />
      </h2>
      <div className="whitespace-pre-wrap font-serif text-[16px] leading-relaxed">
        <Parts parts={diff.blocks} />
      </div>
    </article>
  );
}
