/**
 * Ranking of full-text matches by text relevance and link structure.
 *
 * blend: score = (textRank / best textRank)^TEXT_WEIGHT * timesAverage^LINK_WEIGHT. Text relevance is
 *   PostgreSQL's cover-density rank (ts_rank_cd) scaled to the best match; the link part is the page's
 *   stationary score as "times the average", damped by the exponent so a hub page does not outrank a
 *   page that is about the words asked for (a 16x hub gains a factor 2).
 * subgraph: the stationary score computed on the link graph among the matching pages only, which is the
 *   query-time use the method was proposed for (Brin and Page 1998, ranking the pages that match a query
 *   by their link structure), with the run's damping factor and a uniform teleport.
 */
import { buildLinkGraph, computeStationaryScore, inDegree } from '@linkloom/shared/graph';

export const TEXT_WEIGHT = 1;
export const LINK_WEIGHT = 0.25;
export const BLEND_EXPLANATION =
  `score = (textRank / best textRank)^${TEXT_WEIGHT} x timesAverage^${LINK_WEIGHT}: text relevance (PostgreSQL ts_rank_cd) scaled to the best match, ` +
  'times the page\'s stationary score as "times the average", damped so that link weight refines rather than overrides the text match.';
export const SUBGRAPH_EXPLANATION =
  'score = stationary score computed on the link graph among the matching pages only (same damping as the run, uniform teleport); ' +
  'pages that other matching pages link to rank first. Ties are broken by text relevance.';

export interface Match {
  pageId: number;
  path: string;
  title: string;
  textRank: number;
  stationaryScore: number;
  timesAverage: number;
}

export interface RankedMatch extends Match {
  score: number;
  why: string;
}

export function blendRank(matches: readonly Match[]): RankedMatch[] {
  const best = Math.max(0, ...matches.map((m) => m.textRank));
  return matches
    .map((m) => {
      const text = best > 0 ? m.textRank / best : 0;
      const score = text ** TEXT_WEIGHT * m.timesAverage ** LINK_WEIGHT;
      const why = `text match ${text.toFixed(2)} of the best, link score ${m.timesAverage.toFixed(2)}x the average`;
      return { ...m, score, why };
    })
    .sort(byScoreThenText);
}

export function subgraphRank(matches: readonly Match[], edges: readonly (readonly [number, number])[], damping: number): RankedMatch[] {
  const ids = matches.map((m) => String(m.pageId));
  const { graph } = buildLinkGraph(
    ids,
    edges.map(([s, t]) => [String(s), String(t)] as const),
  );
  const { scores } = computeStationaryScore(graph, { damping });
  return matches
    .map((m, i) => {
      const linkedFrom = inDegree(graph, i);
      const why = `linked from ${linkedFrom} of the ${matches.length} matching pages; ${(scores[i] * matches.length).toFixed(2)}x the average among them`;
      return { ...m, score: scores[i], why };
    })
    .sort(byScoreThenText);
}

function byScoreThenText(a: RankedMatch, b: RankedMatch): number {
  return b.score - a.score || b.textRank - a.textRank || (a.path < b.path ? -1 : a.path > b.path ? 1 : 0);
}
