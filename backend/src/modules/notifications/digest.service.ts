import { Inject, Injectable, Logger } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { MailService } from '../mail/mail.service.js';
import { FindingsService } from '../runs/findings/findings.service.js';
import { RunsService } from '../runs/runs.service.js';
import { buildDigest, type DigestChange } from './digest-builder.js';
import { DigestFactsRepository } from './digest-facts.repository.js';
import { SubscriptionsRepository } from './subscriptions.repository.js';

/** Reads results on behalf of no person (the nightly job). */
const SYSTEM: AuthUser = { id: '00000000-0000-0000-0000-000000000000', email: 'system', name: 'Linkloom', role: 'admin' };

type ChangeList = { total: number; items: Record<string, string>[] };
type DiffKinds = Record<string, { appeared: ChangeList; disappeared: ChangeList }>;

const DIGEST_KINDS: [kind: string, label: string][] = [
  ['brokenLinks', 'Broken links'],
  ['brokenAnchors', 'Broken anchors'],
  ['orphans', 'Orphan pages'],
  ['deadEnds', 'Dead ends'],
  ['unreachable', 'Unreachable pages'],
];

function describe(item: Record<string, string>): string {
  return item.href !== undefined ? `${item.sourcePath} -> ${item.href}` : item.path;
}

/**
 * After each nightly run (the nightly job calls it once the run's other effects are done): one digest per subscriber, with what appeared and disappeared since the run
 * before, the largest score moves, tasks the run verified, overdue tasks and pruning decisions waiting.
 * Each digest's Message-ID is fixed per run and user, so sending it twice is harmless.
 */
@Injectable()
export class DigestService {
  private readonly logger = new Logger('Digest');

  constructor(
    private readonly runs: RunsService,
    private readonly findings: FindingsService,
    private readonly docSets: DocSetsService,
    private readonly subscriptions: SubscriptionsRepository,
    private readonly facts: DigestFactsRepository,
    private readonly mail: MailService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async sendForRun(docSetId: string, runId: string): Promise<number> {
    const run = await this.runs.resolve(SYSTEM, docSetId, runId);
    const docSet = await this.docSets.get(docSetId);
    const previous = await this.facts.previousFinishedRun(docSetId, run.id);
    const diff = previous
      ? ((await this.findings.diff(run, previous as never)) as {
          kinds: DiffKinds;
          scoreMoves: { path: string; before: number; after: number }[];
        })
      : null;
    const pageCount = run.counts?.pages ?? 0;
    const changes: DigestChange[] = DIGEST_KINDS.map(([kind, label]) => {
      const entry = diff?.kinds[kind];
      return {
        label,
        appeared: entry?.appeared.items.map(describe) ?? [],
        appearedTotal: entry?.appeared.total ?? 0,
        disappeared: entry?.disappeared.items.map(describe) ?? [],
        disappearedTotal: entry?.disappeared.total ?? 0,
      };
    });
    const scoreMoves = (diff?.scoreMoves ?? [])
      .filter((m) => Math.abs(m.after - m.before) * pageCount >= 0.05)
      .slice(0, 5)
      .map((m) => ({ path: m.path, before: m.before * pageCount, after: m.after * pageCount }));
    const digest = buildDigest({
      docSetName: docSet.name,
      runUrl: `${this.config.publicUrl}/doc-sets/${docSetId}/runs`,
      finishedAt: run.finishedAt?.toISOString() ?? new Date().toISOString(),
      pageCount,
      changes,
      scoreMoves,
      tasksVerified: await this.facts.tasksVerifiedBy(run.id),
      tasksOverdue: await this.facts.tasksOverdue(docSetId, new Date().toISOString().slice(0, 10)),
      pruningWaiting: await this.facts.pruningWaiting(docSetId),
    });
    const recipients = (await this.subscriptions.digestRecipients(docSetId)).filter((r) => !digest.nothingChanged || r.nothingChanged);
    await this.mail.enqueue(
      recipients.map((r) => ({
        kind: 'digest',
        toAddress: r.email,
        subject: digest.subject,
        text: digest.text,
        html: digest.html,
        docSetId,
        dedupeKey: `digest-${run.id}-${r.userId}`,
      })),
    );
    this.logger.log(`Digest of run ${run.id} queued for ${recipients.length} subscriber(s)`);
    return recipients.length;
  }
}
