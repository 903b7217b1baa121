import { describe, expect, it } from 'vitest';
import type { PageStatementDto } from '../../../shared/schemas/page.ts';
import { objectCountText } from '../../../src/features/pages/object-count.ts';
import { publishLabel, versionLabels } from '../../../src/features/pages/version-labels.ts';
import { slideTitle } from '../../../src/features/publishing/slide-title.ts';

const statement = (text: string, signedText: string | null) => ({ text, signedText }) as PageStatementDto;
const page = (working: number, live: number | null, statements: PageStatementDto[] = []) => ({
  revision: { id: 'r', number: working, createdAt: '2026-12-01T20:00:00Z', author: null },
  published: live === null ? null : { revisionNumber: live, at: null, title: 'A page' },
  statements,
});

describe('the review view’s version switch', () => {
  it('has nothing to switch to when nothing is live', () => {
    expect(versionLabels(page(3, null))).toBeNull();
  });

  it('names the working draft and what visitors see when they are different revisions', () => {
    const labels = versionLabels(page(12, 11))!;
    expect(labels.working).toBe('Working draft (revision 12)');
    expect(labels.live).toBe('What visitors see now (revision 11)');
    expect(labels.note).toMatch(/visitors still see revision 11/);
  });

  it('never shows two tabs that differ only by the same number: same revision, says whether the wording moved', () => {
    const same = versionLabels(page(11, 11, [statement('about 2.4 billion light-years', 'about 2.4 billion light-years')]))!;
    expect(same.working).not.toBe(same.live);
    expect(same.working).toBe('Revision 11 with today’s wording');
    expect(same.live).toBe('What visitors see now (revision 11 as signed off)');
    expect(same.note).toBe('Both are revision 11 and read the same: what you see here is what visitors see.');
    const moved = versionLabels(
      page(11, 11, [statement('about 2.5 billion light-years', 'about 2.4 billion light-years'), statement('x', 'x')]),
    )!;
    expect(moved.note).toMatch(/^Both are revision 11\. One statement reads differently today than when signed off/);
  });

  it('says when publishing replaces the signed wording of a revision already live', () => {
    expect(publishLabel({ approved: { revisionNumber: 12, at: '', by: null }, published: null })).toBe('Publish revision 12');
    expect(
      publishLabel({
        approved: { revisionNumber: 11, at: '', by: null },
        published: { revisionNumber: 11, at: null, title: '' },
      }),
    ).toBe('Publish the re-checked wording of revision 11');
  });
});

describe('the object picker’s count', () => {
  it('says how many are shown of how many exist or match', () => {
    expect(objectCountText(20, 1204, true, '')).toBe('20 of 1,204 objects shown — type to search');
    expect(objectCountText(7, 7, true, '')).toBe('All 7 objects shown');
    expect(objectCountText(20, 143, true, 'ngc')).toBe('20 of 143 matching objects shown — keep typing to narrow the list');
    expect(objectCountText(3, 3, true, ' crab ')).toBe('3 objects match “crab”');
    expect(objectCountText(1, 1, true, 'M1')).toBe('1 object matches “M1”');
    expect(objectCountText(0, 0, true, 'zzz')).toBe('No object matches “zzz”.');
    expect(objectCountText(20, 120000, false, '')).toBe('20 of about 120,000 objects shown — type to search');
  });
});

describe('a slide’s name in the channel list', () => {
  const media = {
    id: 'm',
    thumbnailUrl: null,
    altText: 'A reddish cloud of glowing gas with dark lanes of dust',
    fileName: 'lagoon.jpg',
  };
  it('names an image slide by its title, or its file name, never its alt text', () => {
    expect(slideTitle({ kind: 'image', page: null, caption: 'Our dome at night', media })).toBe('Our dome at night');
    expect(slideTitle({ kind: 'image', page: null, caption: '', media })).toBe('Image without a title (lagoon.jpg)');
    expect(slideTitle({ kind: 'image', page: null, caption: '', media: null })).toBe('Image without a title');
    expect(slideTitle({ kind: 'page', page: { id: 'p', title: 'The Crab Nebula' }, caption: '', media })).toBe('The Crab Nebula');
    expect(slideTitle({ kind: 'sky_tonight', page: null, caption: '', media: null })).toBe('The sky tonight');
  });
});
