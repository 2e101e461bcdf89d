/**
 * The demo doc set: the invented handbook of the demo generator, imported as three snapshots (versions 1, 2
 * and 3, in order) in the background once the app has started, so boot and health never wait for it.
 */
import { Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { Inject } from '@nestjs/common';
import { DomainEvents } from '../../common/events/domain-events.js';
import { LifecycleService } from '../../common/lifecycle/lifecycle.service.js';
import { DemoHistoryRepository } from './demo-history.repository.js';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { FirstStartSeeder } from '../demo/first-start.seeder.js';
import { generateDemoHandbook, type HandbookVersion } from '../demo/generator/index.js';
import { ORG } from '../demo/generator/scenario.js';
import { ImportExecutor } from './import-executor.js';
import { IngestService } from './ingest.service.js';
import { scratchDirOf } from './upload/upload-dir.js';

export const DEMO_DOC_SET_NAME = `${ORG} handbook (demo)`;
const VERSIONS: HandbookVersion[] = [1, 2, 3];
/** The demo is created by the system, not by a person: no user id, audited as "system". */
const SYSTEM = { id: null as unknown as string, email: 'system', name: 'Linkloom', role: 'admin' as const };

@Injectable()
export class DemoDocSetSeeder implements OnModuleInit {
  private readonly logger = new Logger('Demo');

  constructor(
    private readonly firstStart: FirstStartSeeder,
    private readonly docSets: DocSetsService,
    private readonly ingest: IngestService,
    private readonly executor: ImportExecutor,
    private readonly lifecycle: LifecycleService,
    private readonly events: DomainEvents,
    private readonly history: DemoHistoryRepository,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  /** What FirstStartSeeder calls on an empty database: it schedules the imports and returns at once. */
  readonly contentSeeder = { seed: async (): Promise<void> => void this.lifecycle.track(this.seedInBackground()) };

  private demoDocSetId: string | null = null;

  onModuleInit(): void {
    this.firstStart.registerContentSeeder(this.contentSeeder);
    this.events.on('run.finished', async ({ docSetId, runId, trigger }) => {
      if (docSetId === this.demoDocSetId && trigger === 'import') await this.history.spreadOverWeeks(runId, VERSIONS.length);
    });
  }

  private async seedInBackground(): Promise<void> {
    try {
      await this.executor.recovered;
      await this.seed();
    } catch (error) {
      this.logger.error(`The demo doc set could not be imported: ${(error as Error)?.stack ?? String(error)}`);
    }
  }

  async seed(): Promise<string> {
    const first = generateDemoHandbook(1);
    const docSet = await this.docSets.create(SYSTEM, {
      name: DEMO_DOC_SET_NAME,
      description: `The handbook of the ${ORG}, an invented organisation, at three points in time.`,
      settings: first.settings,
    });
    this.demoDocSetId = docSet.id;
    for (const version of VERSIONS) {
      const files = version === 1 ? first.files : generateDemoHandbook(version).files;
      const folder = await mkdtemp(join(await ensure(scratchDirOf(this.config)), 'demo-'));
      try {
        await writeFiles(folder, files);
        const snapshot = await this.ingest.importFolderAndWait(docSet, folder, `Version ${version}`);
        this.logger.log(`Demo handbook version ${version}: ${snapshot.status}, ${snapshot.pageCount} pages, ${snapshot.linkCount} links`);
      } finally {
        await rm(folder, { recursive: true, force: true });
      }
    }
    return docSet.id;
  }
}

async function ensure(dir: string): Promise<string> {
  await mkdir(dir, { recursive: true, mode: 0o700 });
  return dir;
}

async function writeFiles(root: string, files: Record<string, string | Uint8Array>): Promise<void> {
  for (const [path, content] of Object.entries(files)) {
    const file = join(root, path);
    await mkdir(dirname(file), { recursive: true });
    await writeFile(file, content);
  }
}
