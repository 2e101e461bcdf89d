// Who gets which e-mail, in which time zone, and the one-click unsubscribe: contracts of /api/me/notifications
// and /api/unsubscribe (docs/mail-and-work.md).
import { z } from 'zod';
import { named, recordId } from './contract.js';

/** Every kind of mail Linkloom sends to a person; each can be switched off on its own. */
export const MAIL_KINDS = ['digest', 'task-assigned', 'task-reopened', 'pruning-waiting'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];
export const mailKindSchema = z.enum(MAIL_KINDS);

export const MAIL_KIND_LABELS: Record<MailKind, string> = {
  digest: 'Digest of what changed',
  'task-assigned': 'A task assigned to you',
  'task-reopened': 'Your task reopened by a run',
  'pruning-waiting': 'Pruning list waiting for a decision',
};

/**
 * An IANA zone name such as "Europe/Berlin". The runtime's own time-zone data decides (ECMA-402: an unknown
 * zone makes `Intl.DateTimeFormat` throw a RangeError), so server and browser agree on what exists.
 */
export function isTimeZone(value: string): boolean {
  try {
    new Intl.DateTimeFormat('en', { timeZone: value });
    return true;
  } catch {
    return false;
  }
}

export const timeZoneSchema = z
  .string()
  .trim()
  .min(1)
  .max(64)
  .refine(isTimeZone, 'is not a time zone name; use an IANA name such as Europe/Berlin or America/New_York');

const kindSwitches = z.object({
  digest: z.boolean(),
  'task-assigned': z.boolean(),
  'task-reopened': z.boolean(),
  'pruning-waiting': z.boolean(),
});

/** One doc set's choices: its digest (and whether also when nothing changed) and its pruning-list mail. */
export const docSetNotificationSchema = z.object({
  docSetId: recordId,
  docSetName: z.string(),
  digest: z.boolean(),
  nothingChanged: z.boolean(),
  pruningWaiting: z.boolean(),
});

export const notificationSettingsSchema = named(
  'NotificationSettings',
  z.object({
    timeZone: z.string(),
    /** True while the user has not chosen a zone and the server's zone is used. */
    timeZoneIsDefault: z.boolean(),
    /** Off switches every mail of that kind, whatever the per-doc-set choices say. */
    kinds: kindSwitches,
    docSets: z.array(docSetNotificationSchema),
  }),
);
export type NotificationSettings = z.infer<typeof notificationSettingsSchema>;
export type DocSetNotification = z.infer<typeof docSetNotificationSchema>;

export const updateNotificationSettingsSchema = z
  .object({
    timeZone: timeZoneSchema.optional(),
    kinds: kindSwitches.partial().strict().optional(),
    docSets: z
      .array(
        z
          .object({
            docSetId: z.string().uuid(),
            digest: z.boolean().optional(),
            nothingChanged: z.boolean().optional(),
            pruningWaiting: z.boolean().optional(),
          })
          .strict(),
      )
      .max(1000)
      .optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'nothing to change: give timeZone, kinds or docSets');
export type UpdateNotificationSettings = z.infer<typeof updateNotificationSettingsSchema>;

/** One doc set's digest choice in the older contract (GET|PUT /api/me/subscriptions), kept for outside clients. */
export const subscriptionSchema = z.object({
  docSetId: recordId,
  /** Get the nightly digest for this doc set. */
  digest: z.boolean(),
  /** Also get it when the night's run changed nothing. */
  nothingChanged: z.boolean(),
});
export const subscriptionsSchema = named('Subscriptions', z.object({ subscriptions: z.array(subscriptionSchema) }));
export type Subscription = z.infer<typeof subscriptionSchema>;
export type Subscriptions = z.infer<typeof subscriptionsSchema>;

/** The body of PUT /api/me/subscriptions: every doc set's choice the client wants stored. */
export const updateSubscriptionsSchema = z
  .object({
    subscriptions: z.array(z.object({ docSetId: z.string().uuid(), digest: z.boolean(), nothingChanged: z.boolean() }).strict()).max(1000),
  })
  .strict();

/** What an unsubscribe link stands for, shown before the person confirms. */
export const unsubscribeInfoSchema = named(
  'UnsubscribeInfo',
  z.object({
    kind: mailKindSchema,
    kindLabel: z.string(),
    /** The address, partly hidden: anyone holding a forwarded mail may open the link. */
    maskedEmail: z.string(),
    subscribed: z.boolean(),
  }),
);
export type UnsubscribeInfo = z.infer<typeof unsubscribeInfoSchema>;

/** What the unsubscribe did, with a sentence to show. */
export const unsubscribeResultSchema = named('UnsubscribeResult', unsubscribeInfoSchema.extend({ message: z.string() }));
export type UnsubscribeResult = z.infer<typeof unsubscribeResultSchema>;
