import { Inject, Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import type { DocSet } from '@linkloom/shared';
import { mkdir, readdir, rm } from 'node:fs/promises';
import { join } from 'node:path';
import { DomainEvents } from '../../common/events/domain-events.js';
import { LifecycleService } from '../../common/lifecycle/lifecycle.service.js';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import type { SnapshotRow } from '../../db/schema/index.js';
import type { ArchivePlan, PageBytes } from './archive/index.js';
import { interrupted, toImportFailure } from './import-failure.js';
import { runImport } from './import-runner.js';
import { INGEST_LIMITS, type IngestLimits } from './ingest-limits.js';
import { ParserHost } from './parse/parser-host.js';
import { PageStoreRepository } from './storage/page-store.repository.js';
import { SnapshotsRepository } from './storage/snapshots.repository.js';
import { scratchDirOf, uploadDirOf } from './upload/upload-dir.js';

export type ImportTrigger = 'import' | 'nightly';

export interface ImportJob {
  snapshot: SnapshotRow;
  docSet: DocSet;
  plan: ArchivePlan;
  trigger: ImportTrigger;
  readPages(): AsyncIterable<PageBytes>;
  cleanup?(): Promise<void>;
}

/**
 * Runs imports in the background and owns their end states: `ready` plus `snapshot.ready`, or `failed`
 * with its rows removed. On boot, imports a restart cut short become failed INTERRUPTED (docs/threats.md, "Import pipeline"
 * step 8) before anything new starts; `recovered` lets start-up work (the demo import) wait for that.
 */
@Injectable()
export class ImportExecutor implements OnApplicationBootstrap {
  private readonly logger = new Logger('Ingest');
  private markRecovered!: () => void;
  readonly recovered = new Promise<void>((resolve) => (this.markRecovered = resolve));

  constructor(
    private readonly snapshots: SnapshotsRepository,
    private readonly store: PageStoreRepository,
    private readonly events: DomainEvents,
    private readonly lifecycle: LifecycleService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
    private readonly parsers: ParserHost,
    @Inject(INGEST_LIMITS) private readonly limits: IngestLimits,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    try {
      await this.clearFolder(uploadDirOf(this.config));
      await this.clearFolder(scratchDirOf(this.config));
      await this.failUnfinished();
    } finally {
      this.markRecovered();
    }
  }

  /** Exposed for tests and for a supervisor that restarts the pipeline without restarting the process. */
  async failUnfinished(): Promise<number> {
    const stale = await this.snapshots.findUnfinished();
    for (const row of stale) {
      const failure = interrupted();
      await this.snapshots.markFailed(row.id, failure.code, failure.message);
      await this.store.deleteSnapshotRows(row.id);
      this.logger.warn(`Snapshot ${row.id} was interrupted by a restart and is marked failed`);
    }
    return stale.length;
  }

  /** Starts the job in the background (tracked through shutdown); the promise settles when it ends. */
  start(job: ImportJob): Promise<void> {
    return this.lifecycle.track(this.execute(job));
  }

  private async execute(job: ImportJob): Promise<void> {
    const { snapshot, docSet } = job;
    try {
      const previous = await this.snapshots.latestReady(docSet.id);
      const result = await runImport(
        {
          snapshotId: snapshot.id,
          previousSnapshotId: previous?.id ?? null,
          settings: docSet.settings,
          plan: job.plan,
          readPages: job.readPages,
        },
        { snapshots: this.snapshots, store: this.store, limits: this.limits, parsers: this.parsers },
      );
      this.logger.log(
        `Snapshot ${snapshot.id} ready: ${result.pageCount} pages (${result.reusedPageCount} reused), ${result.linkCount} links in ${result.importMs} ms`,
      );
      await this.events.emit('snapshot.ready', {
        docSetId: docSet.id,
        snapshotId: snapshot.id,
        trigger: job.trigger,
        actorId: snapshot.createdBy,
      });
    } catch (error) {
      await this.fail(snapshot, error);
    } finally {
      await job.cleanup?.().catch(() => undefined);
    }
  }

  private async fail(snapshot: SnapshotRow, error: unknown): Promise<void> {
    const { failure, internal } = toImportFailure(error);
    if (internal) this.logger.error(`Import of snapshot ${snapshot.id} failed: ${(error as Error)?.stack ?? String(error)}`);
    else this.logger.warn(`Import of snapshot ${snapshot.id} failed with ${failure.code}: ${(error as Error)?.message ?? String(error)}`);
    try {
      await this.snapshots.markFailed(snapshot.id, failure.code, failure.message);
      await this.store.deleteSnapshotRows(snapshot.id);
    } catch (cleanupError) {
      this.logger.error(`Could not clean up failed snapshot ${snapshot.id}: ${String(cleanupError)}`);
    }
    await this.events.emit('snapshot.failed', {
      docSetId: snapshot.docSetId,
      snapshotId: snapshot.id,
      code: failure.code,
      message: failure.message,
    });
  }

  private async clearFolder(dir: string): Promise<void> {
    await mkdir(dir, { recursive: true, mode: 0o700 });
    for (const name of await readdir(dir)) await rm(join(dir, name), { recursive: true, force: true });
  }
}
