// The nightly job as GET /api/schedule reports it (docs/mail-and-work.md).
import { z } from 'zod';

/** One doc set's part in a nightly job, with how many people its digest went to. */
export const nightlyDocSetResultSchema = z.object({
  docSetId: z.string(),
  name: z.string(),
  action: z.enum(['re-read folder', 're-analysed']),
  outcome: z.enum(['finished', 'failed']),
  runId: z.string().optional(),
  runNumber: z.number().int().nullable().optional(),
  message: z.string().optional(),
  /** People the digest of this run was queued for; absent in results recorded before digests were counted. */
  digestSentTo: z.number().int().min(0).optional(),
});
export type NightlyDocSetResult = z.infer<typeof nightlyDocSetResultSchema>;

export const nightlyResultSchema = z.object({
  trigger: z.enum(['clock', 'run-now', 'catch-up']).optional(),
  status: z.enum(['finished', 'skipped']),
  reason: z.string().optional(),
  docSets: z.array(nightlyDocSetResultSchema),
});
export type NightlyResult = z.infer<typeof nightlyResultSchema>;

export const scheduleStatusSchema = z.object({
  nightlyTime: z.string(),
  timeZone: z.string(),
  nextRunAt: z.string(),
  running: z.boolean(),
  lastStartedAt: z.string().nullable(),
  lastFinishedAt: z.string().nullable(),
  lastResult: nightlyResultSchema.nullable(),
  docSets: z.array(z.object({ id: z.string(), name: z.string(), nightly: z.boolean(), sourceFolder: z.string().nullable() })),
});
export type ScheduleStatus = z.infer<typeof scheduleStatusSchema>;

export const runNowResultSchema = z.object({ started: z.boolean(), reason: z.string().optional() });
export type RunNowResult = z.infer<typeof runNowResultSchema>;
