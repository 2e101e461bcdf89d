// The tasks API's request shapes (zod), checked by ZodPipe; the answers' shapes are in shared/src/schemas/work.ts.
import { listQuerySchema } from '@linkloom/shared';
import { z } from 'zod';
import { TASK_KINDS, TASK_STATUSES } from '../../db/schema/work.js';

const pagePath = z.string().trim().min(1).max(1024);
const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'use YYYY-MM-DD')
  .refine((d) => !Number.isNaN(Date.parse(d)), 'not a real date');
export const taskKindSchema = z.enum(TASK_KINDS);
export const taskStatusSchema = z.enum(TASK_STATUSES);
export const prioritySchema = z.enum(['low', 'normal', 'high']);

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

export const bulkCreateTasksSchema = z
  .object({
    docSetId: z.string().uuid(),
    kind: taskKindSchema,
    pagePaths: z.array(pagePath).min(1).max(500),
    title: z.string().trim().min(1).max(300).optional(),
    details: z.string().max(20_000).optional(),
    assigneeId: z.string().uuid().nullish(),
    priority: prioritySchema.optional(),
    dueDate: isoDate.nullish(),
  })
  .strict();

export const updateTaskSchema = z
  .object({
    title: z.string().trim().min(1).max(300).optional(),
    details: z.string().max(20_000).optional(),
    assigneeId: z.string().uuid().nullable().optional(),
    priority: prioritySchema.optional(),
    dueDate: isoDate.nullable().optional(),
    status: taskStatusSchema.optional(),
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
export type UpdateTaskInput = z.infer<typeof updateTaskSchema>;
export type ListTasksQuery = z.infer<typeof listTasksQuerySchema>;
