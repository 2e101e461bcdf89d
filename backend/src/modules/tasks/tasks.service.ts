import { Injectable } from '@nestjs/common';
import type { ListResult, ListTasksQuery, TaskDetail, TaskEventItem, TaskItem, UpdateTaskInput } from '@linkloom/shared';
import { notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { DbService } from '../../db/db.service.js';
import { AuditService } from '../audit/audit.service.js';
import { MailService } from '../mail/mail.service.js';
import { assertCanComment, assertCanUpdate } from './task-access.js';
import { TaskAssignees } from './task-assignees.service.js';
import { TaskMailer } from './task-mailer.service.js';
import { toTaskEventItem, toTaskItem, today } from './task-mapping.js';
import { TasksRepository } from './tasks.repository.js';

const nameOf = (actor: AuthUser) => actor.name || actor.email;

/** What runs did to a doc set's tasks, for the digest. */
export interface TaskRunOutcome {
  title: string;
  pagePath: string;
  assigneeName: string | null;
  runNumber: number | null;
}

@Injectable()
export class TasksService {
  constructor(
    private readonly repository: TasksRepository,
    private readonly assignees: TaskAssignees,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly mailer: TaskMailer,
    private readonly database: DbService,
  ) {}

  /** Writers see only their own tasks (docs/mail-and-work.md, "What a viewer sees"); everyone else may filter freely. */
  async list(actor: AuthUser, query: ListTasksQuery): Promise<ListResult<TaskItem>> {
    const assigneeId = actor.role === 'writer' || query.assignee === 'me' ? actor.id : query.assignee;
    const filter = {
      assigneeId,
      statuses: query.status,
      kind: query.kind,
      docSetId: query.docSetId,
      verification: query.verification,
      pagePath: query.pagePath,
      overdueOn: query.overdue ? today() : undefined,
    };
    const { rows, total } = await this.repository.list(filter, query.sort, (query.page - 1) * query.pageSize, query.pageSize);
    return { items: rows.map((r) => toTaskItem(r)), total, page: query.page, pageSize: query.pageSize };
  }

  async get(actor: AuthUser, id: string): Promise<TaskDetail> {
    const row = await this.repository.findById(id);
    // Another writer's task answers like a missing one, so ids cannot be probed.
    if (!row || (actor.role === 'writer' && row.assigneeId !== actor.id)) throw notFound('The task');
    const events = await this.repository.events(id);
    return { ...toTaskItem(row), events: events.map(toTaskEventItem) };
  }

  async update(actor: AuthUser, id: string, patch: UpdateTaskInput): Promise<TaskItem> {
    const current = await this.repository.findById(id);
    if (!current || (actor.role === 'writer' && current.assigneeId !== actor.id)) throw notFound('The task');
    assertCanUpdate(actor, current, Object.keys(patch));
    if (patch.assigneeId) await this.assignees.require(patch.assigneeId);
    const changes = Object.fromEntries(
      Object.entries(patch)
        .filter(([k, v]) => (current as Record<string, unknown>)[k] !== v)
        .map(([k, v]) => [k, { from: (current as Record<string, unknown>)[k], to: v }]),
    );
    if (Object.keys(changes).length === 0) return toTaskItem(current);
    // A writer reopening or re-closing work clears the run's earlier verdict, which no longer describes it.
    const verification = 'status' in changes ? { verification: null, verifiedAt: null, verifiedRunId: null } : {};
    const reassigned = 'assigneeId' in changes && patch.assigneeId ? { ...current, ...patch } : null;
    const messages = reassigned ? await this.mailer.assignment([reassigned], { id: current.docSetId, name: current.docSetName ?? '' }) : [];
    await this.database.db.transaction(async (tx) => {
      await this.repository.update(id, { ...patch, ...verification }, tx);
      await this.repository.addEvents([{ taskId: id, type: 'change', actorId: actor.id, actorName: nameOf(actor), changes }], tx);
      await this.audit.record(actor, 'task.updated', 'task', id, { changes }, { docSetId: current.docSetId, executor: tx });
      await this.mail.enqueue(messages, tx);
    });
    return toTaskItem((await this.repository.findById(id))!);
  }

  async comment(actor: AuthUser, id: string, body: string): Promise<TaskEventItem> {
    const task = await this.repository.findById(id);
    if (!task || (actor.role === 'writer' && task.assigneeId !== actor.id)) throw notFound('The task');
    assertCanComment(actor, task);
    await this.database.db.transaction(async (tx) => {
      await this.repository.addEvents([{ taskId: id, type: 'comment', actorId: actor.id, actorName: nameOf(actor), body }], tx);
      await this.audit.record(actor, 'task.commented', 'task', id, { length: body.length }, { docSetId: task.docSetId, executor: tx });
    });
    const events = await this.repository.events(id);
    return toTaskEventItem(events.filter((e) => e.type === 'comment').at(-1)!);
  }

  assigneeOptions() {
    return this.assignees.list();
  }

  /**
   * Tasks the given runs verified or reopened: each task counted once, by the last thing those runs did to
   * it (a task verified by one run and reopened by the next is reopened).
   */
  async runOutcomes(runs: { id: string; number: number | null }[]): Promise<{ verified: TaskRunOutcome[]; reopened: TaskRunOutcome[] }> {
    const numbers = new Map(runs.map((r) => [r.id, r.number]));
    const last = new Map<string, { to: unknown; outcome: TaskRunOutcome }>();
    for (const e of await this.repository.statusChangesByRuns([...numbers.keys()])) {
      last.set(e.taskId, {
        to: e.to,
        outcome: { title: e.title, pagePath: e.pagePath, assigneeName: e.assigneeName, runNumber: numbers.get(e.runId) ?? null },
      });
    }
    const all = [...last.values()];
    return {
      verified: all.filter((e) => e.to === 'verified').map((e) => e.outcome),
      reopened: all.filter((e) => e.to === 'open').map((e) => e.outcome),
    };
  }
}
