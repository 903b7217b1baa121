import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { OutboxMessage } from '../models/index.ts';

const addressText = (a: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(a) ? a.map((x) => x.text).join(', ') : a?.text) ?? '';

/**
 * A local SMTP catcher on loopback for development and tests: every message it receives is
 * stored in the outbox table instead of being delivered.
 * @returns the server and the port it listens on (port 0 picks a free one)
 */
export async function startMailCatcher(port: number): Promise<{ server: SMTPServer; port: number }> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    banner: 'Starproof mail catcher',
    size: 5 * 1024 * 1024,
    onData(stream, _session, callback) {
      simpleParser(stream)
        .then((mail) =>
          OutboxMessage.create({
            fromAddress: addressText(mail.from),
            toAddresses: addressText(mail.to),
            subject: mail.subject ?? '(no subject)',
            textBody: mail.text ?? '',
            receivedAt: new Date(),
          }),
        )
        .then(
          () => callback(),
          (err: Error) => callback(err),
        );
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  return { server, port: typeof address === 'object' && address ? address.port : port };
}
