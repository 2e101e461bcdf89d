import { Module } from '@nestjs/common';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { AnalysisWorkerClient } from './analysis/analysis-worker-client.js';
import { ExportRepository } from './export/export.repository.js';
import { ExportService } from './export/export.service.js';
import { DiffRepository } from './findings/diff.repository.js';
import { FindingsRepository } from './findings/findings.repository.js';
import { FindingsService } from './findings/findings.service.js';
import { PageDetailRepository } from './pages/page-detail.repository.js';
import { PageDetailService } from './pages/page-detail.service.js';
import { PageListRepository } from './pages/page-list.repository.js';
import { PageMetricsRepository } from './page-metrics.repository.js';
import { RunExecutor } from './run-executor.service.js';
import { RunHistoryRepository } from './run-history.repository.js';
import { RunHistoryService } from './run-history.service.js';
import { RunInputsRepository } from './run-inputs.repository.js';
import { RunLookup } from './run-lookup.service.js';
import { RunResultsController } from './run-results.controller.js';
import { RunResultsService } from './run-results.service.js';
import { RunsController } from './runs.controller.js';
import { RunsRepository } from './runs.repository.js';
import { RunsService } from './runs.service.js';
import { SearchRepository } from './search/search.repository.js';
import { SearchService } from './search/search.service.js';
import { OnDemandSuggestionsService } from './suggestions/on-demand-suggestions.service.js';
import { SuggestionsRepository } from './suggestions/suggestions.repository.js';
import { SuggestionsService } from './suggestions/suggestions.service.js';

/** Analysis runs: the queue, the computation in a worker thread, and every read of a run's results. */
@Module({
  imports: [DocSetsModule],
  controllers: [RunsController, RunResultsController],
  providers: [
    AnalysisWorkerClient,
    RunsRepository,
    RunInputsRepository,
    PageMetricsRepository,
    RunExecutor,
    RunLookup,
    RunsService,
    RunHistoryRepository,
    RunHistoryService,
    RunResultsService,
    PageListRepository,
    PageDetailRepository,
    PageDetailService,
    SuggestionsRepository,
    SuggestionsService,
    OnDemandSuggestionsService,
    FindingsRepository,
    DiffRepository,
    FindingsService,
    SearchRepository,
    SearchService,
    ExportRepository,
    ExportService,
  ],
  exports: [RunsService, FindingsService, RunHistoryService],
})
export class RunsModule {}
