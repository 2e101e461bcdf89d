import { z } from 'zod';
import { isoDateTime, listOf, named, pagedShape, recordId } from './contract.js';
import { roleSchema } from './roles.js';

/** Fix tasks and the pruning list as the HTTP contract carries them (docs/api.md "Work", docs/mail-and-work.md). */
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
  line: z.int().nonnegative(),
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
  line: z.int().nonnegative().nullable(),
  stillFound: z.boolean(),
  /** The link's status in that run when still found (broken or broken-anchor). */
  status: z.string().nullable(),
});

/** The latest run's verdict on a task, finding by finding. */
export const taskCheckSchema = z.object({
  runId: recordId,
  runNumber: z.int().positive().nullable(),
  at: isoDateTime,
  outcome: z.enum(['verified', 'reopened', 'still-found', 'partly-fixed']),
  items: z.array(taskCheckItemSchema),
});
export type TaskCheck = z.infer<typeof taskCheckSchema>;
export type TaskCheckItem = z.infer<typeof taskCheckItemSchema>;

export const taskItemSchema = named(
  'Task',
  z.object({
    id: recordId,
    docSetId: recordId,
    docSetName: z.string().nullable(),
    pagePath: z.string(),
    kind: z.enum(TASK_KINDS),
    title: z.string(),
    details: z.string(),
    finding: taskFindingSchema,
    assignee: z.object({ id: recordId, name: z.string(), email: z.string() }).nullable(),
    priority: z.enum(TASK_PRIORITIES),
    /** A calendar day, `YYYY-MM-DD`. */
    dueDate: z.iso.date().nullable(),
    overdue: z.boolean(),
    status: z.enum(TASK_STATUSES),
    /** Set by later runs: `verified` when the findings are gone, `flagged` when done but still there. */
    verification: z.enum(['verified', 'flagged']).nullable(),
    verifiedAt: isoDateTime.nullable(),
    /** The newest run's verdict finding by finding; null until a run has checked the task. */
    check: taskCheckSchema.nullable(),
    createdAt: isoDateTime,
    updatedAt: isoDateTime,
  }),
);
export type TaskItem = z.infer<typeof taskItemSchema>;

export const taskEventSchema = named(
  'TaskEvent',
  z.object({
    id: recordId,
    type: z.enum(['comment', 'change']),
    actor: z.object({ id: recordId.nullable(), name: z.string() }),
    body: z.string(),
    changes: z.record(z.string(), z.object({ from: z.unknown(), to: z.unknown() })),
    at: isoDateTime,
  }),
);
export type TaskEventItem = z.infer<typeof taskEventSchema>;

export const taskDetailSchema = named('TaskDetail', taskItemSchema.extend({ events: z.array(taskEventSchema) }));
export type TaskDetail = z.infer<typeof taskDetailSchema>;
export const taskListSchema = listOf('TaskList', taskItemSchema);
/** The tasks made by one bulk request: one per selected row, or one grouped task. */
export const taskBatchSchema = named('TaskBatch', z.object({ items: z.array(taskItemSchema) }));

export const assigneeSchema = named('Assignee', z.object({ id: recordId, name: z.string(), email: z.string(), role: roleSchema }));
export const assigneeListSchema = listOf('AssigneeList', assigneeSchema);
export type Assignee = z.infer<typeof assigneeSchema>;

export const PRUNING_DECISIONS = ['approve', 'reject', 'keep'] as const;
export type PruningDecision = (typeof PRUNING_DECISIONS)[number];
export const PRUNING_RULES = ['orphan', 'unreachable', 'low-score', 'stale', 'thin', 'nominated'] as const;

export const pruningReasonSchema = z.object({ rule: z.enum(PRUNING_RULES), detail: z.string() });
export type PruningReason = z.infer<typeof pruningReasonSchema>;

export const pruningItemSchema = named(
  'PruningItem',
  z.object({
    path: z.string(),
    title: z.string(),
    reasons: z.array(pruningReasonSchema),
    inLatestRun: z.boolean(),
    inboundCount: z.int().nonnegative().nullable(),
    stationaryScore: z.number().nonnegative().nullable(),
    wordCount: z.int().nonnegative().nullable(),
    /** As the page's front matter gives it (usually `YYYY-MM-DD`). */
    reviewedAt: z.string().nullable(),
    firstProposedAt: isoDateTime,
    nominations: z.array(z.object({ by: z.string(), reason: z.string(), at: isoDateTime })),
    decision: z
      .object({
        decision: z.enum(PRUNING_DECISIONS),
        note: z.string(),
        by: z.string(),
        at: isoDateTime,
        flagged: z.boolean(),
        flagReason: z.string().nullable(),
      })
      .nullable(),
  }),
);
export type PruningItem = z.infer<typeof pruningItemSchema>;

export const pruningListSchema = named(
  'PruningList',
  z.object({
    ...pagedShape(pruningItemSchema),
    /** Send it back with decisions: a newer list answers 409 instead of overwriting what others decided. */
    version: z.int().nonnegative(),
    runId: recordId.nullable(),
    rules: z.object({
      lowScorePercentile: z.number(),
      staleDays: z.int(),
      thinWordCount: z.int(),
      protectGlobs: z.array(z.string()),
    }),
  }),
);
export type PruningList = z.infer<typeof pruningListSchema>;

export const pruningDecisionsResultSchema = named(
  'PruningDecisionsResult',
  z.object({ version: z.int().nonnegative(), decided: z.int().nonnegative() }),
);
