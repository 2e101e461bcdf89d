import { Injectable } from '@nestjs/common';
import { AnalysisWorkerClient } from '../analysis/analysis-worker-client.js';
import {
  bestSuggestions,
  candidateSources,
  folderIndex,
  folderOf,
  MENTION_CANDIDATES,
  type SuggestionReason,
} from './suggestion-candidates.js';
import { SuggestionsRepository } from './suggestions.repository.js';

/** Targets per worker call: the worker starts once per batch and the stop check runs between batches. */
const BATCH_TARGETS = 10;

/** What the gain computation needs about one run, in page-position order. */
export interface RunGraphContext {
  runId: string;
  snapshotId: string;
  pageIds: readonly number[];
  paths: readonly string[];
  scores: Float64Array;
  edgePairs: Int32Array;
  damping: number;
  /** Positions carrying the teleport weight; empty = uniform (as the run used it). */
  teleportEntries: readonly number[];
}

/**
 * Suggested source pages for pages that need links, ranked by the score gain a link from each would bring,
 * recomputed by warm-started power iteration (one per candidate). That costs tens of full passes over the
 * link graph per candidate (about 0.3 s per needy page at 10,000 pages / 300,000 links, measured), so at
 * 100,000 pages it cannot be done for every needy page of every run. A finished run therefore precomputes
 * the N most urgent pages in the background, within a time budget (stored in link_suggestions), and the
 * page detail computes any other page on demand, caching the answer in the same table.
 */
@Injectable()
export class SuggestionsService {
  constructor(
    private readonly repository: SuggestionsRepository,
    private readonly worker: AnalysisWorkerClient,
  ) {}

  /**
   * Computes and stores suggestions target by target, in batches, until done, out of time or `stop()`
   * says a newer run or a shutdown wants the thread. Returns how many targets were computed.
   */
  async compute(
    context: RunGraphContext,
    targets: readonly number[],
    budgetMs: number,
    stop: () => Promise<boolean> | boolean = () => false,
  ): Promise<number> {
    const started = performance.now();
    const folders = folderIndex(context.paths, context.scores);
    const position = new Map(context.pageIds.map((id, i) => [id, i]));
    let done = 0;
    while (done < targets.length && performance.now() - started < budgetMs && !(await stop())) {
      const batch = targets.slice(done, done + BATCH_TARGETS);
      await this.computeBatch(context, batch, folders, position);
      done += batch.length;
    }
    return done;
  }

  private async computeBatch(
    context: RunGraphContext,
    targets: readonly number[],
    folders: Map<string, number[]>,
    position: Map<number, number>,
  ): Promise<void> {
    const names = await this.repository.namesOf(targets.map((t) => context.pageIds[t]));
    const asked: { target: number; sources: number[]; reasons: Map<number, SuggestionReason> }[] = [];
    for (const target of targets) {
      const phrases = names.get(context.pageIds[target]) ?? [];
      const mentions = await this.repository.unlinkedMentions(context.snapshotId, context.pageIds[target], phrases, MENTION_CANDIDATES);
      const reasons = candidateSources(
        target,
        mentions.flatMap((m) => (position.has(m.id) ? [position.get(m.id)!] : [])),
        folders.get(folderOf(context.paths[target])) ?? [],
      );
      asked.push({ target, sources: [...reasons.keys()], reasons });
    }
    const { gains } = await this.worker.gains({
      kind: 'gains',
      pageCount: context.pageIds.length,
      edgePairs: context.edgePairs,
      scores: context.scores,
      damping: context.damping,
      teleportEntries: context.teleportEntries,
      targets: asked.map(({ target, sources }) => ({ target, sources })),
      budgetMs: Number.POSITIVE_INFINITY,
    });
    for (let k = 0; k < gains.length; k++) {
      const { target, sources, reasons } = asked[k];
      const best = bestSuggestions(sources, gains[k], reasons);
      await this.repository.store(
        context.runId,
        context.pageIds[target],
        best.map((s) => ({ sourcePageId: context.pageIds[s.source], scoreGain: s.gain, reason: s.reason })),
      );
    }
  }
}
