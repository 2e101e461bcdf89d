import { randomUUID } from 'node:crypto';
import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnApplicationShutdown, type OnModuleInit } from '@nestjs/common';
import { SchedulerRegistry } from '@nestjs/schedule';
import { CronJob } from 'cron';
import type { NightlyDocSetResult, NightlyResult } from '@linkloom/shared';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { DomainEvents } from '../../common/events/domain-events.js';
import { LifecycleService } from '../../common/lifecycle/lifecycle.service.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { IngestService } from '../ingest/ingest.service.js';
import { DigestService } from '../digest/digest.service.js';
import { RunHistoryService } from '../runs/run-history.service.js';
import { RunsService } from '../runs/runs.service.js';
import { JobLeaseRepository } from './job-lease.repository.js';
import { nextOccurrence, wasMissed } from './next-nightly.js';

export const NIGHTLY = 'nightly';

const LEASE_SECONDS = 15 * 60;
const RUN_WAIT_MS = 60 * 60 * 1000;

export type NightlyTrigger = 'clock' | 'run-now' | 'catch-up';
export type NightlyOutcome = Omit<NightlyResult, 'trigger'>;
type DocSetOutcome = NightlyDocSetResult;

/**
 * Every night, for each doc set with nightly runs on: re-read its server folder when it has one (which
 * starts a run), else re-analyse its latest snapshot with the current settings. A lease row makes sure a
 * night's job runs once even with two processes or a "run now" during the clock's run.
 */
@Injectable()
export class NightlyJobService implements OnModuleInit, OnApplicationBootstrap, OnApplicationShutdown {
  private readonly logger = new Logger('Nightly');
  private readonly holder = `${process.pid}-${randomUUID()}`;
  private readonly waiting = new Map<string, (result: { ok: boolean; runId?: string; message?: string }) => void>();
  private job: CronJob | null = null;

  constructor(
    private readonly leases: JobLeaseRepository,
    private readonly docSets: DocSetsService,
    private readonly runs: RunsService,
    private readonly history: RunHistoryService,
    private readonly digest: DigestService,
    private readonly ingest: IngestService,
    private readonly events: DomainEvents,
    private readonly lifecycle: LifecycleService,
    private readonly scheduler: SchedulerRegistry,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  onModuleInit(): void {
    // Last, so the finished run's other effects (task verification, pruning list) are in place before the digest.
    const last = { last: true };
    this.events.on(
      'run.finished',
      ({ docSetId, runId, trigger }) => {
        if (trigger === 'nightly') this.settle(docSetId, { ok: true, runId });
      },
      last,
    );
    this.events.on('run.failed', ({ docSetId, runId, message }) => this.settle(docSetId, { ok: false, runId, message }), last);
    this.events.on('snapshot.failed', ({ docSetId, message }) => this.settle(docSetId, { ok: false, message }), last);
  }

  async onApplicationBootstrap(): Promise<void> {
    const [hours, minutes] = this.config.nightlyTime.split(':').map(Number);
    this.job = CronJob.from({ cronTime: `0 ${minutes} ${hours} * * *`, onTick: () => void this.trigger('clock'), start: true });
    this.scheduler.addCronJob(NIGHTLY, this.job as never);
    const lease = await this.leases.find(NIGHTLY);
    if (!lease) return this.leases.ensureBaseline(NIGHTLY);
    if (wasMissed(this.config.nightlyTime, lease.lastStartedAt, new Date())) {
      this.logger.log('The nightly run was missed while the server was down; running it now.');
      setTimeout(() => void this.trigger('catch-up'), 2_000).unref();
    }
  }

  onApplicationShutdown(): void {
    void this.job?.stop();
  }

  nextRunAt(): Date {
    return nextOccurrence(this.config.nightlyTime, new Date());
  }

  /** Runs the job exactly as the clock would; resolves when every doc set's run has finished. */
  trigger(trigger: NightlyTrigger): Promise<NightlyOutcome> {
    return this.lifecycle.track(this.execute(trigger));
  }

  private async execute(trigger: NightlyTrigger): Promise<NightlyOutcome> {
    if (!(await this.leases.tryAcquire(NIGHTLY, this.holder, LEASE_SECONDS))) {
      this.logger.warn(`Nightly job (${trigger}) skipped: already running`);
      return { status: 'skipped', reason: 'already running', docSets: [] };
    }
    const heartbeat = setInterval(() => void this.leases.extend(NIGHTLY, this.holder, LEASE_SECONDS), 60_000).unref();
    const outcome: NightlyOutcome = { status: 'finished', docSets: [] };
    try {
      for (const docSet of await this.docSets.list()) {
        if (!docSet.settings.nightly) continue;
        outcome.docSets.push(await this.runFor(docSet.id, docSet.name, docSet.settings.sourceFolder !== null));
      }
    } finally {
      clearInterval(heartbeat);
      await this.leases.release(NIGHTLY, this.holder, { trigger, ...outcome });
    }
    this.logger.log(`Nightly job (${trigger}) finished for ${outcome.docSets.length} doc set(s)`);
    return outcome;
  }

  private async runFor(docSetId: string, name: string, hasFolder: boolean): Promise<DocSetOutcome> {
    const action = hasFolder ? 're-read folder' : 're-analysed';
    const done = this.waitFor(docSetId);
    try {
      if (hasFolder) await this.ingest.importFromSource(docSetId, null, 'nightly');
      else await this.runs.startRun(docSetId, 'nightly');
    } catch (error) {
      this.waiting.delete(docSetId);
      return { docSetId, name, action, outcome: 'failed', message: (error as Error).message };
    }
    const result = await done;
    if (!result.ok || !result.runId) return { docSetId, name, action, outcome: 'failed', runId: result.runId, message: result.message };
    const digestSentTo = await this.digest.sendForRun(docSetId, result.runId).catch((error) => {
      this.logger.error(`The digest of run ${result.runId} failed: ${String(error)}`);
      return 0;
    });
    const run = await this.history.finishedRun(docSetId, result.runId);
    return { docSetId, name, action, outcome: 'finished', runId: result.runId, runNumber: run?.number ?? null, digestSentTo };
  }

  private waitFor(docSetId: string): Promise<{ ok: boolean; runId?: string; message?: string }> {
    return new Promise((resolve) => {
      const timer = setTimeout(() => this.settle(docSetId, { ok: false, message: 'timed out waiting for the run' }), RUN_WAIT_MS);
      timer.unref();
      this.waiting.set(docSetId, (result) => {
        clearTimeout(timer);
        resolve(result);
      });
    });
  }

  private settle(docSetId: string, result: { ok: boolean; runId?: string; message?: string }): void {
    const resolve = this.waiting.get(docSetId);
    if (!resolve) return;
    this.waiting.delete(docSetId);
    resolve(result);
  }

  async status() {
    const lease = await this.leases.find(NIGHTLY);
    // The baseline row of a new installation is not a run; do not show it as one.
    const ran = Boolean(lease?.lastResult && !('baseline' in lease.lastResult));
    return {
      nightlyTime: this.config.nightlyTime,
      timeZone: Intl.DateTimeFormat().resolvedOptions().timeZone,
      nextRunAt: this.nextRunAt().toISOString(),
      running: Boolean(lease?.leaseUntil && lease.leaseUntil.getTime() > Date.now()),
      lastStartedAt: ran || lease?.leaseUntil ? (lease?.lastStartedAt?.toISOString() ?? null) : null,
      lastFinishedAt: ran ? (lease?.lastFinishedAt?.toISOString() ?? null) : null,
      lastResult: ran ? lease!.lastResult : null,
      docSets: (await this.docSets.list()).map((d) => ({
        id: d.id,
        name: d.name,
        nightly: d.settings.nightly,
        sourceFolder: d.settings.sourceFolder,
      })),
    };
  }
}
