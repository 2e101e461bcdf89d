import { boolean, index, pgTable, primaryKey, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { docSets } from './doc-sets.js';
import { runs } from './runs.js';
import { users } from './users.js';

/**
 * Per user and doc set: whether to get its digest (also when nothing changed) and its pruning-list mail.
 * No row, or a null column, means the default of the user's role.
 */
export const subscriptions = pgTable(
  'subscriptions',
  {
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    digest: boolean('digest').notNull().default(true),
    nothingChanged: boolean('nothing_changed').notNull().default(false),
    pruningWaiting: boolean('pruning_waiting'),
  },
  (t) => [primaryKey({ columns: [t.userId, t.docSetId] })],
);

/** Per user: the time zone mail dates are written in, and one switch per kind of mail (off beats any doc-set choice). */
export const notificationSettings = pgTable('notification_settings', {
  userId: uuid('user_id')
    .primaryKey()
    .references(() => users.id, { onDelete: 'cascade' }),
  timeZone: text('time_zone'),
  digest: boolean('digest').notNull().default(true),
  taskAssigned: boolean('task_assigned').notNull().default(true),
  taskReopened: boolean('task_reopened').notNull().default(true),
  pruningWaiting: boolean('pruning_waiting').notNull().default(true),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

/**
 * One row per digest per reader and run: which run it covered and which run it compared with (also for a
 * digest not mailed because nothing changed). A reader's next digest starts
 * from the run their last one covered, so changes made between two nightly runs (uploads, CI pushes, settings)
 * are never skipped.
 */
export const digestDeliveries = pgTable(
  'digest_deliveries',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    userId: uuid('user_id')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    runId: uuid('run_id')
      .notNull()
      .references(() => runs.id, { onDelete: 'cascade' }),
    againstRunId: uuid('against_run_id'),
    /** The outbox row of the mail; null when nothing changed and the reader asked not to be told so. */
    outboxId: uuid('outbox_id'),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex('digest_deliveries_once').on(t.userId, t.runId),
    index('digest_deliveries_cursor_idx').on(t.userId, t.docSetId, t.createdAt),
    index('digest_deliveries_run_idx').on(t.runId),
  ],
);

export type DigestDeliveryRow = typeof digestDeliveries.$inferSelect;
export type NotificationSettingsRow = typeof notificationSettings.$inferSelect;
