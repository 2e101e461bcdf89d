import { Injectable } from '@nestjs/common';
import { and, asc, count, desc, eq, getTableColumns, inArray, lt, ne, or, type SQL, sql } from 'drizzle-orm';
import { alias } from 'drizzle-orm/pg-core';
import { DbService } from '../../db/db.service.js';
import type { Executor } from '../../db/database.js';
import { docSets, taskEvents, tasks, users, type TaskEventRow, type TaskRow } from '../../db/schema/index.js';

export type NewTask = typeof tasks.$inferInsert;
export type NewTaskEvent = typeof taskEvents.$inferInsert;
export type TaskWithNames = TaskRow & { assigneeName: string | null; assigneeEmail: string | null; docSetName: string | null };

export interface TaskFilter {
  assigneeId?: string;
  statuses?: TaskRow['status'][];
  kind?: TaskRow['kind'];
  docSetId?: string;
  overdueOn?: string;
  verification?: 'verified' | 'flagged';
  pagePath?: string;
}

const SORT_COLUMNS = {
  dueDate: tasks.dueDate,
  createdAt: tasks.createdAt,
  priority: tasks.priority,
  pagePath: tasks.pagePath,
  status: tasks.status,
};
const assignee = alias(users, 'assignee');

@Injectable()
export class TasksRepository {
  constructor(private readonly database: DbService) {}

  async insert(rows: NewTask[], executor: Executor): Promise<TaskRow[]> {
    return rows.length ? executor.insert(tasks).values(rows).returning() : [];
  }

  async update(id: string, values: Partial<NewTask>, executor: Executor): Promise<TaskRow | null> {
    const [row] = await executor
      .update(tasks)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(tasks.id, id))
      .returning();
    return row ?? null;
  }

  async addEvents(events: NewTaskEvent[], executor: Executor): Promise<void> {
    if (events.length) await executor.insert(taskEvents).values(events);
  }

  async findById(id: string, executor: Executor = this.database.db): Promise<TaskWithNames | null> {
    const [row] = await this.selectWithNames(executor).where(eq(tasks.id, id)).limit(1);
    return row ?? null;
  }

  async events(taskId: string): Promise<TaskEventRow[]> {
    return this.database.db
      .select()
      .from(taskEvents)
      .where(eq(taskEvents.taskId, taskId))
      .orderBy(asc(taskEvents.at), asc(taskEvents.id))
      .limit(2000);
  }

  async list(
    filter: TaskFilter,
    sort: string | undefined,
    offset: number,
    limit: number,
  ): Promise<{ rows: TaskWithNames[]; total: number }> {
    const where = this.where(filter);
    const key = (sort ?? '-createdAt').replace(/^-/, '') as keyof typeof SORT_COLUMNS;
    const order = sort?.startsWith('-') || !sort ? desc(SORT_COLUMNS[key]) : asc(SORT_COLUMNS[key]);
    const rows = await this.selectWithNames(this.database.db).where(where).orderBy(order, asc(tasks.id)).offset(offset).limit(limit);
    const [{ value }] = await this.database.db.select({ value: count() }).from(tasks).where(where);
    return { rows, total: value };
  }

  /** Status changes that runs made, oldest first, with the task's title, page and assignee. */
  async statusChangesByRuns(runIds: string[]) {
    if (runIds.length === 0) return [];
    return this.database.db
      .select({
        taskId: taskEvents.taskId,
        runId: sql<string>`${taskEvents.runId}`,
        to: sql<unknown>`${taskEvents.changes} -> 'status' ->> 'to'`,
        title: tasks.title,
        pagePath: tasks.pagePath,
        assigneeName: assignee.name,
      })
      .from(taskEvents)
      .innerJoin(tasks, eq(tasks.id, taskEvents.taskId))
      .leftJoin(assignee, eq(assignee.id, tasks.assigneeId))
      .where(and(inArray(taskEvents.runId, runIds), sql`(${taskEvents.changes} -> 'status') is not null`))
      .orderBy(asc(taskEvents.at), asc(taskEvents.id));
  }

  /** Tasks a run can verify: every one not closed as won't fix, in one doc set. */
  async verifiable(docSetId: string, kinds: TaskRow['kind'][]): Promise<TaskRow[]> {
    return this.database.db
      .select()
      .from(tasks)
      .where(and(eq(tasks.docSetId, docSetId), ne(tasks.status, 'wont-fix'), inArray(tasks.kind, kinds)));
  }

  private selectWithNames(executor: Executor) {
    return executor
      .select({ ...getTableColumns(tasks), assigneeName: assignee.name, assigneeEmail: assignee.email, docSetName: docSets.name })
      .from(tasks)
      .leftJoin(assignee, eq(assignee.id, tasks.assigneeId))
      .leftJoin(docSets, eq(docSets.id, tasks.docSetId));
  }

  /** A task is about a page when it is its page, or a grouped task lists the page or a link on it. */
  private aboutPage(path: string): SQL {
    const listed = JSON.stringify({ pages: [{ path }] });
    const linkedFrom = JSON.stringify({ brokenLinks: [{ sourcePath: path }] });
    return or(eq(tasks.pagePath, path), sql`${tasks.finding} @> ${listed}::jsonb`, sql`${tasks.finding} @> ${linkedFrom}::jsonb`)!;
  }

  private where(filter: TaskFilter): SQL | undefined {
    const conditions: (SQL | undefined)[] = [
      filter.assigneeId ? eq(tasks.assigneeId, filter.assigneeId) : undefined,
      filter.statuses?.length ? inArray(tasks.status, filter.statuses) : undefined,
      filter.kind ? eq(tasks.kind, filter.kind) : undefined,
      filter.docSetId ? eq(tasks.docSetId, filter.docSetId) : undefined,
      filter.verification ? eq(tasks.verification, filter.verification) : undefined,
      filter.pagePath ? this.aboutPage(filter.pagePath) : undefined,
      filter.overdueOn ? and(lt(tasks.dueDate, filter.overdueOn), inArray(tasks.status, ['open', 'in-progress'])) : undefined,
    ];
    const present = conditions.filter((c): c is SQL => c !== undefined);
    return present.length ? and(...present) : sql`true`;
  }
}
