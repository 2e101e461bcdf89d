/**
 * Weakly and strongly connected components.
 *
 * Weak: union-find with union by size and path halving (Tarjan, "Efficiency of a Good But Not Linear Set
 * Union Algorithm", JACM 22(2), 1975). Strong: Tarjan, "Depth-First Search and Linear Graph Algorithms",
 * SIAM J. Computing 1(2), 1972, run with an explicit call stack instead of recursion, so a chain of
 * 1,000,000 pages does not overflow the JavaScript stack.
 */
import type { LinkGraph } from '../build-graph.js';

export interface Components {
  /** Component number per node, 0..count-1, numbered in order of each component's lowest node. */
  readonly componentOf: Int32Array;
  readonly count: number;
}

export function weakComponents(graph: LinkGraph): Components {
  const n = graph.nodeCount;
  const parent = new Int32Array(n);
  const size = new Int32Array(n).fill(1);
  for (let u = 0; u < n; u++) parent[u] = u;
  const find = (node: number): number => {
    let u = node;
    while (parent[u] !== u) u = parent[u] = parent[parent[u]];
    return u;
  };
  for (let u = 0; u < n; u++) {
    for (let j = graph.outOffsets[u], end = graph.outOffsets[u + 1]; j < end; j++) {
      let a = find(u);
      let b = find(graph.outTargets[j]);
      if (a === b) continue;
      if (size[a] < size[b]) [a, b] = [b, a];
      parent[b] = a;
      size[a] += size[b];
    }
  }
  for (let u = 0; u < n; u++) parent[u] = find(u);
  return renumber(parent);
}

/** Turns arbitrary component labels into 0..count-1 in order of first appearance. */
function renumber(labels: Int32Array): Components {
  const n = labels.length;
  const numberOf = new Int32Array(n).fill(-1);
  const componentOf = new Int32Array(n);
  let count = 0;
  for (let u = 0; u < n; u++) {
    const label = labels[u];
    if (numberOf[label] === -1) numberOf[label] = count++;
    componentOf[u] = numberOf[label];
  }
  return { componentOf, count };
}

export function strongComponents(graph: LinkGraph): Components {
  const n = graph.nodeCount;
  const { outOffsets, outTargets } = graph;
  const order = new Int32Array(n).fill(-1); // discovery index
  const low = new Int32Array(n);
  const onStack = new Uint8Array(n);
  const stack = new Int32Array(n);
  const callNode = new Int32Array(n);
  const callCursor = new Int32Array(n);
  const label = new Int32Array(n);
  let stackSize = 0;
  let counter = 0;
  let found = 0;
  for (let root = 0; root < n; root++) {
    if (order[root] !== -1) continue;
    let depth = 0;
    const visit = (v: number): void => {
      order[v] = low[v] = counter++;
      stack[stackSize++] = v;
      onStack[v] = 1;
      callNode[depth] = v;
      callCursor[depth++] = outOffsets[v];
    };
    visit(root);
    while (depth > 0) {
      const v = callNode[depth - 1];
      const j = callCursor[depth - 1];
      if (j < outOffsets[v + 1]) {
        callCursor[depth - 1] = j + 1;
        const w = outTargets[j];
        if (order[w] === -1) visit(w);
        else if (onStack[w] === 1 && order[w] < low[v]) low[v] = order[w];
        continue;
      }
      depth--;
      if (low[v] === order[v]) {
        let w: number;
        do {
          w = stack[--stackSize];
          onStack[w] = 0;
          label[w] = found;
        } while (w !== v);
        found++;
      }
      if (depth > 0 && low[v] < low[callNode[depth - 1]]) low[callNode[depth - 1]] = low[v];
    }
  }
  return renumber(label);
}
