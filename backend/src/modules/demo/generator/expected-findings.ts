/**
 * The generator's own model of the link graph, from which the expected findings are derived: breadth-first
 * search for click depth and reachability (Cormen et al., "Introduction to Algorithms", 3rd ed., section 22.2),
 * in/out sets for orphans and dead ends, and weakly connected components (union-find over undirected edges)
 * for islands. Definitions follow docs/metrics.md and docs/link-rules.md; it deliberately does not call the product's resolver.
 */
import type { ExpectedFindings, LinkFinding, LinkStatus, PagePlan, RenderedLink } from './types.js';

export interface GraphModel {
  pages: string[];
  edges: Map<string, Set<string>>;
}

/** Page-to-page edges; `extraStatuses` lets a test check that redirected or broken-anchor links change nothing. */
export function buildGraph(pages: readonly string[], links: readonly RenderedLink[], extraStatuses: LinkStatus[] = []): GraphModel {
  const edges = new Map(pages.map((p) => [p, new Set<string>()]));
  const counted = new Set<LinkStatus>(['page', ...extraStatuses]);
  for (const l of links) {
    if (counted.has(l.status) && l.target && l.target !== l.source && edges.has(l.target)) edges.get(l.source)?.add(l.target);
  }
  return { pages: [...pages], edges };
}

export function clickDepths(graph: GraphModel, entryPages: readonly string[]): Map<string, number> {
  const depth = new Map(entryPages.map((p) => [p, 0]));
  const queue = [...entryPages];
  for (let head = 0; head < queue.length; head++) {
    const u = queue[head]!;
    for (const v of graph.edges.get(u) ?? []) {
      if (!depth.has(v)) {
        depth.set(v, depth.get(u)! + 1);
        queue.push(v);
      }
    }
  }
  return depth;
}

export function weakComponents(graph: GraphModel): string[][] {
  const parent = new Map(graph.pages.map((p) => [p, p]));
  const find = (x: string): string => {
    while (parent.get(x) !== x) {
      parent.set(x, parent.get(parent.get(x)!)!);
      x = parent.get(x)!;
    }
    return x;
  };
  for (const [u, targets] of graph.edges) for (const v of targets) parent.set(find(u), find(v));
  const groups = new Map<string, string[]>();
  for (const p of graph.pages) groups.set(find(p), [...(groups.get(find(p)) ?? []), p]);
  return [...groups.values()].map((g) => g.sort());
}

const finding = (l: RenderedLink): LinkFinding => ({ sourcePath: l.source, href: l.href, line: l.line });

export function expectedFindings(
  pages: readonly PagePlan[],
  links: readonly RenderedLink[],
  entryPages: string[],
  depthThreshold = 3,
  graph?: GraphModel,
): ExpectedFindings {
  const g =
    graph ??
    buildGraph(
      pages.map((p) => p.path),
      links,
    );
  const inbound = new Map(g.pages.map((p) => [p, 0]));
  for (const targets of g.edges.values()) for (const v of targets) inbound.set(v, inbound.get(v)! + 1);
  const depth = clickDepths(g, entryPages);
  const entrySet = new Set(entryPages);
  const byStatus = (s: LinkStatus) => links.filter((l) => l.status === s).map(finding);
  const sorted = (xs: string[]) => [...xs].sort();
  return {
    entryPages,
    brokenLinks: byStatus('broken'),
    brokenAnchors: byStatus('broken-anchor'),
    brokenAssets: byStatus('broken-asset'),
    unsafe: byStatus('unsafe'),
    ambiguous: byStatus('ambiguous'),
    redirected: links.filter((l) => l.status === 'redirected').map((l) => ({ ...finding(l), target: l.target })),
    outOfScope: byStatus('out-of-scope'),
    orphans: sorted(g.pages.filter((p) => !entrySet.has(p) && inbound.get(p) === 0)),
    deadEnds: sorted(g.pages.filter((p) => g.edges.get(p)!.size === 0)),
    unreachable: sorted(g.pages.filter((p) => !depth.has(p))),
    deepPages: sorted(g.pages.filter((p) => (depth.get(p) ?? -1) > depthThreshold)),
    islands: weakComponents(g)
      .filter((c) => !c.some((p) => entrySet.has(p)))
      .sort((a, b) => (a[0]! < b[0]! ? -1 : 1)),
  };
}
