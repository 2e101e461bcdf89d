import { Logger } from '@nestjs/common';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import type { MailboxRepository } from './mailbox.repository.js';

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/** The List-* header lines (RFC 2369, RFC 8058) as received, lower-case names, values unfolded. */
function listHeaders(lines: readonly { key: string; line: string }[]): Record<string, string> {
  const kept = lines.filter((h) => h.key.startsWith('list-'));
  return Object.fromEntries(
    kept.map((h) => [
      h.key,
      h.line
        .slice(h.line.indexOf(':') + 1)
        .replace(/\r?\n[ \t]+/g, ' ')
        .trim(),
    ]),
  );
}

/** The stand-in for a mail server: an SMTP server on loopback that keeps every message it receives. */
export class LocalMailboxServer {
  private readonly logger = new Logger('LocalMailbox');
  private server: SMTPServer | null = null;
  port = 0;

  constructor(private readonly mailbox: MailboxRepository) {}

  async start(port: number): Promise<number> {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['STARTTLS', 'AUTH'],
      size: MAX_MESSAGE_BYTES,
      banner: 'Linkloom local mailbox',
      logger: false,
      onData: (stream, session, callback) => {
        simpleParser(stream)
          .then((mail) =>
            this.mailbox.insert({
              messageId: mail.messageId ?? null,
              fromAddress: mail.from?.text ?? (session.envelope.mailFrom ? session.envelope.mailFrom.address : ''),
              toAddresses: session.envelope.rcptTo.map((r) => r.address),
              subject: mail.subject ?? '',
              text: mail.text ?? '',
              html: typeof mail.html === 'string' ? mail.html : '',
              headers: listHeaders(mail.headerLines),
              bytes: 0,
            }),
          )
          .then(
            () => callback(),
            (error: Error) => callback(error),
          );
      },
    });
    await new Promise<void>((resolve, reject) => {
      this.server!.once('error', reject);
      this.server!.listen(port, '127.0.0.1', () => resolve());
    });
    this.port = (this.server as unknown as { server: { address(): AddressInfo } }).server.address().port;
    this.logger.log(`Local mailbox listening on 127.0.0.1:${this.port}; admins read it in the app under Mail.`);
    return this.port;
  }

  async stop(): Promise<void> {
    if (!this.server) return;
    await new Promise<void>((resolve) => this.server!.close(() => resolve()));
    this.server = null;
  }
}
