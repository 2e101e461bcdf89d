import { z } from 'zod';
import { isoDateTime, listOf, named, recordId } from './contract.js';

/** A message the built-in local mailbox caught (GET /api/mail). */
export const mailboxMessageSummarySchema = named(
  'MailboxMessageSummary',
  z.object({
    id: recordId,
    messageId: z.string().nullable(),
    from: z.string(),
    to: z.array(z.string()),
    subject: z.string(),
    receivedAt: isoDateTime,
  }),
);
export const mailboxListSchema = listOf('MailboxList', mailboxMessageSummarySchema);
export const mailboxMessageSchema = named(
  'MailboxMessage',
  mailboxMessageSummarySchema.extend({
    /** The List-* header lines as received (lower-case names), as a mail client sees them (RFC 2369, RFC 8058). */
    headers: z.record(z.string(), z.string()),
    text: z.string(),
    html: z.string(),
  }),
);

export const OUTBOX_STATUSES = ['pending', 'sending', 'sent', 'failed'] as const;
export type OutboxStatus = (typeof OUTBOX_STATUSES)[number];

/** One e-mail in the durable outbox with its delivery state (GET /api/outbox). */
export const outboxMessageSchema = named(
  'OutboxMessage',
  z.object({
    id: recordId,
    messageId: z.string(),
    kind: z.string(),
    toAddress: z.string(),
    subject: z.string(),
    status: z.enum(OUTBOX_STATUSES),
    attempts: z.int().nonnegative(),
    nextAttemptAt: isoDateTime,
    lastError: z.string().nullable(),
    docSetId: recordId.nullable(),
    createdAt: isoDateTime,
    sentAt: isoDateTime.nullable(),
  }),
);
export const outboxListSchema = listOf('OutboxList', outboxMessageSchema);
export const outboxDeliveryResultSchema = named('OutboxDeliveryResult', z.object({ sent: z.int().nonnegative() }));

export type MailboxMessageSummary = z.infer<typeof mailboxMessageSummarySchema>;
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
