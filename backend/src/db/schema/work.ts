import { TASK_KINDS, TASK_PRIORITIES, TASK_STATUSES, type PruningReason, type TaskCheck, type TaskFinding } from '@linkloom/shared';
import {
  boolean,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { docSets } from './doc-sets.js';
import { users } from './users.js';

// The contract types live in shared/ (front and back end use them); re-exported for the schema's readers.
export { TASK_KINDS, TASK_STATUSES, type PruningReason, type TaskCheck, type TaskFinding };

/**
 * A fix task. Keyed to the page by doc set + path (not by page id), so it follows the page across snapshots.
 * `verification` is set by runs: `verified` when the finding is gone, `flagged` when done but still there;
 * `lastCheck` keeps the latest run's verdict finding by finding (which link is still found).
 */
export const tasks = pgTable(
  'tasks',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    pagePath: text('page_path').notNull(),
    kind: text('kind', { enum: TASK_KINDS }).notNull(),
    title: text('title').notNull(),
    details: text('details').notNull().default(''),
    finding: jsonb('finding').$type<TaskFinding>().notNull().default({}),
    assigneeId: uuid('assignee_id').references(() => users.id, { onDelete: 'set null' }),
    priority: text('priority', { enum: TASK_PRIORITIES }).notNull().default('normal'),
    dueDate: text('due_date'),
    status: text('status', { enum: TASK_STATUSES }).notNull().default('open'),
    verification: text('verification', { enum: ['verified', 'flagged'] }),
    verifiedRunId: uuid('verified_run_id'),
    verifiedAt: timestamp('verified_at', { withTimezone: true }),
    lastCheck: jsonb('last_check').$type<TaskCheck>(),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('tasks_doc_set_path_idx').on(t.docSetId, t.pagePath),
    index('tasks_assignee_status_idx').on(t.assigneeId, t.status),
    index('tasks_status_due_idx').on(t.status, t.dueDate),
  ],
);

/** The task's thread: comments and every change (status, assignee, verification), oldest first. */
export const taskEvents = pgTable(
  'task_events',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    taskId: uuid('task_id')
      .notNull()
      .references(() => tasks.id, { onDelete: 'cascade' }),
    type: text('type', { enum: ['comment', 'change'] }).notNull(),
    actorId: uuid('actor_id').references(() => users.id, { onDelete: 'set null' }),
    actorName: text('actor_name').notNull(),
    body: text('body').notNull().default(''),
    changes: jsonb('changes').$type<Record<string, { from: unknown; to: unknown }>>().notNull().default({}),
    /** The run that made this change (verification), so a digest can list what its runs did. */
    runId: uuid('run_id'),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('task_events_task_idx').on(t.taskId, t.at), index('task_events_run_idx').on(t.runId)],
);

/** One row per doc set: the pruning list's optimistic-concurrency version and the run it was built from. */
export const pruningLists = pgTable('pruning_lists', {
  docSetId: uuid('doc_set_id')
    .primaryKey()
    .references(() => docSets.id, { onDelete: 'cascade' }),
  version: integer('version').notNull().default(0),
  runId: uuid('run_id'),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
});

/** The pages shown on the pruning list for the latest run (rule matches, nominations and decided pages). */
export const pruningCandidates = pgTable(
  'pruning_candidates',
  {
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    path: text('path').notNull(),
    runId: uuid('run_id'),
    title: text('title').notNull().default(''),
    reasons: jsonb('reasons').$type<PruningReason[]>().notNull().default([]),
    inboundCount: integer('inbound_count'),
    stationaryScore: doublePrecision('stationary_score'),
    wordCount: integer('word_count'),
    reviewedAt: text('reviewed_at'),
    inLatestRun: boolean('in_latest_run').notNull().default(true),
    firstProposedAt: timestamp('first_proposed_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.docSetId, t.path] })],
);

/** An editor's decision on a page, keyed by doc set + path so it follows the page across snapshots and runs. */
export const pruningDecisions = pgTable(
  'pruning_decisions',
  {
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    path: text('path').notNull(),
    decision: text('decision', { enum: ['approve', 'reject', 'keep'] }).notNull(),
    note: text('note').notNull().default(''),
    decidedBy: uuid('decided_by').references(() => users.id, { onDelete: 'set null' }),
    decidedByName: text('decided_by_name').notNull(),
    decidedAt: timestamp('decided_at', { withTimezone: true }).notNull().defaultNow(),
    inboundAtDecision: integer('inbound_at_decision'),
    flaggedAt: timestamp('flagged_at', { withTimezone: true }),
    flagReason: text('flag_reason'),
  },
  (t) => [primaryKey({ columns: [t.docSetId, t.path] })],
);

/** A writer's or editor's proposal to prune a page, with the reason; several people may nominate one page. */
export const pruningNominations = pgTable(
  'pruning_nominations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    path: text('path').notNull(),
    reason: text('reason').notNull(),
    nominatedBy: uuid('nominated_by').references(() => users.id, { onDelete: 'set null' }),
    nominatedByName: text('nominated_by_name').notNull(),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('pruning_nominations_path_idx').on(t.docSetId, t.path),
    uniqueIndex('pruning_nominations_once').on(t.docSetId, t.path, t.nominatedBy),
  ],
);

export type TaskRow = typeof tasks.$inferSelect;
export type TaskEventRow = typeof taskEvents.$inferSelect;
export type PruningCandidateRow = typeof pruningCandidates.$inferSelect;
export type PruningDecisionRow = typeof pruningDecisions.$inferSelect;
