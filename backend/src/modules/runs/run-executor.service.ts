import { Injectable } from '@nestjs/common';
import type { DocSetSettings } from '@linkloom/shared';
import type { RunRow } from '../../db/schema/index.js';
import { FLAG_ORPHAN, FLAG_DEEP, FLAG_REACHABLE, type AnalyzeJobResult } from './analysis/analysis-jobs.js';
import { AnalysisWorkerClient } from './analysis/analysis-worker-client.js';
import { chooseEntryPages, type RunWarning } from './analysis/entry-pages.js';
import { runCounts } from './analysis/run-counts.js';
import { PageMetricsRepository } from './page-metrics.repository.js';
import { RunInputsRepository, type SnapshotPages } from './run-inputs.repository.js';
import { RunsRepository } from './runs.repository.js';
import { SuggestionsService, type RunGraphContext } from './suggestions/suggestions.service.js';

/** Pages that need links whose suggestions a run computes ahead (the rest on demand), and the time allowed. */
export const PRECOMPUTED_SUGGESTION_TARGETS = 200;
export const SUGGESTION_BUDGET_MS = 60_000;

/** What is left to do after a run is finished: suggestions for its most urgent pages. */
export interface SuggestionWork {
  context: RunGraphContext;
  targets: number[];
}

/**
 * Does one claimed run: load the snapshot, analyse it in a worker thread, store the metrics, finish. The
 * suggestions for its most urgent pages follow (`precomputeSuggestions`) once the run is readable.
 */
@Injectable()
export class RunExecutor {
  /** Milliseconds per phase of the last run (logged, and read by the run benchmark). */
  lastPhases: Record<'load' | 'compute' | 'store' | 'suggestions', number> = { load: 0, compute: 0, store: 0, suggestions: 0 };

  constructor(
    private readonly runs: RunsRepository,
    private readonly inputs: RunInputsRepository,
    private readonly metrics: PageMetricsRepository,
    private readonly worker: AnalysisWorkerClient,
    private readonly suggestions: SuggestionsService,
  ) {}

  async execute(run: RunRow): Promise<{ finished: RunRow; suggestions: SuggestionWork }> {
    const started = performance.now();
    const settings: DocSetSettings = run.settings;
    const pages = await this.inputs.pages(run.snapshotId);
    const edgePairs = await this.inputs.edgePairs(run.snapshotId, pages.ids);
    const choice = chooseEntryPages(new Set(pages.paths), settings.entryPages, settings.indexFileNames);
    const positionOf = new Map(pages.paths.map((p, i) => [p, i]));
    const entries = choice.paths.map((p) => positionOf.get(p)!);
    const loaded = performance.now();
    const result = await this.worker.analyze({
      kind: 'analyze',
      pageIds: pages.ids.map(String),
      edgePairs,
      entries,
      settings: { damping: settings.damping, teleport: settings.teleport, depthThreshold: settings.depthThreshold },
    });
    const computed = performance.now();
    const warnings = [...choice.warnings, ...summaryWarnings(result, settings)];
    const [linkCounts, brokenCounts] = await Promise.all([
      this.inputs.linkStatusCounts(run.snapshotId),
      this.inputs.brokenLinkCounts(run.snapshotId),
    ]);
    await this.metrics.insertAll(run.id, pages, result, brokenCounts);
    await this.metrics.analyze();
    const stored = performance.now();
    this.lastPhases = { load: loaded - started, compute: computed - loaded, store: stored - computed, suggestions: 0 };
    const teleportEntries = result.summary.teleportUsed === 'entry-pages' ? entries : [];
    const context = {
      runId: run.id,
      snapshotId: run.snapshotId,
      pageIds: pages.ids,
      paths: pages.paths,
      scores: result.scores,
      edgePairs,
      damping: settings.damping,
      teleportEntries,
    };
    const { iterations, residual } = result.summary;
    const counts = runCounts(pages.ids.length, linkCounts, result.summary.counts);
    const finished = await this.runs.markFinished(run.id, {
      iterations,
      residual,
      durationMs: Math.round(performance.now() - started),
      counts,
      warnings,
    });
    return { finished, suggestions: { context, targets: needyPages(pages, result).slice(0, PRECOMPUTED_SUGGESTION_TARGETS) } };
  }

  /** Returns how many pages got their suggestions; stops early when `stop()` says so. */
  async precomputeSuggestions(work: SuggestionWork, stop: () => Promise<boolean> | boolean): Promise<number> {
    const started = performance.now();
    const done = await this.suggestions.compute(work.context, work.targets, SUGGESTION_BUDGET_MS, stop);
    this.lastPhases = { ...this.lastPhases, suggestions: performance.now() - started };
    return done;
  }

  async discardResults(runId: string): Promise<void> {
    await this.metrics.deleteRun(runId);
  }
}

function summaryWarnings(result: AnalyzeJobResult, settings: DocSetSettings): RunWarning[] {
  const warnings: RunWarning[] = [];
  if (!result.summary.converged) {
    warnings.push({
      code: 'SCORE_NOT_CONVERGED',
      message: `The stationary score did not settle within ${result.summary.iterations} iterations (last change ${result.summary.residual}).`,
    });
  }
  if (settings.teleport === 'entry-pages' && result.summary.teleportUsed === 'uniform') {
    warnings.push({
      code: 'TELEPORT_UNIFORM',
      message: 'Teleport was set to entry pages, but there is none; the uniform teleport was used.',
    });
  }
  return warnings;
}

/**
 * Positions of pages that need linking, most urgent first: unreachable, then orphan, then deep; among
 * equals the longer page first (more to lose when nobody finds it), then by path.
 */
export function needyPages(pages: SnapshotPages, result: AnalyzeJobResult): number[] {
  const urgency = (i: number) => {
    const f = result.flags[i];
    if ((f & FLAG_REACHABLE) === 0) return 3;
    if (f & FLAG_ORPHAN) return 2;
    return f & FLAG_DEEP ? 1 : 0;
  };
  const needy = pages.ids.map((_, i) => i).filter((i) => urgency(i) > 0);
  return needy.sort(
    (a, b) => urgency(b) - urgency(a) || pages.wordCounts[b] - pages.wordCounts[a] || (pages.paths[a] < pages.paths[b] ? -1 : 1),
  );
}
