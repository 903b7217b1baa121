import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../config.ts';

let transporter: Transporter | undefined;

/** Points the mailer at the local catcher (when no SMTP_URL is set). */
export function routeMailToCatcher(port: number): void {
  transporter = nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true });
}

function getTransporter(): Transporter {
  if (!transporter) {
    if (!config.smtpUrl) throw new Error('No SMTP relay configured (set SMTP_URL) and no catcher started.');
    transporter = nodemailer.createTransport(config.smtpUrl);
  }
  return transporter;
}

/** A plain-text message; HTML mail adds nothing our notices need. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

/** Sends through SMTP; resolves once the relay (or catcher) has accepted the message. */
export async function sendMail(message: MailMessage): Promise<void> {
  await getTransporter().sendMail({ from: config.mailFrom, ...message });
}
