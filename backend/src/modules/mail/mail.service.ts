import { randomUUID } from 'node:crypto';
import { type BeforeApplicationShutdown, Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import type { ListResult } from '@linkloom/shared';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { AppError, notFound } from '../../common/app-error.js';
import type { Executor } from '../../db/database.js';
import { LocalMailboxServer } from './local-mailbox.server.js';
import { isPlainAddress, singleLineHeaders, singleLineSubject } from './mail-address.js';
import { MailDeliveryError, MailTransport } from './mail-transport.js';
import { MailboxRepository } from './mailbox.repository.js';
import { type NewOutboxMessage, OutboxRepository, type OutboxRow } from './outbox.repository.js';

/** What other modules hand to `enqueue`. */
export type { NewOutboxMessage };

const MAX_ATTEMPTS = 8;
const MAX_BACKOFF_MS = 3_600_000;

/**
 * The durable outbox: `enqueue` inside the caller's transaction, a sender that delivers due messages with
 * exponential backoff (temporary failures retried, permanent ones marked failed for admins to see).
 */
@Injectable()
export class MailService implements OnApplicationBootstrap, BeforeApplicationShutdown {
  private readonly logger = new Logger('Mail');
  private transport: MailTransport | null = null;
  private mailbox: LocalMailboxServer | null = null;
  private timer: NodeJS.Timeout | null = null;
  private delivering: Promise<number> | null = null;

  constructor(
    private readonly outbox: OutboxRepository,
    private readonly mailboxMessages: MailboxRepository,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  get usesLocalMailbox(): boolean {
    return !this.config.smtpUrl;
  }

  async onApplicationBootstrap(): Promise<void> {
    const requeued = await this.outbox.requeueInterrupted();
    if (requeued)
      this.logger.warn(`${requeued} message(s) were being sent when the server stopped; they will be sent again with the same Message-ID.`);
    if (this.config.smtpUrl) {
      this.transport = new MailTransport(this.config.smtpUrl);
    } else {
      this.mailbox = new LocalMailboxServer(this.mailboxMessages);
      const port = await this.mailbox.start(this.config.mailboxPort);
      this.transport = new MailTransport({ host: '127.0.0.1', port });
    }
    this.timer = setInterval(() => void this.deliverDue().catch((e) => this.logger.error(String(e))), this.config.mailPollMs);
    this.timer.unref();
  }

  async beforeApplicationShutdown(): Promise<void> {
    if (this.timer) clearInterval(this.timer);
    await this.delivering?.catch(() => undefined);
    this.transport?.close();
    await this.mailbox?.stop();
  }

  /** Writes messages to the outbox; pass the transaction of the event that causes them. Returns their ids. */
  async enqueue(messages: NewOutboxMessage[], executor?: Executor): Promise<string[]> {
    const rows = messages
      .filter((m) => {
        const ok = isPlainAddress(m.toAddress);
        if (!ok)
          this.logger.warn(`Skipped an e-mail to an address that is not a plain address: ${JSON.stringify(m.toAddress).slice(0, 80)}`);
        return ok;
      })
      .map(({ dedupeKey, ...m }) => {
        const id = randomUUID();
        const key = dedupeKey ? dedupeKey.replace(/[^A-Za-z0-9.-]/g, '-').slice(0, 120) : id;
        return {
          ...m,
          id,
          messageId: `<${key}@linkloom.local>`,
          subject: singleLineSubject(m.subject),
          headers: singleLineHeaders(m.headers),
        };
      });
    await this.outbox.insert(rows, executor);
    return rows.map((r) => r.id);
  }

  /** Delivers what is due now; one delivery pass at a time. Returns how many were sent. */
  deliverDue(): Promise<number> {
    this.delivering ??= this.deliverPass().finally(() => (this.delivering = null));
    return this.delivering;
  }

  private async deliverPass(): Promise<number> {
    if (!this.transport) return 0;
    let sent = 0;
    for (const row of await this.outbox.claimDue(20)) {
      if (await this.deliver(row)) sent++;
    }
    return sent;
  }

  private async deliver(row: OutboxRow): Promise<boolean> {
    try {
      await this.transport!.send({
        messageId: row.messageId,
        from: this.config.mailFrom,
        to: row.toAddress,
        subject: row.subject,
        text: row.text,
        html: row.html,
        headers: row.headers,
      });
      await this.outbox.markSent(row.id);
      return true;
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      const permanent = error instanceof MailDeliveryError && error.permanent;
      if (permanent || row.attempts >= MAX_ATTEMPTS) {
        await this.outbox.markFailed(row.id, message);
        this.logger.error(`E-mail ${row.messageId} to ${row.toAddress} failed for good: ${message}`);
      } else {
        const delay = Math.min(MAX_BACKOFF_MS, this.config.mailRetryBaseSeconds * 1000 * 2 ** (row.attempts - 1));
        await this.outbox.markRetry(row.id, message, new Date(Date.now() + delay));
      }
      return false;
    }
  }

  async listOutbox(
    status: OutboxRow['status'] | undefined,
    page: number,
    pageSize: number,
  ): Promise<ListResult<Omit<OutboxRow, 'text' | 'html' | 'headers'>>> {
    const { rows, total } = await this.outbox.list(status, (page - 1) * pageSize, pageSize);
    // The outbox list shows delivery state; bodies and header lines are read from the mailbox message.
    return { items: rows.map(({ text: _t, html: _h, headers: _l, ...rest }) => rest), total, page, pageSize };
  }

  async listMailbox(page: number, pageSize: number) {
    this.requireMailbox();
    const { rows, total } = await this.mailboxMessages.list((page - 1) * pageSize, pageSize);
    return {
      items: rows.map((r) => ({
        id: r.id,
        messageId: r.messageId,
        from: r.fromAddress,
        to: r.toAddresses,
        subject: r.subject,
        receivedAt: r.receivedAt.toISOString(),
      })),
      total,
      page,
      pageSize,
    };
  }

  async getMailboxMessage(id: string) {
    this.requireMailbox();
    const row = await this.mailboxMessages.findById(id);
    if (!row) throw notFound('The message');
    return {
      id: row.id,
      messageId: row.messageId,
      from: row.fromAddress,
      to: row.toAddresses,
      subject: row.subject,
      receivedAt: row.receivedAt.toISOString(),
      headers: row.headers,
      text: row.text,
      html: row.html,
    };
  }

  private requireMailbox(): void {
    if (!this.usesLocalMailbox) {
      throw new AppError(
        404,
        'MAILBOX_OFF',
        'The local mailbox is off because mail goes through SMTP_URL; read the messages in that mail system.',
      );
    }
  }
}
