import { QueryTypes } from 'sequelize';
import type PgBoss from 'pg-boss';
import { getSequelize } from '../../db.ts';
import { defineJob } from '../../jobs/queue.ts';
import { logger } from '../../logger.ts';
import { pageDigestMail } from '../../mail/page-templates.ts';
import { Page, User } from '../../models/index.ts';
import { sectionsFor } from './page-dashboard.ts';
import { deliver } from './page-mail.ts';
import { publishDuePages } from './page-publish.ts';

const DIGEST = 'pages.daily-digest';
const PUBLISH_DUE = 'pages.publish-due';

/**
 * Sends the morning e-mail to everyone who asked for it and has something waiting; nobody gets an
 * empty digest.
 * @returns how many people were mailed
 */
export async function sendDailyDigests(): Promise<number> {
  const ids = await getSequelize().query<{ id: string }>('SELECT id FROM users WHERE page_digest AND active', {
    type: QueryTypes.SELECT,
  });
  let sent = 0;
  for (const { id } of ids) {
    const user = await User.findByPk(id);
    if (!user) continue;
    const sections = [];
    for (const s of sectionsFor(user)) {
      const pages = await Page.findAll({
        where: s.where,
        order: [['updatedAt', 'DESC']],
        limit: 20,
        attributes: ['id', 'title'],
      });
      if (pages.length) sections.push({ title: s.title, pages: pages.map((p) => ({ id: p.id, title: p.title })) });
    }
    if (!sections.length) continue;
    await deliver([pageDigestMail(user.email, user.name, sections)]);
    sent += 1;
  }
  return sent;
}

defineJob<Record<string, never>>(DIGEST, async () => {
  const sent = await sendDailyDigests();
  logger.info({ sent }, 'page digests sent');
});

defineJob<Record<string, never>>(PUBLISH_DUE, async () => {
  const published = await publishDuePages();
  if (published.length) logger.info({ published: published.length }, 'scheduled pages published');
});

/**
 * Schedules the page jobs on the running queue: the digest at 07:00 UTC each day, and a check for
 * scheduled publications every minute.
 * @param boss the running queue (from startJobQueue)
 */
export async function schedulePageJobs(boss: PgBoss): Promise<void> {
  await boss.schedule(DIGEST, '0 7 * * *', {}, { tz: 'UTC' });
  await boss.schedule(PUBLISH_DUE, '* * * * *', {}, { tz: 'UTC' });
}
