import { Op } from 'sequelize';
import { logger } from '../../logger.ts';
import { sendMail, type MailMessage } from '../../mail/mailer.ts';
import { User } from '../../models/index.ts';

/** Sends after the change is committed; a mail failure is logged, never undoes the change. */
export async function deliver(messages: MailMessage[]): Promise<void> {
  await Promise.all(
    messages.map((m) =>
      sendMail(m).catch((err: unknown) => logger.error({ err, to: m.to, subject: m.subject }, 'page mail not sent')),
    ),
  );
}

/** Active reviewers (and admins, who may review), to tell about a submitted page. */
export async function reviewersToNotify(): Promise<User[]> {
  return User.findAll({ where: { role: { [Op.in]: ['reviewer'] }, active: true } });
}

/** Active users by id, skipping the missing and deactivated. */
export async function activeUsers(ids: Array<string | null>): Promise<User[]> {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))];
  if (!wanted.length) return [];
  return User.findAll({ where: { id: { [Op.in]: wanted }, active: true } });
}
