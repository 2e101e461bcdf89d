// The nightly job as GET /api/schedule reports it (docs/api.md, docs/mail-and-work.md).
import { z } from 'zod';
import { isoDateTime, named, recordId } from './contract.js';

/** One doc set's part in a nightly job, with how many people its digest went to. */
export const nightlyDocSetResultSchema = z.object({
  docSetId: recordId,
  name: z.string(),
  action: z.enum(['re-read folder', 're-analysed']),
  outcome: z.enum(['finished', 'failed']),
  runId: recordId.optional(),
  runNumber: z.int().positive().nullable().optional(),
  message: z.string().optional(),
  /** People the digest of this run was queued for; absent in results recorded before digests were counted. */
  digestSentTo: z.int().nonnegative().optional(),
});

export const nightlyResultSchema = z.object({
  trigger: z.enum(['clock', 'run-now', 'catch-up']).optional(),
  status: z.enum(['finished', 'skipped']),
  reason: z.string().optional(),
  docSets: z.array(nightlyDocSetResultSchema),
});

export const scheduleStatusSchema = named(
  'ScheduleStatus',
  z.object({
    /** Local time of day, `HH:MM`, in `timeZone`. */
    nightlyTime: z.string(),
    timeZone: z.string(),
    nextRunAt: isoDateTime,
    running: z.boolean(),
    lastStartedAt: isoDateTime.nullable(),
    lastFinishedAt: isoDateTime.nullable(),
    lastResult: nightlyResultSchema.nullable(),
    docSets: z.array(z.object({ id: recordId, name: z.string(), nightly: z.boolean(), sourceFolder: z.string().nullable() })),
  }),
);

export const runNowResultSchema = named(
  'RunNowResult',
  z.object({
    started: z.boolean(),
    /** Why the job was not started, in a sentence. */
    reason: z.string().optional(),
  }),
);

export type NightlyDocSetResult = z.infer<typeof nightlyDocSetResultSchema>;
export type NightlyResult = z.infer<typeof nightlyResultSchema>;
export type ScheduleStatus = z.infer<typeof scheduleStatusSchema>;
export type RunNowResult = z.infer<typeof runNowResultSchema>;
