import { randomUUID } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import type { ListResult } from '@linkloom/shared';
import { AppError, notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { DbService } from '../../db/db.service.js';
import type { UserRow } from '../../db/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { MailService } from '../mail/mail.service.js';
import { UsersRepository } from '../users/users.repository.js';
import { RunFindingsRepository } from './run-findings.repository.js';
import { assertCanComment, assertCanCreate, assertCanUpdate, canBeAssignee } from './task-access.js';
import { type AssignedTask, assignmentMail } from './task-mail.js';
import { type TaskEventItem, type TaskItem, toTaskEventItem, toTaskItem, today } from './task-mapping.js';
import { defaultTitle, prefillDetails, prefillFinding } from './task-prefill.js';
import type { BulkCreateTasksInput, CreateTaskInput, ListTasksQuery, UpdateTaskInput } from './task.schemas.js';
import { type NewTask, TasksRepository } from './tasks.repository.js';

const nameOf = (actor: AuthUser) => actor.name || actor.email;

@Injectable()
export class TasksService {
  constructor(
    private readonly repository: TasksRepository,
    private readonly findings: RunFindingsRepository,
    private readonly users: UsersRepository,
    private readonly docSets: DocSetsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly database: DbService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Writers see only their own tasks (RELIABILITY check 60); everyone else may filter freely. */
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

  async get(actor: AuthUser, id: string): Promise<TaskItem & { events: TaskEventItem[] }> {
    const row = await this.repository.findById(id);
    // Another writer's task answers like a missing one, so ids cannot be probed (RELIABILITY check 58).
    if (!row || (actor.role === 'writer' && row.assigneeId !== actor.id)) throw notFound('The task');
    const events = await this.repository.events(id);
    return { ...toTaskItem(row), events: events.map(toTaskEventItem) };
  }

  async create(actor: AuthUser, input: CreateTaskInput): Promise<TaskItem> {
    const [task] = await this.createMany(actor, { ...input, pagePaths: [input.pagePath] }, input.title);
    return task;
  }

  async bulkCreate(actor: AuthUser, input: BulkCreateTasksInput): Promise<{ items: TaskItem[] }> {
    return { items: await this.createMany(actor, input, input.title) };
  }

  private async createMany(actor: AuthUser, input: Omit<BulkCreateTasksInput, 'title'>, title: string | undefined): Promise<TaskItem[]> {
    assertCanCreate(actor);
    const docSet = await this.docSets.get(input.docSetId);
    const paths = [...new Set(input.pagePaths)];
    const explicit = input.assigneeId ? await this.assignee(input.assigneeId) : null;
    const run = await this.findings.latestFinishedRun(docSet.id);
    const pages = run ? await this.findings.pageFindings(run, paths) : new Map();
    const sources =
      run && (input.kind === 'add-inbound-links' || input.kind === 'make-reachable')
        ? await this.findings.suggestedSources(run, paths)
        : new Map();
    const owners = explicit ? new Map<string, UserRow>() : await this.ownersByEmail(paths.map((p) => pages.get(p)?.ownerEmail));
    const rows: NewTask[] = paths.map((path) => {
      const page = pages.get(path);
      const finding = prefillFinding(input.kind, page, sources.get(path));
      const owner = page?.ownerEmail ? owners.get(page.ownerEmail.toLowerCase()) : undefined;
      const details = [input.details, prefillDetails(input.kind, finding)].filter(Boolean).join('\n\n');
      return {
        id: randomUUID(),
        docSetId: docSet.id,
        pagePath: path,
        kind: input.kind,
        title: paths.length === 1 && title ? title : defaultTitle(input.kind, path, page),
        details,
        finding,
        assigneeId: explicit?.id ?? owner?.id ?? null,
        priority: input.priority ?? 'normal',
        dueDate: input.dueDate ?? null,
        createdBy: actor.id,
      };
    });
    const messages = await this.assignmentMessages(rows as (NewTask & { id: string })[], docSet);
    const created = await this.database.db.transaction(async (tx) => {
      const inserted = await this.repository.insert(rows, tx);
      await this.mail.enqueue(messages, tx);
      await this.repository.addEvents(
        inserted.map((t) => ({
          taskId: t.id,
          type: 'change' as const,
          actorId: actor.id,
          actorName: nameOf(actor),
          body: 'Created the task.',
          changes: { status: { from: null, to: 'open' }, assigneeId: { from: null, to: t.assigneeId } },
        })),
        tx,
      );
      for (const t of inserted)
        await this.audit.record(
          actor,
          'task.created',
          'task',
          t.id,
          { pagePath: t.pagePath, kind: t.kind, assigneeId: t.assigneeId },
          { docSetId: docSet.id, executor: tx },
        );
      return inserted;
    });
    return Promise.all(created.map(async (t) => toTaskItem((await this.repository.findById(t.id))!)));
  }

  async update(actor: AuthUser, id: string, patch: UpdateTaskInput): Promise<TaskItem> {
    const current = await this.repository.findById(id);
    if (!current || (actor.role === 'writer' && current.assigneeId !== actor.id)) throw notFound('The task');
    assertCanUpdate(actor, current, Object.keys(patch));
    if (patch.assigneeId) await this.assignee(patch.assigneeId);
    const changes = Object.fromEntries(
      Object.entries(patch)
        .filter(([k, v]) => (current as Record<string, unknown>)[k] !== v)
        .map(([k, v]) => [k, { from: (current as Record<string, unknown>)[k], to: v }]),
    );
    if (Object.keys(changes).length === 0) return toTaskItem(current);
    // A writer reopening or re-closing work clears the run's earlier verdict, which no longer describes it.
    const verification = 'status' in changes ? { verification: null, verifiedAt: null, verifiedRunId: null } : {};
    const reassigned = 'assigneeId' in changes && patch.assigneeId ? { ...current, ...patch } : null;
    const messages = reassigned
      ? await this.assignmentMessages([reassigned], { id: current.docSetId, name: current.docSetName ?? '' })
      : [];
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

  /** People who can be given a task (writers, editors, admins that can sign in). */
  async assignees(): Promise<{ id: string; name: string; email: string; role: string }[]> {
    const { rows } = await this.users.list(0, 500);
    return rows.filter((u) => !u.disabled && canBeAssignee(u.role)).map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role }));
  }

  private async assignee(id: string): Promise<UserRow> {
    const user = await this.users.findById(id);
    if (!user || user.disabled) throw new AppError(422, 'ASSIGNEE_NOT_FOUND', 'The assignee does not exist or cannot sign in.');
    if (!canBeAssignee(user.role))
      throw new AppError(422, 'ASSIGNEE_ROLE', `${user.name} is a viewer; tasks go to writers, editors or admins.`);
    return user;
  }

  /** Front-matter owners that name a user who can take the work. */
  private async ownersByEmail(emails: (string | null | undefined)[]): Promise<Map<string, UserRow>> {
    const result = new Map<string, UserRow>();
    for (const email of new Set(emails.filter((e): e is string => !!e).map((e) => e.toLowerCase()))) {
      const user = await this.users.findByEmail(email);
      if (user && !user.disabled && canBeAssignee(user.role)) result.set(email, user);
    }
    return result;
  }

  /**
   * One message per assignee, built before the transaction (only `tx` may be used inside it) and enqueued in
   * it, so the mail exists exactly when the assignment does.
   */
  private async assignmentMessages(
    tasks: { id: string; title: string; pagePath: string; dueDate?: string | null; assigneeId?: string | null }[],
    docSet: { id: string; name: string },
  ) {
    const byAssignee = new Map<string, AssignedTask[]>();
    for (const t of tasks)
      if (t.assigneeId) byAssignee.set(t.assigneeId, [...(byAssignee.get(t.assigneeId) ?? []), { ...t, dueDate: t.dueDate ?? null }]);
    if (byAssignee.size === 0) return [];
    const people = await this.users.findByIds([...byAssignee.keys()]);
    return people.map((p) => assignmentMail({ email: p.email, name: p.name }, byAssignee.get(p.id)!, docSet, this.config.publicUrl));
  }
}
