// The tasks API's request shapes (zod): the server validates with them, the front end's forms send them; the
// answers' shapes are in work.ts.
import { z } from 'zod';
import { listQuerySchema } from './common.js';
import { TASK_KINDS, TASK_PRIORITIES, TASK_STATUSES, TASK_STATUSES_SET_BY_PEOPLE } from './work.js';

const pagePath = z.string().trim().min(1).max(1024);
const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'use YYYY-MM-DD')
  .refine((d) => !Number.isNaN(Date.parse(d)), 'not a real date');
export const taskKindSchema = z.enum(TASK_KINDS);
export const taskStatusSchema = z.enum(TASK_STATUSES);
export const prioritySchema = z.enum(TASK_PRIORITIES);
const statusSetByPeople = z.enum(TASK_STATUSES_SET_BY_PEOPLE, {
  error: () => `use one of ${TASK_STATUSES_SET_BY_PEOPLE.join(', ')}; "verified" is set by a run that no longer finds the findings`,
});

/** How selected findings become tasks: one task per selected row, or one task holding them all. */
export const TASK_GROUPINGS = ['per-row', 'grouped'] as const;

/** A selected link finding: the page it is on and the link as written there. */
export const selectedLinkSchema = z
  .object({ sourcePath: pagePath, href: z.string().min(1).max(4096), line: z.number().int().min(0) })
  .strict();

export const createTaskSchema = z
  .object({
    docSetId: z.string().uuid(),
    pagePath,
    kind: taskKindSchema,
    title: z.string().trim().min(1).max(300),
    details: z.string().max(20_000).optional(),
    assigneeId: z.string().uuid().nullish(),
    priority: prioritySchema.optional(),
    dueDate: isoDate.nullish(),
  })
  .strict();

/**
 * Tasks from the rows an editor selected: pages (`pagePaths`) or links (`links`), never both. The tasks hold
 * exactly those findings; `grouping` makes one task per row or a single task listing them all.
 */
export const bulkCreateTasksSchema = z
  .object({
    docSetId: z.string().uuid(),
    kind: taskKindSchema,
    pagePaths: z.array(pagePath).max(500).default([]),
    links: z.array(selectedLinkSchema).max(2000).default([]),
    grouping: z.enum(TASK_GROUPINGS).default('per-row'),
    title: z.string().trim().min(1).max(300).optional(),
    details: z.string().max(20_000).optional(),
    assigneeId: z.string().uuid().nullish(),
    priority: prioritySchema.optional(),
    dueDate: isoDate.nullish(),
  })
  .strict()
  .refine((v) => v.pagePaths.length > 0 !== v.links.length > 0, {
    message: 'select either pages (pagePaths) or links (links), at least one',
    path: ['pagePaths'],
  });

export const updateTaskSchema = z
  .object({
    title: z.string().trim().min(1).max(300).optional(),
    details: z.string().max(20_000).optional(),
    assigneeId: z.string().uuid().nullable().optional(),
    priority: prioritySchema.optional(),
    dueDate: isoDate.nullable().optional(),
    status: statusSetByPeople.optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'nothing to change');

export const commentSchema = z.object({ body: z.string().trim().min(1).max(10_000) }).strict();

const flag = z.enum(['true', 'false']).transform((v) => v === 'true');
export const TASK_SORTS = [
  'dueDate',
  '-dueDate',
  'createdAt',
  '-createdAt',
  'priority',
  '-priority',
  'pagePath',
  '-pagePath',
  'status',
  '-status',
] as const;

export const listTasksQuerySchema = listQuerySchema
  .extend({
    assignee: z.union([z.literal('me'), z.string().uuid()]).optional(),
    status: z
      .string()
      .max(100)
      .optional()
      .transform((v, ctx) => {
        const items = v ? v.split(',').filter(Boolean) : [];
        const bad = items.filter((s) => !(TASK_STATUSES as readonly string[]).includes(s));
        if (bad.length) ctx.addIssue({ code: 'custom', message: `unknown status ${bad.join(', ')}; use ${TASK_STATUSES.join(', ')}` });
        return items as (typeof TASK_STATUSES)[number][];
      }),
    kind: taskKindSchema.optional(),
    docSetId: z.string().uuid().optional(),
    overdue: flag.optional(),
    verification: z.enum(['verified', 'flagged']).optional(),
    pagePath: pagePath.optional(),
    sort: z.enum(TASK_SORTS).optional(),
  })
  .strict();

export type CreateTaskInput = z.infer<typeof createTaskSchema>;
export type BulkCreateTasksInput = z.infer<typeof bulkCreateTasksSchema>;
export type BulkCreateTasksRequest = z.input<typeof bulkCreateTasksSchema>;
export type SelectedLink = z.infer<typeof selectedLinkSchema>;
export type TaskGrouping = (typeof TASK_GROUPINGS)[number];
export type UpdateTaskInput = z.infer<typeof updateTaskSchema>;
export type ListTasksQuery = z.infer<typeof listTasksQuerySchema>;
