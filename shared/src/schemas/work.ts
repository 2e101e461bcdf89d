import { z } from 'zod';

/** Fix tasks and the pruning list as the HTTP contract carries them (docs/mail-and-work.md). */
export const TASK_KINDS = [
  'add-inbound-links',
  'repair-broken-links',
  'add-outbound-links',
  'make-reachable',
  'review-pruning',
  'other',
] as const;
/**
 * `done` is the writer's word; `verified` ("fixed and verified by run N") is set only by a run that no longer
 * finds any of the task's findings, so the two are never confused.
 */
export const TASK_STATUSES = ['open', 'in-progress', 'done', 'verified', 'wont-fix'] as const;
/** The statuses a person may choose; `verified` belongs to runs. */
export const TASK_STATUSES_SET_BY_PEOPLE = ['open', 'in-progress', 'done', 'wont-fix'] as const;
export const TASK_PRIORITIES = ['low', 'normal', 'high'] as const;
export type TaskKind = (typeof TASK_KINDS)[number];
export type TaskStatus = (typeof TASK_STATUSES)[number];
export type TaskPriority = (typeof TASK_PRIORITIES)[number];

/** One link finding a task holds; `sourcePath` is the page it is on (older tasks: the task's page). */
export const taskLinkFindingSchema = z.object({
  sourcePath: z.string().optional(),
  href: z.string(),
  line: z.number().int(),
  status: z.string(),
});

/** What a task was made from: exactly the selected links or pages, or the suggested source pages with their gain. */
export const taskFindingSchema = z.object({
  brokenLinks: z.array(taskLinkFindingSchema).optional(),
  /** The pages of a grouped page task (orphans, dead ends...), each with the flags it had. */
  pages: z.array(z.object({ path: z.string(), flags: z.array(z.string()) })).optional(),
  suggestedSources: z.array(z.object({ path: z.string(), title: z.string(), scoreGain: z.number() })).optional(),
  flags: z.array(z.string()).optional(),
});
export type TaskFinding = z.infer<typeof taskFindingSchema>;
export type TaskLinkFinding = z.infer<typeof taskLinkFindingSchema>;

/** One finding of a task as a run saw it: for a link its href and line, for a page only the path. */
export const taskCheckItemSchema = z.object({
  pagePath: z.string(),
  href: z.string().nullable(),
  line: z.number().int().nullable(),
  stillFound: z.boolean(),
  /** The link's status in that run when still found (broken or broken-anchor). */
  status: z.string().nullable(),
});

/** The latest run's verdict on a task, finding by finding. */
export const taskCheckSchema = z.object({
  runId: z.string(),
  runNumber: z.number().int().nullable(),
  at: z.string(),
  outcome: z.enum(['verified', 'reopened', 'still-found', 'partly-fixed']),
  items: z.array(taskCheckItemSchema),
});
export type TaskCheck = z.infer<typeof taskCheckSchema>;
export type TaskCheckItem = z.infer<typeof taskCheckItemSchema>;

export const taskItemSchema = z.object({
  id: z.string(),
  docSetId: z.string(),
  docSetName: z.string().nullable(),
  pagePath: z.string(),
  kind: z.enum(TASK_KINDS),
  title: z.string(),
  details: z.string(),
  finding: taskFindingSchema,
  assignee: z.object({ id: z.string(), name: z.string(), email: z.string() }).nullable(),
  priority: z.enum(TASK_PRIORITIES),
  dueDate: z.string().nullable(),
  overdue: z.boolean(),
  status: z.enum(TASK_STATUSES),
  verification: z.enum(['verified', 'flagged']).nullable(),
  verifiedAt: z.string().nullable(),
  check: taskCheckSchema.nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type TaskItem = z.infer<typeof taskItemSchema>;

export const taskEventItemSchema = z.object({
  id: z.string(),
  type: z.enum(['comment', 'change']),
  actor: z.object({ id: z.string().nullable(), name: z.string() }),
  body: z.string(),
  changes: z.record(z.string(), z.object({ from: z.unknown(), to: z.unknown() })),
  at: z.string(),
});
export type TaskEventItem = z.infer<typeof taskEventItemSchema>;

export const taskDetailSchema = taskItemSchema.extend({ events: z.array(taskEventItemSchema) });
export type TaskDetail = z.infer<typeof taskDetailSchema>;

export type PruningDecision = 'approve' | 'reject' | 'keep';

export interface PruningReason {
  rule: 'orphan' | 'unreachable' | 'low-score' | 'stale' | 'thin' | 'nominated';
  detail: string;
}

export interface PruningItem {
  path: string;
  title: string;
  reasons: PruningReason[];
  inLatestRun: boolean;
  inboundCount: number | null;
  stationaryScore: number | null;
  wordCount: number | null;
  reviewedAt: string | null;
  firstProposedAt: string;
  nominations: { by: string; reason: string; at: string }[];
  decision: null | { decision: PruningDecision; note: string; by: string; at: string; flagged: boolean; flagReason: string | null };
}
