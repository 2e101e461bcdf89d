import { buildLinkGraph, computeStationaryScore } from '@linkloom/shared/graph';
import type { FixtureLink } from './snapshot-writer.js';

/**
 * Scores recomputed from scratch (cold start, tight tolerance) from a fixture's resolved links, optionally
 * with one extra link: the independent check of what a run stored and of a suggestion's score gain.
 */
export function referenceScores(
  paths: readonly string[],
  links: readonly FixtureLink[],
  damping: number,
  extra?: [string, string],
): Map<string, number> {
  const edges = links
    .filter((l) => l.to && (l.status ?? 'ok') !== 'broken-anchor' && ['ok', 'redirected'].includes(l.status ?? 'ok'))
    .map((l) => [l.from, l.to!] as const);
  const { graph } = buildLinkGraph(paths, extra ? [...edges, extra] : edges);
  const { scores } = computeStationaryScore(graph, { damping, tolerance: 1e-14, maxIterations: 100_000 });
  return new Map(paths.map((p, i) => [p, scores[i]]));
}
