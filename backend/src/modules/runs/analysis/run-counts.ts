import type { LinkGraphSummary } from '@linkloom/shared/graph';
import type { RunCounts } from '../../../db/schema/runs.js';

/** Links of a snapshot counted by status (and whether the target is an asset). */
export interface LinkStatusCount {
  status: string;
  targetIsAsset: boolean;
  count: number;
}

/**
 * The run summary: link findings come straight from the import's link statuses, page findings from the
 * graph analysis. A broken link to an image or PDF is a broken asset, counted apart from broken page links.
 */
export function runCounts(pageCount: number, links: readonly LinkStatusCount[], graph: LinkGraphSummary['counts']): RunCounts {
  const sum = (pick: (l: LinkStatusCount) => boolean) => links.filter(pick).reduce((total, l) => total + l.count, 0);
  return {
    pages: pageCount,
    links: sum(() => true),
    internalLinks: sum((l) => l.status !== 'external' && l.status !== 'out-of-scope' && l.status !== 'unsafe'),
    externalLinks: sum((l) => l.status === 'external'),
    brokenLinks: sum((l) => l.status === 'broken' && !l.targetIsAsset),
    brokenAnchors: sum((l) => l.status === 'broken-anchor'),
    brokenAssets: sum((l) => l.status === 'broken' && l.targetIsAsset),
    unsafeLinks: sum((l) => l.status === 'unsafe'),
    ambiguousLinks: sum((l) => l.status === 'ambiguous'),
    redirectedLinks: sum((l) => l.status === 'redirected'),
    outOfScopeLinks: sum((l) => l.status === 'out-of-scope'),
    orphans: graph.orphans,
    deadEnds: graph.deadEnds,
    unreachable: graph.unreachable,
    deepPages: graph.deepPages,
    islands: graph.islands,
  };
}
