/**
 * Click depth from entry pages.
 *
 * Method: multi-source breadth-first search (Cormen, Leiserson, Rivest and Stein, "Introduction to
 * Algorithms", 3rd ed., section 22.2), all entry pages at depth 0, over out-links; a flat Int32Array queue.
 */
import type { LinkGraph } from '../build-graph.js';

/** Shortest link path length from the nearest entry page; -1 where no entry page reaches the page. */
export function computeClickDepth(graph: LinkGraph, entryNodes: ArrayLike<number>): Int32Array {
  const n = graph.nodeCount;
  const depth = new Int32Array(n).fill(-1);
  const queue = new Int32Array(n);
  let tail = 0;
  for (let i = 0; i < entryNodes.length; i++) {
    const entry = entryNodes[i];
    if (!(entry >= 0 && entry < n)) throw new RangeError(`entry node ${entry} outside 0..${n - 1}`);
    if (depth[entry] === -1) {
      depth[entry] = 0;
      queue[tail++] = entry;
    }
  }
  const { outOffsets, outTargets } = graph;
  for (let head = 0; head < tail; head++) {
    const u = queue[head];
    const nextDepth = depth[u] + 1;
    for (let j = outOffsets[u], end = outOffsets[u + 1]; j < end; j++) {
      const v = outTargets[j];
      if (depth[v] === -1) {
        depth[v] = nextDepth;
        queue[tail++] = v;
      }
    }
  }
  return depth;
}
