import { Inject, Injectable, type OnModuleInit } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { DomainEvents } from '../../common/events/domain-events.js';
import { DbService } from '../../db/db.service.js';
import type { PruningReason } from '../../db/schema/work.js';
import { AuditService } from '../audit/audit.service.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { MailService } from '../mail/mail.service.js';
import { RunFindingsRepository, type PageFinding } from '../tasks/run-findings.repository.js';
import { MailComposer } from '../notifications/mail-composer.service.js';
import { NotificationSettingsService } from '../notifications/notification-settings.service.js';
import { pruningWaitingContent } from './pruning-mail.js';
import { proposeCandidates } from './pruning-rules.js';
import { type NewCandidate, PruningRepository } from './pruning.repository.js';

/**
 * After every finished run: rebuilds the doc set's pruning list (rule matches + nominated + decided pages),
 * flags approved pages that gained inbound links, and mails the people who decide when new undecided
 * candidates appear (those who have not switched that mail off).
 */
@Injectable()
export class PruningRefreshService implements OnModuleInit {
  constructor(
    private readonly events: DomainEvents,
    private readonly repository: PruningRepository,
    private readonly findings: RunFindingsRepository,
    private readonly docSets: DocSetsService,
    private readonly settings: NotificationSettingsService,
    private readonly composer: MailComposer,
    private readonly audit: AuditService,
    private readonly mail: MailService,
    private readonly database: DbService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  onModuleInit(): void {
    this.events.on('run.finished', ({ docSetId, runId }) => this.refresh(docSetId, runId).then(() => undefined));
  }

  /** Returns the paths newly proposed by this run (no earlier row and no decision). */
  async refresh(docSetId: string, runId: string, now = new Date()): Promise<string[]> {
    const run = await this.findings.runById(runId);
    if (!run) return [];
    const docSet = await this.docSets.get(docSetId);
    const pages = await this.findings.pageFindings(run);
    const proposed = new Map(proposeCandidates([...pages.values()], docSet.settings.pruning, now).map((c) => [c.page.path, c.reasons]));
    const decisions = await this.repository.decisions(docSetId);
    const nominations = await this.repository.nominations(docSetId);
    const previous = new Set((await this.repository.candidates(docSetId)).map((c) => c.path));
    const paths = new Set([...proposed.keys(), ...decisions.map((d) => d.path), ...nominations.map((n) => n.path)]);
    const rows = [...paths].map((path) =>
      candidateRow(
        docSetId,
        runId,
        path,
        pages.get(path),
        proposed.get(path) ?? [],
        nominations.filter((n) => n.path === path),
      ),
    );
    const decided = new Set(decisions.map((d) => d.path));
    const fresh = [...proposed.keys()].filter((p) => !previous.has(p) && !decided.has(p));
    const regained = decisions.filter(
      (d) => d.decision === 'approve' && !d.flaggedAt && (pages.get(d.path)?.inboundCount ?? 0) > (d.inboundAtDecision ?? 0),
    );
    const deciders = fresh.length ? await this.settings.recipients('pruning-waiting', { docSetId }) : [];
    const messages = deciders.map((d) =>
      this.composer.compose(d, 'pruning-waiting', pruningWaitingContent(d.name, docSet, fresh, this.config.publicUrl), { docSetId }),
    );
    await this.database.db.transaction(async (tx) => {
      await this.repository.replaceCandidates(docSetId, rows, tx);
      await this.repository.advanceVersion(docSetId, null, tx, runId);
      for (const d of regained) {
        const reason = `The run of ${now.toISOString().slice(0, 10)} found ${pages.get(d.path)!.inboundCount} inbound link(s); there were ${d.inboundAtDecision ?? 0} when it was approved.`;
        await this.repository.flagDecision(docSetId, d.path, reason, tx);
        await this.audit.record(
          null,
          'pruning.flagged',
          'pruning-page',
          `${docSetId}:${d.path}`,
          { path: d.path, runId, reason },
          { docSetId, executor: tx },
        );
      }
      await this.mail.enqueue(messages, tx);
    });
    return fresh;
  }
}

function candidateRow(
  docSetId: string,
  runId: string,
  path: string,
  page: PageFinding | undefined,
  reasons: PruningReason[],
  nominations: { nominatedByName: string; reason: string }[],
): NewCandidate {
  const nominated: PruningReason[] = nominations.map((n) => ({
    rule: 'nominated',
    detail: `Nominated by ${n.nominatedByName}: ${n.reason}`,
  }));
  return {
    docSetId,
    path,
    runId,
    title: page?.title ?? path,
    reasons: [...reasons, ...nominated],
    inboundCount: page?.inboundCount ?? null,
    stationaryScore: page?.stationaryScore ?? null,
    wordCount: page?.wordCount ?? null,
    reviewedAt: page?.reviewedAt ?? null,
    inLatestRun: !!page,
  };
}
