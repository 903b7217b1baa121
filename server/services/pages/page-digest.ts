import { QueryTypes } from 'sequelize';
import { getSequelize } from '../../db.ts';
import { logger } from '../../logger.ts';
import { pageDigestMail } from '../../mail/page-templates.ts';
import { Page, User } from '../../models/index.ts';
import { sectionsFor } from './page-dashboard.ts';
import { deliver } from './page-mail.ts';
import { publishDuePages } from './page-publish.ts';

/** The job kind of the morning digest e-mail. */
export const DIGEST_JOB = 'pages.daily-digest';
/** The job kind of the check for pages whose scheduled publication is due. */
export const PUBLISH_DUE_JOB = 'pages.publish-due';

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

/** The digest job: mails everyone who asked for it and has something waiting. */
export async function runDigestJob(): Promise<void> {
  const sent = await sendDailyDigests();
  logger.info({ sent }, 'page digests sent');
}

/** The publish-due job: publishes the approved pages whose scheduled time has come. */
export async function runPublishDueJob(): Promise<void> {
  const published = await publishDuePages();
  if (published.length) logger.info({ published: published.length }, 'scheduled pages published');
}
