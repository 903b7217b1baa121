import { TokenLifetimes } from '@shared/validations.ts';
import { appBaseUrl } from '../config.ts';
import type { MailMessage } from './mailer.ts';

/** The invitation a new member of staff receives. */
export function invitationMail(to: string, name: string, invitedBy: string, token: string): MailMessage {
  const link = `${appBaseUrl()}/welcome?token=${encodeURIComponent(token)}`;
  return {
    to,
    subject: 'You have been invited to Starproof',
    text: [
      `Hello ${name},`,
      '',
      `${invitedBy} has invited you to Starproof, where your venue writes and checks its pages about the sky.`,
      '',
      `Choose your password here (the link works once and expires in ${TokenLifetimes.invitationHours} hours):`,
      link,
      '',
      'If you did not expect this, you can ignore this message.',
    ].join('\n'),
  };
}

/** The password reset link. */
export function passwordResetMail(to: string, name: string, token: string): MailMessage {
  const link = `${appBaseUrl()}/reset-password?token=${encodeURIComponent(token)}`;
  return {
    to,
    subject: 'Reset your Starproof password',
    text: [
      `Hello ${name},`,
      '',
      `Someone asked to reset the password of this Starproof account. The link below works once and expires in ${TokenLifetimes.passwordResetMinutes} minutes:`,
      link,
      '',
      'If it was not you, ignore this message; your password has not changed.',
    ].join('\n'),
  };
}
