import { Injectable } from '@nestjs/common';
import { count, desc, eq } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { mailboxMessages } from '../../db/schema/index.js';

export type MailboxRow = typeof mailboxMessages.$inferSelect;

@Injectable()
export class MailboxRepository {
  constructor(private readonly database: DbService) {}

  async insert(message: Omit<MailboxRow, 'id' | 'receivedAt'>): Promise<void> {
    await this.database.db.insert(mailboxMessages).values(message);
  }

  async list(offset: number, limit: number) {
    const rows = await this.database.db
      .select({
        id: mailboxMessages.id,
        messageId: mailboxMessages.messageId,
        toAddresses: mailboxMessages.toAddresses,
        subject: mailboxMessages.subject,
        receivedAt: mailboxMessages.receivedAt,
        fromAddress: mailboxMessages.fromAddress,
      })
      .from(mailboxMessages)
      .orderBy(desc(mailboxMessages.receivedAt))
      .offset(offset)
      .limit(limit);
    const [{ value }] = await this.database.db.select({ value: count() }).from(mailboxMessages);
    return { rows, total: value };
  }

  async findById(id: string): Promise<MailboxRow | null> {
    const [row] = await this.database.db.select().from(mailboxMessages).where(eq(mailboxMessages.id, id)).limit(1);
    return row ?? null;
  }
}
