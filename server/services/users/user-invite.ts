import { TokenLifetimes } from '@shared/validations.ts';
import type { UserInviteInput } from '@shared/schemas/user.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError } from '../../errors.ts';
import { User } from '../../models/index.ts';
import { sendMail } from '../../mail/mailer.ts';
import { invitationMail } from '../../mail/templates.ts';
import { recordAudit } from '../audit.ts';
import { issueToken } from './auth-tokens.ts';

/**
 * Creates a user without a password and e-mails a single-use invitation. If the mail cannot be
 * handed to SMTP, nothing is kept.
 * @throws HttpError 409 when the address is already in use
 */
export async function inviteUser(input: UserInviteInput, invitedBy: User, ip?: string): Promise<User> {
  return getSequelize().transaction(async (transaction) => {
    if (await User.findOne({ where: { email: input.email }, transaction })) {
      throw ConflictError('Someone with that e-mail address already has an account.', 'email_taken');
    }
    const user = await User.create({ email: input.email, name: input.name, role: input.role }, { transaction });
    const token = await issueToken(user.id, 'invitation', TokenLifetimes.invitationHours * 3_600_000, transaction);
    await recordAudit(
      { actorId: invitedBy.id, action: 'user.invited', subjectType: 'user', subjectId: user.id, data: { role: input.role }, ip },
      transaction,
    );
    await sendMail(invitationMail(user.email, user.name, invitedBy.name, token));
    return user;
  });
}

/** Sends a fresh invitation (the old link stops working). */
export async function resendInvitation(user: User, invitedBy: User): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const token = await issueToken(user.id, 'invitation', TokenLifetimes.invitationHours * 3_600_000, transaction);
    await recordAudit(
      { actorId: invitedBy.id, action: 'user.invitation_resent', subjectType: 'user', subjectId: user.id },
      transaction,
    );
    await sendMail(invitationMail(user.email, user.name, invitedBy.name, token));
  });
}
