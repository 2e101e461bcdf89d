import { Module } from '@nestjs/common';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { DemoDocSetSeeder } from './demo-doc-set.seeder.js';
import { DemoHistoryRepository } from './demo-history.repository.js';
import { ImportExecutor } from './import-executor.js';
import { IngestController } from './ingest.controller.js';
import { DEFAULT_INGEST_LIMITS, INGEST_LIMITS } from './ingest-limits.js';
import { IngestService } from './ingest.service.js';
import { ParserHost } from './parse/parser-host.js';
import { PageStoreRepository } from './storage/page-store.repository.js';
import { SnapshotsRepository } from './storage/snapshots.repository.js';
import { ArchiveUploadInterceptor } from './upload/archive-upload.interceptor.js';

@Module({
  imports: [DocSetsModule],
  controllers: [IngestController],
  providers: [
    // A copy per app: the benchmark raises the time limit on its own instance.
    {
      provide: INGEST_LIMITS,
      inject: [APP_CONFIG],
      useFactory: (config: AppConfig) => ({
        ...DEFAULT_INGEST_LIMITS,
        importTimeoutMs: config.importTimeoutSeconds * 1000,
        pageTimeoutMs: config.pageParseTimeoutMs,
      }),
    },
    SnapshotsRepository,
    PageStoreRepository,
    ParserHost,
    ImportExecutor,
    IngestService,
    ArchiveUploadInterceptor,
    DemoDocSetSeeder,
    DemoHistoryRepository,
  ],
  exports: [IngestService],
})
export class IngestModule {}
