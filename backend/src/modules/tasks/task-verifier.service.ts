import { Injectable, type OnModuleInit } from '@nestjs/common';
import { DomainEvents } from '../../common/events/domain-events.js';
import { DbService } from '../../db/db.service.js';
import { AuditService } from '../audit/audit.service.js';
import { RunFindingsRepository } from './run-findings.repository.js';
import { findingPresent, verificationStep } from './task-verification.js';
import { TasksRepository } from './tasks.repository.js';

const VERIFIABLE = ['add-inbound-links', 'repair-broken-links', 'add-outbound-links', 'make-reachable'] as const;
const RUN_ACTOR = 'Linkloom (run)';

/** After every finished run: marks tasks verified, reopened or flagged by whether the run still shows their finding. */
@Injectable()
export class TaskVerifierService implements OnModuleInit {
  constructor(
    private readonly events: DomainEvents,
    private readonly repository: TasksRepository,
    private readonly findings: RunFindingsRepository,
    private readonly audit: AuditService,
    private readonly database: DbService,
  ) {}

  onModuleInit(): void {
    this.events.on('run.finished', ({ docSetId, runId }) => this.verifyRun(docSetId, runId).then(() => undefined));
  }

  /** Returns how many tasks changed. */
  async verifyRun(docSetId: string, runId: string): Promise<number> {
    const run = await this.findings.runById(runId);
    if (!run) return 0;
    const tasks = await this.repository.verifiable(docSetId, [...VERIFIABLE]);
    if (tasks.length === 0) return 0;
    const pages = await this.findings.pageFindings(run, [...new Set(tasks.map((t) => t.pagePath))]);
    const steps = tasks
      .map((task) => ({ task, step: verificationStep(task, findingPresent(task.kind, pages.get(task.pagePath))) }))
      .filter((s) => s.step !== null);
    if (steps.length === 0) return 0;
    await this.database.db.transaction(async (tx) => {
      for (const { task, step } of steps) {
        const { status, verification, note } = step!;
        await this.repository.update(task.id, { status, verification, verifiedRunId: runId, verifiedAt: new Date() }, tx);
        const changes = Object.fromEntries(
          [
            ['status', task.status, status],
            ['verification', task.verification, verification],
          ]
            .filter(([, from, to]) => from !== to)
            .map(([k, from, to]) => [k, { from, to }]),
        );
        await this.repository.addEvents(
          [{ taskId: task.id, type: 'change', actorId: null, actorName: RUN_ACTOR, body: note, changes }],
          tx,
        );
        await this.audit.record(null, `task.${verification ?? 'reopened'}`, 'task', task.id, { runId, note }, { docSetId, executor: tx });
      }
    });
    return steps.length;
  }
}
