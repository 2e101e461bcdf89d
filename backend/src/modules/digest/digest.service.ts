import { Inject, Injectable, Logger } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { DbService } from '../../db/db.service.js';
import type { RunRow } from '../../db/schema/index.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { MailService } from '../mail/mail.service.js';
import { MailComposer } from '../notifications/mail-composer.service.js';
import { NotificationSettingsService, type Recipient } from '../notifications/notification-settings.service.js';
import { PruningService } from '../pruning/pruning.service.js';
import { RunHistoryService } from '../runs/run-history.service.js';
import { TasksService } from '../tasks/tasks.service.js';
import { buildDigestContent, type DigestContent, type DiffKinds } from './digest-content.js';
import { DigestDeliveriesRepository } from './digest-deliveries.repository.js';
import { type DigestLinks, renderDigest } from './digest-render.js';

const asDigestRun = (run: RunRow) => ({ id: run.id, number: run.number, finishedAt: run.finishedAt!, pageCount: run.counts?.pages ?? 0 });

/**
 * After each nightly run: one digest per reader with what changed since the run their last digest covered,
 * so uploads, CI pushes and settings changes between two nights all show (a reader who does not want
 * "nothing changed" mails still has the night recorded as covered). Readers whose last digest covered
 * the same run share one computed diff. Each mail and its delivery record are written in one transaction,
 * with a Message-ID fixed per run and reader, so running it twice sends nothing twice.
 */
@Injectable()
export class DigestService {
  private readonly logger = new Logger('Digest');

  constructor(
    private readonly history: RunHistoryService,
    private readonly docSets: DocSetsService,
    private readonly settings: NotificationSettingsService,
    private readonly composer: MailComposer,
    private readonly mail: MailService,
    private readonly tasks: TasksService,
    private readonly pruning: PruningService,
    private readonly deliveries: DigestDeliveriesRepository,
    private readonly database: DbService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Returns how many people the digest of this run was queued for. */
  async sendForRun(docSetId: string, runId: string): Promise<number> {
    const run = await this.history.finishedRun(docSetId, runId);
    if (!run) return 0;
    const byBase = new Map<string, { base: RunRow | null; readers: Recipient[] }>();
    for (const reader of await this.settings.recipients('digest', { docSetId })) {
      const base = await this.baseFor(reader, run);
      if (base === 'covered') continue;
      const key = base?.id ?? '';
      byBase.set(key, { base, readers: [...(byBase.get(key)?.readers ?? []), reader] });
    }
    let sent = 0;
    for (const { base, readers } of byBase.values()) {
      const content = await this.content(run, base);
      for (const reader of readers) if (await this.deliver(reader, content, run, base)) sent++;
    }
    this.logger.log(`Digest of run ${run.id} queued for ${sent} reader(s)`);
    return sent;
  }

  /**
   * The run this reader's digest starts from: the one their last digest covered; for a first digest the
   * previous nightly run (what everyone else's digest covered last night), else the run before.
   */
  private async baseFor(reader: Recipient, run: RunRow): Promise<RunRow | null | 'covered'> {
    const last = await this.deliveries.last(reader.userId, run.docSetId);
    if (last?.runId === run.id) return 'covered';
    const covered = last ? await this.history.finishedRun(run.docSetId, last.runId) : null;
    return covered ?? this.history.previousNightlyOrAny(run);
  }

  private async content(run: RunRow, base: RunRow | null): Promise<DigestContent> {
    const docSet = await this.docSets.get(run.docSetId);
    const diff = base ? await this.history.diff(run, base) : null;
    const runsSince = await this.history.finishedBetween(base, run);
    const pruning = await this.pruning.digestFacts(run.docSetId, base?.finishedAt ?? null);
    return buildDigestContent({
      docSet: { id: docSet.id, name: docSet.name },
      run: { ...asDigestRun(run), counts: run.counts },
      against: base ? asDigestRun(base) : null,
      diff: diff ? { kinds: diff.kinds as DiffKinds, scoreMoves: diff.scoreMoves } : null,
      tasks: await this.tasks.runOutcomes(runsSince.map((r) => ({ id: r.id, number: r.number }))),
      pruning,
    });
  }

  /**
   * Mails the digest, or records it silently when nothing changed and the reader does not want to hear so:
   * either way the reader's next digest starts from this run. Returns whether a mail was queued.
   */
  private async deliver(reader: Recipient, content: DigestContent, run: RunRow, base: RunRow | null): Promise<boolean> {
    const silent = content.nothingChanged && !reader.nothingChanged;
    const message = silent
      ? null
      : this.composer.compose(reader, 'digest', renderDigest(content, reader.timeZone, this.links(run, base)), {
          docSetId: run.docSetId,
          dedupeKey: `digest-${run.id}-${reader.userId}`,
        });
    return this.database.db.transaction(async (tx) => {
      const [outboxId] = message ? await this.mail.enqueue([message], tx) : [];
      await this.deliveries.insert(
        { userId: reader.userId, docSetId: run.docSetId, runId: run.id, againstRunId: base?.id ?? null, outboxId: outboxId ?? null },
        tx,
      );
      return !!outboxId;
    });
  }

  private links(run: RunRow, base: RunRow | null): DigestLinks {
    const docSet = `${this.config.publicUrl}/doc-sets/${encodeURIComponent(run.docSetId)}`;
    return {
      findings: `${docSet}/findings?run=${encodeURIComponent(run.id)}`,
      compare: base ? `${docSet}/runs?run=${encodeURIComponent(run.id)}&against=${encodeURIComponent(base.id)}` : null,
    };
  }

  /** People each run's digest was mailed to (for the nightly screen). */
  sentCounts(runIds: string[]): Promise<Map<string, number>> {
    return this.deliveries.countsForRuns(runIds);
  }
}
