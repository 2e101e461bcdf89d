import { Injectable, type OnModuleInit } from '@nestjs/common';
import type { TaskCheck } from '@linkloom/shared';
import { DomainEvents } from '../../common/events/domain-events.js';
import { DbService } from '../../db/db.service.js';
import type { TaskRow } from '../../db/schema/index.js';
import { AuditService } from '../audit/audit.service.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { MailService } from '../mail/mail.service.js';
import { type RunRef, RunFindingsRepository } from './run-findings.repository.js';
import { TaskMailer } from './task-mailer.service.js';
import { checkItems, checkOutcome, verificationStep, type VerificationChange } from './task-verification.js';
import { TasksRepository } from './tasks.repository.js';

const VERIFIABLE = ['add-inbound-links', 'repair-broken-links', 'add-outbound-links', 'make-reachable'] as const;
const RUN_ACTOR = 'Linkloom (run)';

interface Verdict {
  task: TaskRow;
  check: TaskCheck;
  step: VerificationChange | null;
}

const sameItems = (a: TaskCheck | null, b: TaskCheck) => JSON.stringify(a?.items ?? null) === JSON.stringify(b.items);

/**
 * After every finished run: checks each open or closed task finding by finding, records which are still
 * found, moves tasks to "verified" (fixed and verified by run N) or back to open, flags work marked done that
 * the run still finds, and mails the assignee of each reopened task.
 */
@Injectable()
export class TaskVerifierService implements OnModuleInit {
  constructor(
    private readonly events: DomainEvents,
    private readonly repository: TasksRepository,
    private readonly findings: RunFindingsRepository,
    private readonly docSets: DocSetsService,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly mailer: TaskMailer,
    private readonly database: DbService,
  ) {}

  onModuleInit(): void {
    this.events.on('run.finished', ({ docSetId, runId }) => this.verifyRun(docSetId, runId).then(() => undefined));
  }

  /** Returns how many tasks changed status or verification. */
  async verifyRun(docSetId: string, runId: string): Promise<number> {
    const run = await this.findings.runById(runId);
    if (!run) return 0;
    const verdicts = (await this.verdicts(docSetId, run)).filter((v) => v.step || !sameItems(v.task.lastCheck, v.check));
    if (verdicts.length === 0) return 0;
    const reopened = verdicts.filter((v) => v.step?.outcome === 'reopened');
    const docSet = await this.docSets.get(docSetId);
    const messages = await this.mailer.reopened(
      reopened.map(({ task, check }) => ({ ...task, runNumber: check.runNumber, items: check.items })),
      docSet,
    );
    await this.database.db.transaction(async (tx) => {
      for (const verdict of verdicts) await this.apply(verdict, docSetId, tx);
      await this.mail.enqueue(messages, tx);
    });
    return verdicts.filter((v) => v.step).length;
  }

  private async verdicts(docSetId: string, run: RunRef): Promise<Verdict[]> {
    const tasks = await this.repository.verifiable(docSetId, [...VERIFIABLE]);
    const paths = tasks.flatMap((t) => [
      t.pagePath,
      ...(t.finding.pages ?? []).map((p) => p.path),
      ...(t.finding.brokenLinks ?? []).flatMap((l) => l.sourcePath ?? []),
    ]);
    const pages = await this.findings.pageFindings(run, [...new Set(paths)]);
    const at = new Date().toISOString();
    return tasks.flatMap((task) => {
      const items = checkItems(task, pages);
      if (!items) return [];
      const step = verificationStep(task, items, run.number ?? null);
      return [{ task, step, check: { runId: run.id, runNumber: run.number ?? null, at, outcome: checkOutcome(items, step), items } }];
    });
  }

  private async apply({ task, check, step }: Verdict, docSetId: string, tx: Parameters<TasksRepository['update']>[2]): Promise<void> {
    if (!step) {
      await this.repository.update(task.id, { lastCheck: check }, tx);
      return;
    }
    const { status, verification, note } = step;
    await this.repository.update(
      task.id,
      { status, verification, verifiedRunId: check.runId, verifiedAt: new Date(check.at), lastCheck: check },
      tx,
    );
    const changes = Object.fromEntries(
      [
        ['status', task.status, status],
        ['verification', task.verification, verification],
      ]
        .filter(([, from, to]) => from !== to)
        .map(([k, from, to]) => [k, { from, to }]),
    );
    await this.repository.addEvents(
      [{ taskId: task.id, type: 'change', actorId: null, actorName: RUN_ACTOR, body: note, changes, runId: check.runId }],
      tx,
    );
    await this.audit.record(null, `task.${step.outcome}`, 'task', task.id, { runId: check.runId, note }, { docSetId, executor: tx });
  }
}
