import { Injectable } from '@nestjs/common';
import { AppError, conflict } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { DbService } from '../../db/db.service.js';
import { AuditService } from '../audit/audit.service.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { RunFindingsRepository } from '../tasks/run-findings.repository.js';
import { contentDisposition, exportFileName, toCsv } from './pruning-export.js';
import { type PruningItem, toPruningItem } from './pruning-mapping.js';
import { PruningRepository } from './pruning.repository.js';
import type { DecisionsInput, NominationInput, PruningListQuery } from './pruning.schemas.js';

export interface ExportFile {
  body: string;
  contentType: string;
  disposition: string;
}

const nameOf = (actor: AuthUser) => actor.name || actor.email;

/** The pruning list: candidates with reasons, nominations and editors' decisions. Linkloom never deletes pages. */
@Injectable()
export class PruningService {
  constructor(
    private readonly repository: PruningRepository,
    private readonly findings: RunFindingsRepository,
    private readonly docSets: DocSetsService,
    private readonly audit: AuditService,
    private readonly database: DbService,
  ) {}

  async get(docSetId: string, query: PruningListQuery) {
    const docSet = await this.docSets.get(docSetId);
    const { version, runId } = await this.repository.list(docSetId);
    const { rows, total } = await this.repository.page(docSetId, query.status, (query.page - 1) * query.pageSize, query.pageSize);
    const nominations = await this.repository.nominations(
      docSetId,
      rows.map((r) => r.path),
    );
    const items: PruningItem[] = rows.map((r) =>
      toPruningItem(
        r,
        nominations.filter((n) => n.path === r.path),
      ),
    );
    return { items, total, page: query.page, pageSize: query.pageSize, version, runId, rules: docSet.settings.pruning };
  }

  async nominate(actor: AuthUser, docSetId: string, input: NominationInput): Promise<PruningItem> {
    await this.docSets.get(docSetId);
    const run = await this.findings.latestFinishedRun(docSetId);
    const page = run ? (await this.findings.pageFindings(run, [input.path])).get(input.path) : undefined;
    if (!page) throw new AppError(422, 'PAGE_NOT_IN_RUN', `The latest run has no page ${input.path}; check the path.`);
    const [existing] = await this.repository.candidates(docSetId, [input.path]);
    const reasons = [
      ...(existing?.reasons ?? []).filter((r) => r.rule !== 'nominated'),
      { rule: 'nominated' as const, detail: `Nominated by ${nameOf(actor)}: ${input.reason}` },
    ];
    await this.database.db.transaction(async (tx) => {
      await this.repository.insertNomination(
        { docSetId, path: input.path, reason: input.reason, nominatedBy: actor.id, nominatedByName: nameOf(actor) },
        tx,
      );
      await this.repository.upsertCandidate(
        {
          docSetId,
          path: input.path,
          runId: run!.id,
          title: page.title,
          reasons,
          inboundCount: page.inboundCount,
          stationaryScore: page.stationaryScore,
          wordCount: page.wordCount,
          reviewedAt: page.reviewedAt,
        },
        tx,
      );
      await this.repository.advanceVersion(docSetId, null, tx);
      await this.audit.record(
        actor,
        'pruning.nominated',
        'pruning-page',
        `${docSetId}:${input.path}`,
        { path: input.path, reason: input.reason },
        { docSetId, executor: tx },
      );
    });
    return (await this.item(docSetId, input.path))!;
  }

  /** Applies all decisions or none: unknown paths fail the batch, a stale version answers 409. */
  async decide(actor: AuthUser, docSetId: string, input: DecisionsInput): Promise<{ version: number; decided: number }> {
    await this.docSets.get(docSetId);
    const paths = input.decisions.map((d) => d.path);
    const rows = await this.repository.candidates(docSetId, paths);
    const known = new Map(rows.map((r) => [r.path, r]));
    const unknown = paths.filter((p) => !known.has(p));
    if (unknown.length) {
      throw new AppError(
        422,
        'NOT_ON_PRUNING_LIST',
        `${unknown.length} page(s) are not on this pruning list; nothing was decided.`,
        unknown.slice(0, 20).map((path) => ({ path })),
      );
    }
    const version = await this.database.db.transaction(async (tx) => {
      const next = await this.repository.advanceVersion(docSetId, input.version, tx);
      if (next === null)
        throw conflict(
          'PRUNING_LIST_CHANGED',
          'Someone changed the pruning list since you loaded it. Reload it, check the pages again and decide once more.',
        );
      await this.repository.upsertDecisions(
        input.decisions.map((d) => ({
          docSetId,
          path: d.path,
          decision: d.decision,
          note: d.note,
          decidedBy: actor.id,
          decidedByName: nameOf(actor),
          decidedAt: new Date(),
          inboundAtDecision: known.get(d.path)!.inboundCount,
        })),
        tx,
      );
      for (const d of input.decisions) {
        await this.audit.record(
          actor,
          `pruning.${d.decision}`,
          'pruning-page',
          `${docSetId}:${d.path}`,
          { path: d.path, decision: d.decision, note: d.note, listVersion: input.version },
          { docSetId, executor: tx },
        );
      }
      return next;
    });
    return { version, decided: input.decisions.length };
  }

  async exportApproved(docSetId: string, format: 'csv' | 'txt'): Promise<ExportFile> {
    const docSet = await this.docSets.get(docSetId);
    const approved = await this.repository.decisions(docSetId, 'approve');
    const titles = new Map(
      (
        await this.repository.candidates(
          docSetId,
          approved.map((a) => a.path),
        )
      ).map((c) => [c.path, c.title]),
    );
    const disposition = contentDisposition(exportFileName(docSet.name, format));
    if (format === 'txt')
      return {
        body: approved.map((a) => a.path).join('\n') + (approved.length ? '\n' : ''),
        contentType: 'text/plain; charset=utf-8',
        disposition,
      };
    const rows = approved.map((a) => [
      a.path,
      titles.get(a.path) ?? '',
      a.note,
      a.decidedByName,
      a.decidedAt.toISOString(),
      a.flaggedAt ? (a.flagReason ?? 'flagged') : '',
    ]);
    return {
      body: toCsv(['path', 'title', 'note', 'approvedBy', 'approvedAt', 'needsAnotherLook'], rows),
      contentType: 'text/csv; charset=utf-8',
      disposition,
    };
  }

  /** For the digest: decisions made since `since` (none without a start) and how many pages wait for one. */
  async digestFacts(docSetId: string, since: Date | null) {
    const decisions = since ? await this.repository.decisionsSince(docSetId, since) : [];
    return {
      decisions: decisions.map((d) => ({ path: d.path, decision: d.decision, by: d.decidedByName, at: d.decidedAt })),
      waiting: await this.repository.waitingCount(docSetId),
    };
  }

  private async item(docSetId: string, path: string): Promise<PruningItem | null> {
    const [row] = await this.repository.candidates(docSetId, [path]);
    if (!row) return null;
    const decision = (await this.repository.decisions(docSetId)).find((d) => d.path === path) ?? null;
    return toPruningItem({ ...row, decision }, await this.repository.nominations(docSetId, [path]));
  }
}
