import type { DocSetSettings, RunCounts } from '@linkloom/shared';
import { bigint, boolean, doublePrecision, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { docSets } from './doc-sets.js';
import { snapshots } from './snapshots.js';
import { users } from './users.js';

export type { RunCounts } from '@linkloom/shared';

/** One analysis of a snapshot with given settings; its results stay, so trends and diffs come from stored runs. */
export const runs = pgTable(
  'runs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    /** 1, 2, 3... per doc set in the order runs were queued, so people can name a run ("verified by run 7"). */
    number: integer('number'),
    snapshotId: uuid('snapshot_id')
      .notNull()
      .references(() => snapshots.id, { onDelete: 'cascade' }),
    status: text('status', { enum: ['queued', 'running', 'finished', 'failed'] })
      .notNull()
      .default('queued'),
    trigger: text('trigger', { enum: ['import', 'manual', 'nightly'] }).notNull(),
    settings: jsonb('settings').$type<DocSetSettings>().notNull(),
    iterations: integer('iterations'),
    residual: doublePrecision('residual'),
    durationMs: integer('duration_ms'),
    counts: jsonb('counts').$type<RunCounts>(),
    error: text('error'),
    /** Things a reader should know about how the run was made (e.g. no entry page found). */
    warnings: jsonb('warnings').$type<{ code: string; message: string }[]>().notNull().default([]),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    startedAt: timestamp('started_at', { withTimezone: true }),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
  },
  (t) => [index('runs_doc_set_idx').on(t.docSetId, t.createdAt), index('runs_status_idx').on(t.status)],
);

/** Per-page results of a run: stored, never aggregated at read time, so lists stay fast at 100,000 pages. */
export const pageMetrics = pgTable(
  'page_metrics',
  {
    runId: uuid('run_id')
      .notNull()
      .references(() => runs.id, { onDelete: 'cascade' }),
    pageId: bigint('page_id', { mode: 'number' }).notNull(),
    path: text('path').notNull(),
    title: text('title').notNull(),
    stationaryScore: doublePrecision('stationary_score').notNull(),
    timesAverage: doublePrecision('times_average').notNull(),
    rank: integer('rank').notNull(),
    inboundCount: integer('inbound_count').notNull(),
    outboundCount: integer('outbound_count').notNull(),
    depth: integer('depth'),
    reachable: boolean('reachable').notNull(),
    orphan: boolean('orphan').notNull(),
    deadEnd: boolean('dead_end').notNull(),
    deep: boolean('deep').notNull(),
    islandId: integer('island_id'),
    brokenLinkCount: integer('broken_link_count').notNull().default(0),
    wordCount: integer('word_count').notNull().default(0),
  },
  (t) => [
    primaryKey({ columns: [t.runId, t.pageId] }),
    index('page_metrics_rank_idx').on(t.runId, t.rank),
    index('page_metrics_path_idx').on(t.runId, t.path),
    // Rank as the last key makes every sort total (stable paging) and still served by the index alone.
    index('page_metrics_inbound_idx').on(t.runId, t.inboundCount, t.rank),
    index('page_metrics_outbound_idx').on(t.runId, t.outboundCount, t.rank),
    index('page_metrics_depth_idx').on(t.runId, t.depth, t.rank),
  ],
);

/** Suggested source pages for a page that needs links, with the score gain a link from each would bring. */
export const linkSuggestions = pgTable(
  'link_suggestions',
  {
    runId: uuid('run_id')
      .notNull()
      .references(() => runs.id, { onDelete: 'cascade' }),
    targetPageId: bigint('target_page_id', { mode: 'number' }).notNull(),
    sourcePageId: bigint('source_page_id', { mode: 'number' }).notNull(),
    scoreGain: doublePrecision('score_gain').notNull(),
    reason: text('reason', { enum: ['unlinked-mention', 'same-folder'] }).notNull(),
    position: integer('position').notNull(),
  },
  (t) => [primaryKey({ columns: [t.runId, t.targetPageId, t.sourcePageId] })],
);

export type RunRow = typeof runs.$inferSelect;
export type PageMetricRow = typeof pageMetrics.$inferSelect;
