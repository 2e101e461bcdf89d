import { z } from 'zod';
import { isoDateTime, listOf, named, recordId } from './contract.js';

export const SNAPSHOT_STATUSES = ['received', 'importing', 'ready', 'failed'] as const;
export const SNAPSHOT_SOURCES = ['upload', 'ci', 'folder', 'demo'] as const;

export const snapshotWarningSchema = z.object({ path: z.string(), code: z.string(), message: z.string(), line: z.int().optional() });

/** One imported version of a doc set (docs/api.md "Doc sets and imports"). */
export const snapshotSchema = named(
  'Snapshot',
  z.object({
    id: recordId,
    docSetId: recordId,
    status: z.enum(SNAPSHOT_STATUSES),
    source: z.enum(SNAPSHOT_SOURCES),
    label: z.string().nullable(),
    progress: z.object({ done: z.int().nonnegative(), total: z.int().nonnegative() }),
    error: z.string().nullable(),
    errorCode: z.string().nullable(),
    pageCount: z.int().nonnegative(),
    linkCount: z.int().nonnegative(),
    assetCount: z.int().nonnegative(),
    reusedPageCount: z.int().nonnegative(),
    warnings: z.array(snapshotWarningSchema),
    ignored: z.array(z.object({ path: z.string(), reason: z.string() })),
    createdAt: isoDateTime,
    createdBy: recordId.nullable(),
    finishedAt: isoDateTime.nullable(),
    archiveSha256: z.string().nullable(),
    archiveBytes: z.int().nonnegative().nullable(),
    importMs: z.int().nonnegative().nullable(),
  }),
);
export const snapshotListSchema = listOf('SnapshotList', snapshotSchema);
/** The answer to an upload or a re-read: accepted (202), the import goes on in the background. */
export const snapshotAcceptedSchema = named('SnapshotAccepted', z.object({ snapshot: snapshotSchema }));

export type Snapshot = z.infer<typeof snapshotSchema>;
export type SnapshotStatus = Snapshot['status'];
export type SnapshotWarning = z.infer<typeof snapshotWarningSchema>;
