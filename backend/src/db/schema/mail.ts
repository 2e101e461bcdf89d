import { index, integer, jsonb, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';

/**
 * Every e-mail is first written here, in the same transaction as the event that causes it; a sender
 * delivers it later with retries. The Message-ID is fixed at enqueue time, so a crash between "accepted by
 * the server" and "marked sent" can only produce a duplicate with the same id, never a loss.
 */
export const outbox = pgTable(
  'outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    messageId: text('message_id').notNull(),
    kind: text('kind').notNull(),
    toAddress: text('to_address').notNull(),
    subject: text('subject').notNull(),
    text: text('text').notNull(),
    html: text('html').notNull(),
    /** Extra header lines (List-Unsubscribe and List-Unsubscribe-Post, RFC 2369 and RFC 8058). */
    headers: jsonb('headers').$type<Record<string, string>>().notNull().default({}),
    status: text('status', { enum: ['pending', 'sending', 'sent', 'failed'] })
      .notNull()
      .default('pending'),
    attempts: integer('attempts').notNull().default(0),
    nextAttemptAt: timestamp('next_attempt_at', { withTimezone: true }).notNull().defaultNow(),
    lastError: text('last_error'),
    docSetId: uuid('doc_set_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    sentAt: timestamp('sent_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('outbox_message_id_unique').on(t.messageId), index('outbox_due_idx').on(t.status, t.nextAttemptAt)],
);

/** Messages caught by the built-in local mailbox (the SMTP stand-in used when no SMTP_URL is set). */
export const mailboxMessages = pgTable(
  'mailbox_messages',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    messageId: text('message_id'),
    fromAddress: text('from_address').notNull().default(''),
    toAddresses: jsonb('to_addresses').$type<string[]>().notNull().default([]),
    subject: text('subject').notNull().default(''),
    text: text('text').notNull().default(''),
    html: text('html').notNull().default(''),
    /** The list headers as received (lower-case names), so people and tests can see what a mail client sees. */
    headers: jsonb('headers').$type<Record<string, string>>().notNull().default({}),
    bytes: integer('bytes').notNull().default(0),
    receivedAt: timestamp('received_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('mailbox_received_idx').on(t.receivedAt)],
);

/** A lease per scheduled job, so two processes on one database run a job once. */
export const jobLeases = pgTable('job_leases', {
  name: text('name').primaryKey(),
  holder: text('holder'),
  leaseUntil: timestamp('lease_until', { withTimezone: true }),
  lastStartedAt: timestamp('last_started_at', { withTimezone: true }),
  lastFinishedAt: timestamp('last_finished_at', { withTimezone: true }),
  lastResult: jsonb('last_result').$type<Record<string, unknown>>(),
});
