import { z } from 'zod';
import { isoDateTime, listOf, named, recordId } from './contract.js';
import { docSetSettingsValueSchema } from './doc-set-settings.js';

const count = z.int().nonnegative();

/** Counts of every finding of one run (the `counts` of a run, docs/api.md "Runs"). */
export const runCountsSchema = named(
  'RunCounts',
  z.object({
    pages: count,
    links: count,
    internalLinks: count,
    externalLinks: count,
    brokenLinks: count,
    brokenAnchors: count,
    brokenAssets: count,
    unsafeLinks: count,
    ambiguousLinks: count,
    redirectedLinks: count,
    outOfScopeLinks: count,
    orphans: count,
    deadEnds: count,
    unreachable: count,
    deepPages: count,
    islands: count,
  }),
);
export type RunCounts = z.infer<typeof runCountsSchema>;

export const RUN_STATUSES = ['queued', 'running', 'finished', 'failed'] as const;
export const RUN_TRIGGERS = ['import', 'manual', 'nightly'] as const;

/** One analysis of a snapshot with the settings it used; `counts` once it has finished. */
export const runSchema = named(
  'Run',
  z.object({
    id: recordId,
    /** 1, 2, 3... per doc set in the order runs were queued, so people can name a run ("verified by run 7"). */
    number: z.int().positive().nullable(),
    docSetId: recordId,
    snapshotId: recordId,
    status: z.enum(RUN_STATUSES),
    trigger: z.enum(RUN_TRIGGERS),
    settings: docSetSettingsValueSchema,
    createdAt: isoDateTime,
    startedAt: isoDateTime.nullable(),
    finishedAt: isoDateTime.nullable(),
    iterations: z.int().nonnegative().nullable(),
    residual: z.number().nonnegative().nullable(),
    durationMs: z.int().nonnegative().nullable(),
    counts: runCountsSchema.nullable(),
    /** Things a reader should know about how the run was made (e.g. no entry page found). */
    warnings: z.array(z.object({ code: z.string(), message: z.string() })),
    error: z.string().nullable(),
    createdBy: recordId.nullable(),
  }),
);
export const runListSchema = listOf('RunList', runSchema);
/** The answer to starting a run: queued (202), it goes on in the background. */
export const runAcceptedSchema = named('RunAccepted', z.object({ run: runSchema }));

export type Run = z.infer<typeof runSchema>;
export type RunStatus = Run['status'];
export type RunTrigger = Run['trigger'];
