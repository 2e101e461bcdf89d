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
export const mailboxMessageSchema = named('MailboxMessage', mailboxMessageSummarySchema.extend({ text: z.string(), html: z.string() }));

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

/** One doc set's mail choice for the signed-in user. */
export const subscriptionSchema = z.object({
  docSetId: recordId,
  /** Get the nightly digest for this doc set. */
  digest: z.boolean(),
  /** Also get it when the night's run changed nothing. */
  nothingChanged: z.boolean(),
});
export const subscriptionsSchema = named('Subscriptions', z.object({ subscriptions: z.array(subscriptionSchema) }));

export type MailboxMessageSummary = z.infer<typeof mailboxMessageSummarySchema>;
export type MailboxMessage = z.infer<typeof mailboxMessageSchema>;
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
export type Subscription = z.infer<typeof subscriptionSchema>;
export type Subscriptions = z.infer<typeof subscriptionsSchema>;
