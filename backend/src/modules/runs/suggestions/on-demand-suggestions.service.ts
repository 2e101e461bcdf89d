import { Injectable } from '@nestjs/common';
import { DbService } from '../../../db/db.service.js';
import type { RunRow } from '../../../db/schema/index.js';
import { chooseEntryPages } from '../analysis/entry-pages.js';
import { RunInputsRepository } from '../run-inputs.repository.js';
import { runScores, SuggestionsRepository } from './suggestions.repository.js';
import { SuggestionsService, type RunGraphContext } from './suggestions.service.js';

/** A single page needs no time budget beyond what one page's candidates cost. */
const ON_DEMAND_BUDGET_MS = 60_000;

/**
 * Suggestions for a page the run did not precompute: computed when the page detail first asks and stored
 * in link_suggestions, so later views read them. The run's graph is kept for the last run asked about,
 * because people tend to open several pages of the same run one after another.
 */
@Injectable()
export class OnDemandSuggestionsService {
  private cached: { runId: string; context: Promise<RunGraphContext> } | null = null;
  private readonly computedEmpty = new Set<string>();

  constructor(
    private readonly database: DbService,
    private readonly repository: SuggestionsRepository,
    private readonly inputs: RunInputsRepository,
    private readonly suggestions: SuggestionsService,
  ) {}

  async forPage(run: RunRow, pageId: number) {
    const stored = await this.repository.stored(run.id, pageId);
    const key = `${run.id}:${pageId}`;
    if (stored.length > 0 || this.computedEmpty.has(key)) return stored;
    const context = await this.context(run);
    const position = context.pageIds.indexOf(pageId);
    if (position < 0) return [];
    await this.suggestions.compute(context, [position], ON_DEMAND_BUDGET_MS);
    const computed = await this.repository.stored(run.id, pageId);
    if (computed.length === 0) this.computedEmpty.add(key);
    return computed;
  }

  private context(run: RunRow): Promise<RunGraphContext> {
    if (this.cached?.runId !== run.id) {
      const context = this.load(run);
      this.cached = { runId: run.id, context };
      context.catch(() => (this.cached = null));
    }
    return this.cached!.context;
  }

  private async load(run: RunRow): Promise<RunGraphContext> {
    const { pageIds, paths, scores } = await runScores(this.database, run.id);
    const edgePairs = await this.inputs.edgePairs(run.snapshotId, pageIds);
    // The teleport must be the one the run used: entry pages only when that was asked and some were found.
    const choice = chooseEntryPages(new Set(paths), run.settings.entryPages, run.settings.indexFileNames);
    const positionOf = new Map(paths.map((p, i) => [p, i]));
    const teleportEntries = run.settings.teleport === 'entry-pages' ? choice.paths.map((p) => positionOf.get(p)!) : [];
    return { runId: run.id, snapshotId: run.snapshotId, pageIds, paths, scores, edgePairs, damping: run.settings.damping, teleportEntries };
  }
}
