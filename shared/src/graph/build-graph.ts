/**
 * Link graph in compressed sparse row (CSR) form, built once from (source, target) pairs.
 *
 * Method: counting sort (bucket sort on integer keys) by source, then each short row sorted in place so
 * duplicate links sit side by side and merge in one sweep; a second counting sort by target gives the
 * in-rows, already ordered by source. CSR storage as in Saad, "Iterative Methods for Sparse Linear Systems", 2nd ed., 2003, section 3.4.
 * No JavaScript object is made per edge, so 10,000,000 links fit in a few flat Int32Arrays.
 */

/** Pages 0..nodeCount-1; out-row of u is outTargets[outOffsets[u] .. outOffsets[u+1]), sorted, no duplicates. */
export interface LinkGraph {
  readonly nodeCount: number;
  /** Distinct edges after merging duplicates and dropping self-links. */
  readonly edgeCount: number;
  readonly outOffsets: Int32Array;
  readonly outTargets: Int32Array;
  /** In-row of v: inSources[inOffsets[v] .. inOffsets[v+1]), sorted by source. */
  readonly inOffsets: Int32Array;
  readonly inSources: Int32Array;
}

/** A link between two pages, by page id. */
export type LinkPair = readonly [source: string, target: string] | { readonly source: string; readonly target: string };

export interface IndexedLinkGraph {
  readonly graph: LinkGraph;
  readonly pageIds: readonly string[];
  readonly indexOf: ReadonlyMap<string, number>;
  /** Links whose source or target is not among the page ids (e.g. broken links); they are not edges. */
  readonly skippedLinks: number;
}

/** Maps page ids to dense integers 0..N-1 (in the given order) and builds the CSR graph of the links. */
export function buildLinkGraph(pageIds: readonly string[], links: readonly LinkPair[]): IndexedLinkGraph {
  const indexOf = new Map<string, number>();
  for (const id of pageIds) {
    if (indexOf.has(id)) throw new Error(`duplicate page id: ${id}`);
    indexOf.set(id, indexOf.size);
  }
  const pairs = new Int32Array(links.length * 2);
  let kept = 0;
  for (const link of links) {
    const [source, target] = Array.isArray(link) ? link : [(link as { source: string }).source, (link as { target: string }).target];
    const s = indexOf.get(source);
    const t = indexOf.get(target);
    if (s === undefined || t === undefined) continue;
    pairs[2 * kept] = s;
    pairs[2 * kept + 1] = t;
    kept++;
  }
  const graph = buildGraphFromEdgePairs(pageIds.length, pairs.subarray(0, 2 * kept));
  return { graph, pageIds, indexOf, skippedLinks: links.length - kept };
}

/**
 * Builds the CSR graph from interleaved pairs [s0, t0, s1, t1, ...] of node numbers in [0, nodeCount).
 * Self-links are dropped and duplicate links merged into one edge.
 */
export function buildGraphFromEdgePairs(nodeCount: number, pairs: Int32Array): LinkGraph {
  if (!Number.isInteger(nodeCount) || nodeCount < 0) throw new RangeError(`bad node count: ${nodeCount}`);
  if (pairs.length % 2 !== 0) throw new RangeError('edge pairs must have an even length');
  const { starts, targets: raw } = bucketTargetsBySource(nodeCount, pairs);
  const outOffsets = sortAndMergeRows(nodeCount, starts, raw);
  const edgeCount = outOffsets[nodeCount];
  // A view, not a copy: the few merged duplicates leave unused space at the end of the buffer.
  const outTargets = raw.subarray(0, edgeCount);
  const inOffsets = new Int32Array(nodeCount + 1);
  for (let j = 0; j < edgeCount; j++) inOffsets[outTargets[j] + 1]++;
  for (let v = 0; v < nodeCount; v++) inOffsets[v + 1] += inOffsets[v];
  // Visiting sources in ascending order leaves every in-row sorted by source.
  const inSources = new Int32Array(edgeCount);
  const cursor = inOffsets.slice(0, nodeCount);
  for (let u = 0; u < nodeCount; u++) {
    for (let j = outOffsets[u], end = outOffsets[u + 1]; j < end; j++) inSources[cursor[outTargets[j]]++] = u;
  }
  return { nodeCount, edgeCount, outOffsets, outTargets, inOffsets, inSources };
}

/** Counting sort by source: row u of `targets` is targets[starts[u] .. starts[u+1]) (self-links dropped). */
function bucketTargetsBySource(n: number, pairs: Int32Array): { starts: Int32Array; targets: Int32Array } {
  const starts = new Int32Array(n + 1);
  let kept = 0;
  for (let e = 0; e < pairs.length; e += 2) {
    const s = pairs[e];
    const t = pairs[e + 1];
    if (!(s >= 0 && s < n && t >= 0 && t < n)) throw new RangeError(`edge ${s}->${t} outside 0..${n - 1}`);
    if (s !== t) {
      starts[s + 1]++;
      kept++;
    }
  }
  for (let u = 0; u < n; u++) starts[u + 1] += starts[u];
  const targets = new Int32Array(kept);
  const cursor = starts.slice(0, n);
  for (let e = 0; e < pairs.length; e += 2) {
    if (pairs[e] !== pairs[e + 1]) targets[cursor[pairs[e]]++] = pairs[e + 1];
  }
  return { starts, targets };
}

/**
 * Sorts each row (insertion sort for the short rows that dominate link graphs, the engine's numeric sort
 * for long ones), then merges duplicates while compacting rows to the front. Returns the new offsets.
 */
function sortAndMergeRows(n: number, starts: Int32Array, targets: Int32Array): Int32Array {
  const offsets = new Int32Array(n + 1);
  let write = 0;
  for (let u = 0; u < n; u++) {
    const begin = starts[u];
    const end = starts[u + 1];
    if (end - begin > 32) targets.subarray(begin, end).sort();
    else insertionSort(targets, begin, end);
    offsets[u] = write;
    let previous = -1;
    for (let j = begin; j < end; j++) {
      if (targets[j] !== previous) targets[write++] = previous = targets[j];
    }
  }
  offsets[n] = write;
  return offsets;
}

function insertionSort(values: Int32Array, begin: number, end: number): void {
  for (let i = begin + 1; i < end; i++) {
    const value = values[i];
    let j = i - 1;
    while (j >= begin && values[j] > value) {
      values[j + 1] = values[j];
      j--;
    }
    values[j + 1] = value;
  }
}

/** Out-degree of a node (distinct linked pages). */
export function outDegree(graph: LinkGraph, node: number): number {
  return graph.outOffsets[node + 1] - graph.outOffsets[node];
}

/** In-degree of a node (distinct linking pages). */
export function inDegree(graph: LinkGraph, node: number): number {
  return graph.inOffsets[node + 1] - graph.inOffsets[node];
}

/** True when the edge source->target exists (binary search in the sorted out-row). */
export function hasEdge(graph: LinkGraph, source: number, target: number): boolean {
  let low = graph.outOffsets[source];
  let high = graph.outOffsets[source + 1] - 1;
  while (low <= high) {
    const mid = (low + high) >>> 1;
    const value = graph.outTargets[mid];
    if (value === target) return true;
    if (value < target) low = mid + 1;
    else high = mid - 1;
  }
  return false;
}
