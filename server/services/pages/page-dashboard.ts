import { Op, QueryTypes, type WhereOptions } from 'sequelize';
import type { DashboardDto } from '@shared/schemas/page.ts';
import { getSequelize } from '../../db.ts';
import { Page, type User } from '../../models/index.ts';
import { pageRows } from './page-list.ts';

type Section = { id: string; title: string; hint: string; where: WhereOptions<Page> };

/** What each role is asked to look at, most urgent first. */
function sectionsFor(user: User): Section[] {
  const mine = { writerId: user.id };
  const writer: Section[] = [
    {
      id: 'my-recheck',
      title: 'Your pages needing a re-check',
      hint: 'The data behind a statement changed after sign-off.',
      where: { ...mine, status: 'needs_recheck' },
    },
    {
      id: 'my-drafts',
      title: 'Your drafts',
      hint: 'Write, convert hand-typed numbers into statements, then submit.',
      where: { ...mine, status: 'draft' },
    },
    {
      id: 'my-review',
      title: 'Your pages with reviewers',
      hint: 'Waiting for sign-off.',
      where: { ...mine, status: 'in_review' },
    },
  ];
  const reviewer: Section[] = [
    {
      id: 'recheck',
      title: 'Pages needing a re-check',
      hint: 'A statement’s wording moved after sign-off; the published version is still live.',
      where: { status: 'needs_recheck' },
    },
    {
      id: 'review',
      title: 'Waiting for review',
      hint: 'Check each statement’s working, resolve flagged numbers, sign off.',
      where: { status: 'in_review' },
    },
  ];
  const editor: Section[] = [
    {
      id: 'approved',
      title: 'Approved, ready to publish',
      hint: 'Signed off by a reviewer; publish or schedule.',
      where: { status: 'approved' },
    },
    {
      id: 'stale',
      title: 'Live pages needing a re-check',
      hint: 'The public still sees the approved wording until a new version is signed off.',
      where: { status: 'needs_recheck', publishedRevisionId: { [Op.ne]: null } },
    },
    {
      id: 'scheduled',
      title: 'Scheduled',
      hint: 'Will go live by themselves.',
      where: { scheduledPublishAt: { [Op.ne]: null } },
    },
  ];
  switch (user.role) {
    case 'writer':
      return writer;
    case 'reviewer':
      return reviewer;
    case 'editor':
      return [...editor, ...writer.slice(1, 2)];
    default:
      return [...reviewer, ...editor.slice(0, 1)];
  }
}

/** The pages a person should look at now, by section; empty sections are kept so they can say "nothing". */
export async function dashboardFor(user: User, limit = 8): Promise<DashboardDto> {
  const sections = [];
  for (const s of sectionsFor(user)) {
    const pages = await Page.findAll({ where: { ...s.where, archivedAt: null }, order: [['updatedAt', 'DESC']], limit });
    sections.push({ id: s.id, title: s.title, hint: s.hint, pages: await pageRows(pages) });
  }
  return { sections, digest: await digestEnabled(user.id) };
}

/** Whether the person asked for the morning e-mail. */
export async function digestEnabled(userId: string): Promise<boolean> {
  const [row] = await getSequelize().query<{ page_digest: boolean }>('SELECT page_digest FROM users WHERE id = :userId', {
    replacements: { userId },
    type: QueryTypes.SELECT,
  });
  return !!row?.page_digest;
}

/** Turns the morning e-mail on or off for one person. */
export async function setDigest(userId: string, enabled: boolean): Promise<void> {
  await getSequelize().query('UPDATE users SET page_digest = :enabled WHERE id = :userId', { replacements: { userId, enabled } });
}

export { sectionsFor };
