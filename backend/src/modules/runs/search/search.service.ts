import { Injectable } from '@nestjs/common';
import type { RunRow } from '../../../db/schema/index.js';
import { blendRank, BLEND_EXPLANATION, subgraphRank, SUBGRAPH_EXPLANATION } from './ranked-search.js';
import { SearchRepository } from './search.repository.js';

/** Matches ranked at most: enough for any real query, small enough for a query-time power iteration. */
export const SEARCH_MATCH_CAP = 2_000;

@Injectable()
export class SearchService {
  constructor(private readonly repository: SearchRepository) {}

  async search(run: RunRow, query: { q: string; mode: 'blend' | 'subgraph'; page: number; pageSize: number }) {
    const matches = await this.repository.matches(run.id, run.snapshotId, query.q, SEARCH_MATCH_CAP);
    const ranked =
      query.mode === 'blend'
        ? blendRank(matches)
        : subgraphRank(
            matches,
            await this.repository.edgesAmong(
              run.snapshotId,
              matches.map((m) => m.pageId),
            ),
            run.settings.damping,
          );
    const shown = ranked.slice((query.page - 1) * query.pageSize, query.page * query.pageSize);
    const snippets = await this.repository.snippets(
      shown.map((m) => m.pageId),
      query.q,
    );
    const items = shown.map((m) => ({
      path: m.path,
      title: m.title,
      snippet: snippets.get(m.pageId) ?? '',
      textRank: m.textRank,
      stationaryScore: m.stationaryScore,
      score: m.score,
      why: m.why,
    }));
    return {
      items,
      total: ranked.length,
      page: query.page,
      pageSize: query.pageSize,
      mode: query.mode,
      capped: matches.length >= SEARCH_MATCH_CAP,
      explanation: query.mode === 'blend' ? BLEND_EXPLANATION : SUBGRAPH_EXPLANATION,
    };
  }
}
