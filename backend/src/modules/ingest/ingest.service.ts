import { Inject, Injectable, Logger } from '@nestjs/common';
import type { DocSet, ListResult } from '@linkloom/shared';
import { rm } from 'node:fs/promises';
import { AppError, notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import type { SnapshotRow } from '../../db/schema/index.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { ArchiveError, type ArchivePlan, inspectArchive, inspectFolder, readFolderPages, readPageEntries } from './archive/index.js';
import { ImportExecutor, type ImportTrigger } from './import-executor.js';
import { inspectOptions } from './inspect-options.js';
import { SnapshotsRepository } from './storage/snapshots.repository.js';
import { toSnapshotView, type SnapshotView } from './snapshot-view.js';
import type { StoredUpload } from './upload/hashing-disk-storage.js';
import { emptyUpload, missingFile } from './upload/upload-errors.js';

type Actor = Pick<AuthUser, 'id' | 'role' | 'apiTokenDocSetId'>;

/** Imports: check, decide, record the snapshot, then hand the work to the background executor. */
@Injectable()
export class IngestService {
  private readonly logger = new Logger('Ingest');

  constructor(
    private readonly snapshots: SnapshotsRepository,
    private readonly docSets: DocSetsService,
    private readonly executor: ImportExecutor,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** Archive-level problems answer 4xx at once and store nothing; the page work continues in the background. */
  async importUpload(actor: Actor, docSetId: string, upload: StoredUpload | undefined): Promise<SnapshotView> {
    if (!upload) throw missingFile();
    try {
      const docSet = await this.docSets.get(docSetId);
      if (upload.size === 0) throw emptyUpload();
      await this.checkQuota(actor);
      const plan = await this.inspect(() => inspectArchive(upload.path, inspectOptions(docSet.settings)));
      const snapshot = await this.begin(docSet, plan, {
        source: actor.apiTokenDocSetId ? 'ci' : 'upload',
        createdBy: actor.id,
        archiveSha256: upload.sha256,
        archiveBytes: upload.size,
      });
      this.executor.start({
        snapshot,
        docSet,
        plan,
        trigger: 'import',
        readPages: () => readPageEntries(upload.path, plan, inspectOptions(docSet.settings).limits),
        cleanup: () => rm(upload.path, { force: true }),
      });
      return toSnapshotView(snapshot);
    } catch (error) {
      await rm(upload.path, { force: true });
      throw error;
    }
  }

  /** Re-reads the doc set's server folder (admin route, and the nightly job with `actor` null). */
  async importFromSource(docSetId: string, actor: Actor | null, trigger: ImportTrigger): Promise<SnapshotView> {
    const docSet = await this.docSets.get(docSetId);
    const folder = docSet.settings.sourceFolder;
    if (!folder) throw new AppError(422, 'SOURCE_FOLDER_NOT_SET', 'This doc set has no server folder; set one in its settings first.');
    if (actor) await this.checkQuota(actor);
    const plan = await this.inspect(() => inspectFolder(folder, inspectOptions(docSet.settings)));
    const snapshot = await this.begin(docSet, plan, {
      source: 'folder',
      createdBy: actor?.id ?? null,
      archiveSha256: null,
      archiveBytes: null,
    });
    this.executor.start({
      snapshot,
      docSet,
      plan,
      trigger,
      readPages: () => readFolderPages(folder, plan, inspectOptions(docSet.settings).limits),
    });
    return toSnapshotView(snapshot);
  }

  /**
   * Imports generated files (the demo doc set) through the folder reader and waits for the result. The
   * files are written to a scratch folder first, so they meet exactly the checks an upload meets.
   */
  async importFolderAndWait(docSet: DocSet, folder: string, label: string): Promise<SnapshotView> {
    const plan = await this.inspect(() => inspectFolder(folder, inspectOptions(docSet.settings)));
    const snapshot = await this.begin(docSet, plan, { source: 'demo', createdBy: null, archiveSha256: null, archiveBytes: null, label });
    await this.executor.start({
      snapshot,
      docSet,
      plan,
      trigger: 'import',
      readPages: () => readFolderPages(folder, plan, inspectOptions(docSet.settings).limits),
    });
    return this.get(docSet.id, snapshot.id);
  }

  async latestReadySnapshot(docSetId: string): Promise<SnapshotView | null> {
    const row = await this.snapshots.latestReady(docSetId);
    return row ? toSnapshotView(row) : null;
  }

  async list(docSetId: string, page: number, pageSize: number): Promise<ListResult<SnapshotView>> {
    await this.docSets.get(docSetId);
    const { rows, total } = await this.snapshots.list(docSetId, (page - 1) * pageSize, pageSize);
    return { items: rows.map(toSnapshotView), total, page, pageSize };
  }

  async get(docSetId: string, snapshotId: string): Promise<SnapshotView> {
    const row = await this.snapshots.find(docSetId, snapshotId);
    if (!row) throw notFound('The snapshot');
    return toSnapshotView(row);
  }

  private async checkQuota(actor: Actor): Promise<void> {
    const since = new Date(Date.now() - 3600_000);
    if ((await this.snapshots.countCreatedSince(actor.id, since)) >= this.config.importsPerHour) {
      throw new AppError(
        429,
        'IMPORT_QUOTA_EXCEEDED',
        `You have started ${this.config.importsPerHour} imports in the last hour, the limit; try again later.`,
      );
    }
  }

  private async inspect(work: () => Promise<ArchivePlan>): Promise<ArchivePlan> {
    try {
      return await work();
    } catch (error) {
      if (error instanceof ArchiveError) throw new AppError(error.status, error.code, error.message, error.details);
      throw error;
    }
  }

  private async begin(
    docSet: DocSet,
    plan: ArchivePlan,
    origin: Pick<SnapshotRow, 'source' | 'createdBy' | 'archiveSha256' | 'archiveBytes'> & { label?: string },
  ): Promise<SnapshotRow> {
    const ignored = plan.ignored.slice(0, 1000).map((entry) => ({ path: entry.path, reason: entry.ignoredReason ?? 'ignored' }));
    const pages = plan.entries.filter((entry) => entry.kind === 'page').length;
    const row = await this.snapshots.insertReceived({
      docSetId: docSet.id,
      label: origin.label ?? null,
      ...origin,
      ignored,
      progressTotal: pages,
    });
    if (!row) {
      throw new AppError(409, 'IMPORT_IN_PROGRESS', 'An import of this doc set is already running; wait for it to finish, then try again.');
    }
    this.logger.log(`Snapshot ${row.id} of doc set ${docSet.id} received (${pages} pages)`);
    return row;
  }
}
