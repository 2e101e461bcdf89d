import { sql } from 'drizzle-orm';
import {
  bigint,
  bigserial,
  boolean,
  customType,
  index,
  integer,
  jsonb,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { docSets } from './doc-sets.js';
import { users } from './users.js';

const tsvector = customType<{ data: string }>({ dataType: () => 'tsvector' });

export interface SnapshotWarning {
  path: string;
  code: string;
  message: string;
  line?: number;
}

/** One imported version of a doc set. Readers only ever see `ready` snapshots. */
export const snapshots = pgTable(
  'snapshots',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    status: text('status', { enum: ['received', 'importing', 'ready', 'failed'] })
      .notNull()
      .default('received'),
    source: text('source', { enum: ['upload', 'ci', 'folder', 'demo'] }).notNull(),
    label: text('label'),
    progressDone: integer('progress_done').notNull().default(0),
    progressTotal: integer('progress_total').notNull().default(0),
    errorCode: text('error_code'),
    error: text('error'),
    pageCount: integer('page_count').notNull().default(0),
    linkCount: integer('link_count').notNull().default(0),
    assetCount: integer('asset_count').notNull().default(0),
    reusedPageCount: integer('reused_page_count').notNull().default(0),
    warnings: jsonb('warnings').$type<SnapshotWarning[]>().notNull().default([]),
    ignored: jsonb('ignored').$type<{ path: string; reason: string }[]>().notNull().default([]),
    archiveSha256: text('archive_sha256'),
    archiveBytes: integer('archive_bytes'),
    importMs: integer('import_ms'),
    createdBy: uuid('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    finishedAt: timestamp('finished_at', { withTimezone: true }),
  },
  (t) => [
    index('snapshots_doc_set_idx').on(t.docSetId, t.createdAt),
    index('snapshots_status_idx').on(t.status),
    // One import at a time per doc set, decided by the database: a second insert while one runs fails.
    uniqueIndex('snapshots_one_import_per_doc_set')
      .on(t.docSetId)
      .where(sql`status in ('received', 'importing')`),
    index('snapshots_created_by_idx').on(t.createdBy, t.createdAt),
  ],
);

/** A page of a snapshot with its parse results (kept so unchanged pages are not parsed again). */
export const pages = pgTable(
  'pages',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    snapshotId: uuid('snapshot_id')
      .notNull()
      .references(() => snapshots.id, { onDelete: 'cascade' }),
    path: text('path').notNull(),
    title: text('title').notNull(),
    contentHash: text('content_hash').notNull(),
    wordCount: integer('word_count').notNull().default(0),
    ownerEmail: text('owner_email'),
    reviewedAt: text('reviewed_at'),
    protected: boolean('protected').notNull().default(false),
    /** PageFacts of the link core without `text` and `links` (headings, anchors, front matter, warnings). */
    facts: jsonb('facts').$type<Record<string, unknown>>().notNull(),
    /** The RawLink list of the link core, reused as is when the content hash is unchanged. */
    rawLinks: jsonb('raw_links').$type<unknown[]>().notNull(),
    text: text('text').notNull().default(''),
    search: tsvector('search').generatedAlwaysAs(
      sql`setweight(to_tsvector('english', coalesce(title, '')), 'A') || setweight(to_tsvector('english', coalesce(facts->>'headingText', '')), 'B') || setweight(to_tsvector('english', left(coalesce(text, ''), 200000)), 'C')`,
    ),
  },
  (t) => [
    uniqueIndex('pages_snapshot_path_unique').on(t.snapshotId, t.path),
    index('pages_snapshot_hash_idx').on(t.snapshotId, t.contentHash),
    index('pages_search_idx').using('gin', t.search),
  ],
);

/** Every link found, with how it resolved. */
export const links = pgTable(
  'links',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    snapshotId: uuid('snapshot_id')
      .notNull()
      .references(() => snapshots.id, { onDelete: 'cascade' }),
    sourcePageId: bigint('source_page_id', { mode: 'number' }).notNull(),
    line: integer('line').notNull(),
    column: integer('column').notNull(),
    href: text('href').notNull(),
    kind: text('kind').notNull(),
    status: text('status').notNull(),
    targetPageId: bigint('target_page_id', { mode: 'number' }),
    targetPath: text('target_path'),
    targetIsAsset: boolean('target_is_asset').notNull().default(false),
    anchor: text('anchor'),
    reason: text('reason'),
    flags: text('flags')
      .array()
      .notNull()
      .default(sql`'{}'::text[]`),
  },
  (t) => [
    index('links_snapshot_source_idx').on(t.snapshotId, t.sourcePageId),
    index('links_snapshot_target_idx').on(t.snapshotId, t.targetPageId),
    index('links_snapshot_status_idx').on(t.snapshotId, t.status),
  ],
);

export const assets = pgTable(
  'assets',
  {
    id: bigserial('id', { mode: 'number' }).primaryKey(),
    snapshotId: uuid('snapshot_id')
      .notNull()
      .references(() => snapshots.id, { onDelete: 'cascade' }),
    path: text('path').notNull(),
    bytes: integer('bytes').notNull().default(0),
  },
  (t) => [uniqueIndex('assets_snapshot_path_unique').on(t.snapshotId, t.path)],
);

export type SnapshotRow = typeof snapshots.$inferSelect;
export type PageRow = typeof pages.$inferSelect;
export type LinkRow = typeof links.$inferSelect;
