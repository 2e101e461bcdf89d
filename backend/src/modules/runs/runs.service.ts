import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleInit } from '@nestjs/common';
import type { DocSetSettingsPatch } from '@linkloom/shared';
import { AppError, conflict } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { DomainEvents } from '../../common/events/domain-events.js';
import { LifecycleService } from '../../common/lifecycle/lifecycle.service.js';
import type { RunRow } from '../../db/schema/index.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { RunExecutor, type SuggestionWork } from './run-executor.service.js';
import { RunInputsRepository } from './run-inputs.repository.js';
import { RunLookup } from './run-lookup.service.js';
import { toRunView, type RunView } from './run-view.js';
import { RunsRepository, type RunTrigger } from './runs.repository.js';

export const INTERRUPTED = 'Interrupted by a restart of the server; start the run again.';

/**
 * Starts runs and works through each doc set's queue one run at a time, in the background (tracked by the
 * lifecycle so shutdown waits for it). The queue lives in the runs table, so nothing is lost between the
 * POST and the work, and the claim is a single conditional UPDATE.
 */
@Injectable()
export class RunsService implements OnModuleInit, OnApplicationBootstrap {
  private readonly logger = new Logger('Runs');
  private readonly drains = new Map<string, Promise<void>>();
  private readonly kickedWhileDraining = new Set<string>();

  constructor(
    private readonly runs: RunsRepository,
    private readonly inputs: RunInputsRepository,
    private readonly executor: RunExecutor,
    private readonly docSets: DocSetsService,
    private readonly events: DomainEvents,
    private readonly lifecycle: LifecycleService,
    private readonly lookup: RunLookup,
  ) {}

  onModuleInit(): void {
    this.events.on('snapshot.ready', async ({ docSetId, snapshotId, trigger, actorId }) => {
      await this.startRun(docSetId, trigger, undefined, actorId ? { id: actorId } : undefined, snapshotId);
    });
  }

  async onApplicationBootstrap(): Promise<void> {
    const failed = await this.runs.failUnfinished(INTERRUPTED);
    if (failed > 0) this.logger.warn(`${failed} run(s) left unfinished by the last shutdown were marked failed`);
  }

  /** Queues a run over the doc set's latest ready snapshot (or the given one) with merged settings. */
  async startRun(
    docSetId: string,
    trigger: RunTrigger,
    overrides?: DocSetSettingsPatch,
    actor?: Pick<AuthUser, 'id'>,
    snapshotId?: string,
  ): Promise<RunView> {
    const docSet = await this.docSets.get(docSetId);
    const settings = overrides ? this.docSets.merge(docSet.settings, overrides) : docSet.settings;
    const snapshot = snapshotId ?? (await this.inputs.latestReadySnapshotId(docSetId));
    if (!snapshot || !(await this.inputs.isReadySnapshot(docSetId, snapshot))) {
      throw conflict('NO_READY_SNAPSHOT', 'This doc set has no imported snapshot yet: upload an archive first, then start a run.');
    }
    const row = await this.runs.insertQueued({ docSetId, snapshotId: snapshot, trigger, settings, createdBy: actor?.id ?? null });
    this.kick(docSetId);
    return toRunView(row);
  }

  /** A run started by a person (or a CI token of this doc set) over the API. */
  async startManual(actor: AuthUser, docSetId: string, overrides?: DocSetSettingsPatch): Promise<RunView> {
    await this.lookup.checkDocSet(actor, docSetId);
    return this.startRun(docSetId, 'manual', overrides, actor);
  }

  async list(actor: AuthUser, docSetId: string, page: number, pageSize: number) {
    await this.lookup.checkDocSet(actor, docSetId);
    const { rows, total } = await this.runs.list(docSetId, (page - 1) * pageSize, pageSize);
    return { items: rows.map(toRunView), total, page, pageSize };
  }

  async get(actor: AuthUser, docSetId: string, runId: string): Promise<RunView> {
    return toRunView(await this.resolve(actor, docSetId, runId, false));
  }

  /** The run named by id or `latest` (newest finished run); readers of results need a finished run. */
  resolve(actor: AuthUser, docSetId: string, runId: string, mustBeFinished = true): Promise<RunRow> {
    return this.lookup.resolve(actor, docSetId, runId, mustBeFinished);
  }

  private kick(docSetId: string): void {
    if (this.drains.has(docSetId)) {
      this.kickedWhileDraining.add(docSetId);
      return;
    }
    const work = this.drain(docSetId).finally(() => {
      this.drains.delete(docSetId);
      // A run queued while the loop was finding nothing left must not wait for the next start.
      if (this.kickedWhileDraining.delete(docSetId)) this.kick(docSetId);
    });
    this.drains.set(docSetId, work);
    void this.lifecycle.track(work);
  }

  private async drain(docSetId: string): Promise<void> {
    while (!this.lifecycle.draining) {
      this.kickedWhileDraining.delete(docSetId);
      const run = await this.runs.claimNext(docSetId);
      if (!run) return;
      await this.executeClaimed(run);
    }
  }

  private async executeClaimed(run: RunRow): Promise<void> {
    let work: SuggestionWork;
    try {
      const { finished, suggestions } = await this.executor.execute(run);
      work = suggestions;
      this.lookup.forgetLatest(run.docSetId);
      this.logger.log(`Run ${run.id} finished in ${finished.durationMs} ms (${finished.counts?.pages} pages)`);
      await this.events.emit('run.finished', { docSetId: run.docSetId, runId: run.id, trigger: run.trigger });
    } catch (error) {
      this.logger.error(`Run ${run.id} failed: ${(error as Error)?.stack ?? String(error)}`);
      const message =
        error instanceof AppError || error instanceof RangeError
          ? `The analysis failed: ${error.message}`
          : 'The analysis failed with an internal error (details in the server log).';
      await this.executor.discardResults(run.id).catch(() => undefined);
      await this.runs.markFailed(run.id, message);
      await this.events.emit('run.failed', { docSetId: run.docSetId, runId: run.id, message });
      return;
    }
    // A newer queued run makes these suggestions stale: give it the thread (the page detail still fills gaps on demand).
    const stop = async () => this.lifecycle.draining || (await this.runs.hasQueued(run.docSetId));
    try {
      const done = await this.executor.precomputeSuggestions(work, stop);
      this.logger.log(`Run ${run.id}: suggestions for ${done} of ${work.targets.length} pages that need links`);
    } catch (error) {
      this.logger.error(`Suggestions of run ${run.id} stopped: ${(error as Error)?.stack ?? String(error)}`);
    }
  }

  /** Resolves when the doc set's queue (runs and their suggestion work) is empty; for tests and benchmarks. */
  async whenIdle(docSetId: string): Promise<void> {
    while (this.drains.has(docSetId)) await this.drains.get(docSetId);
  }
}
