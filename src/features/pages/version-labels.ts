import type { PageDto } from '@shared/schemas/page.ts';

/** What the two versions a reviewer can switch between are called, and one sentence on how they differ. */
export interface VersionLabels {
  /** The working copy, with each statement's wording now. */
  working: string;
  /** What visitors see now: the published version with the wording as signed off. */
  live: string;
  /** Whether they differ and why, for the line under the switch. */
  note: string;
}

/**
 * Labels for the review view's version switch. The same revision number on both sides is the case that
 * confused people: the text is the same revision, but the live side keeps the wording as signed off
 * while the working side shows today's wording, so the labels say so rather than repeat a number.
 * @param page the page (with its statements and published version)
 * @returns null when nothing is live (there is nothing to switch to)
 */
export function versionLabels(page: Pick<PageDto, 'revision' | 'published' | 'statements'>): VersionLabels | null {
  if (!page.published) return null;
  const working = page.revision.number;
  const live = page.published.revisionNumber;
  if (working !== live)
    return {
      working: `Working draft (revision ${working})`,
      live: `What visitors see now (revision ${live})`,
      note: `Revision ${working} is being worked on; visitors still see revision ${live} until a newer one is signed off and published.`,
    };
  const moved = page.statements.filter((s) => s.signedText !== null && s.text !== s.signedText).length;
  return {
    working: `Revision ${working} with today’s wording`,
    live: `What visitors see now (revision ${live} as signed off)`,
    note: moved
      ? `Both are revision ${working}. ${moved === 1 ? 'One statement reads' : `${moved} statements read`} differently today than when signed off; visitors see the signed wording until it is signed off again and published.`
      : `Both are revision ${working} and read the same: what you see here is what visitors see.`,
  };
}

/**
 * The publish button's words: says when the revision is already live (publishing then replaces the
 * signed wording visitors see, after a re-check).
 */
export function publishLabel(page: Pick<PageDto, 'approved' | 'published'>): string {
  const approved = page.approved?.revisionNumber;
  if (approved !== undefined && approved === page.published?.revisionNumber)
    return `Publish the re-checked wording of revision ${approved}`;
  return `Publish revision ${approved}`;
}
