import { randomUUID } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import type { BulkCreateTasksInput, CreateTaskInput, SelectedLink, TaskItem, UserDetails } from '@linkloom/shared';
import { AppError } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { DbService } from '../../db/db.service.js';
import { AuditService } from '../audit/audit.service.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { MailService } from '../mail/mail.service.js';
import { type PageFinding, RunFindingsRepository } from './run-findings.repository.js';
import { assertCanCreate } from './task-access.js';
import { TaskAssignees } from './task-assignees.service.js';
import { linkDrafts, pageDrafts, type TaskDraft } from './task-drafts.js';
import { TaskMailer } from './task-mailer.service.js';
import { toTaskItem } from './task-mapping.js';
import { type NewTask, TasksRepository } from './tasks.repository.js';

const nameOf = (actor: AuthUser) => actor.name || actor.email;

/** Creates tasks from the selected findings of the latest run and mails their assignees. */
@Injectable()
export class TaskCreationService {
  constructor(
    private readonly repository: TasksRepository,
    private readonly findings: RunFindingsRepository,
    private readonly assignees: TaskAssignees,
    private readonly docSets: DocSetsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly mailer: TaskMailer,
    private readonly database: DbService,
  ) {}

  async create(actor: AuthUser, input: CreateTaskInput): Promise<TaskItem> {
    const [task] = await this.createMany(actor, { ...input, pagePaths: [input.pagePath], links: [], grouping: 'per-row' });
    return task;
  }

  async createMany(actor: AuthUser, input: BulkCreateTasksInput): Promise<TaskItem[]> {
    assertCanCreate(actor);
    const docSet = await this.docSets.get(input.docSetId);
    const explicit = input.assigneeId ? await this.assignees.require(input.assigneeId) : null;
    const drafts = await this.drafts(input);
    const owners = explicit ? new Map<string, UserDetails>() : await this.assignees.ownersByEmail(drafts.map((d) => d.ownerEmail));
    const rows = drafts.map((draft) =>
      this.row(actor, input, draft, explicit?.id ?? owners.get(draft.ownerEmail?.toLowerCase() ?? '')?.id ?? null),
    );
    const messages = await this.mailer.assignment(
      rows.map((r) => ({ id: r.id!, title: r.title, pagePath: r.pagePath, dueDate: r.dueDate ?? null, assigneeId: r.assigneeId })),
      docSet,
    );
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
      for (const t of inserted) {
        const details = { pagePath: t.pagePath, kind: t.kind, assigneeId: t.assigneeId };
        await this.audit.record(actor, 'task.created', 'task', t.id, details, { docSetId: docSet.id, executor: tx });
      }
      return inserted;
    });
    return Promise.all(created.map(async (t) => toTaskItem((await this.repository.findById(t.id))!)));
  }

  /** The drafts for exactly the selected rows, checked against the latest run. */
  private async drafts(input: BulkCreateTasksInput): Promise<TaskDraft[]> {
    const run = await this.findings.latestFinishedRun(input.docSetId);
    const paths = [...new Set(input.links.length ? input.links.map((l) => l.sourcePath) : input.pagePaths)];
    const pages = run ? await this.findings.pageFindings(run, paths) : new Map<string, PageFinding>();
    if (input.links.length) return linkDrafts(this.knownLinks(input.links, pages), pages, input.grouping, input.title);
    const wantsSources = input.kind === 'add-inbound-links' || input.kind === 'make-reachable';
    const sources = run && wantsSources ? await this.findings.suggestedSources(run, paths) : new Map();
    return pageDrafts(input.kind, paths, pages, sources, input.grouping, input.title);
  }

  /** Each selected link with its status in the latest run; a link the run no longer finds fails the request. */
  private knownLinks(links: SelectedLink[], pages: ReadonlyMap<string, PageFinding>) {
    const unique = [...new Map(links.map((l) => [`${l.sourcePath}\n${l.href}\n${l.line}`, l])).values()];
    const found = unique.map((l) => ({ ...l, match: pages.get(l.sourcePath)?.brokenLinks.find((b) => b.href === l.href) }));
    const missing = found.filter((l) => !l.match);
    if (missing.length) {
      throw new AppError(
        422,
        'FINDING_NOT_IN_LATEST_RUN',
        `${missing.length} selected link(s) are not broken in the latest run (fixed since, or from an older run); reload the findings and select again. Nothing was created.`,
        missing.slice(0, 20).map(({ sourcePath, href, line }) => ({ sourcePath, href, line })),
      );
    }
    return found.map(({ match, ...l }) => ({ ...l, status: match!.status }));
  }

  private row(actor: AuthUser, input: BulkCreateTasksInput, draft: TaskDraft, assigneeId: string | null): NewTask & { id: string } {
    return {
      id: randomUUID(),
      docSetId: input.docSetId,
      pagePath: draft.pagePath,
      kind: input.kind,
      title: draft.title,
      details: [input.details, draft.details].filter(Boolean).join('\n\n'),
      finding: draft.finding,
      assigneeId,
      priority: input.priority ?? 'normal',
      dueDate: input.dueDate ?? null,
      createdBy: actor.id,
    };
  }
}
