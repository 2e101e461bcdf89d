/**
 * Seeded synthetic documentation link graphs for the benchmark: a power-law in-degree (a few hub pages such
 * as an index or an API overview draw most links), about 5% dead ends, and a few islands that link only
 * among themselves. Page numbers are shuffled so hubs are spread over memory as in a real import.
 *
 * Method: a target of rank r is drawn as floor(M * u^3) with u uniform, which gives in-degrees proportional
 * to r^(-2/3), a Zipf-like law; sources are drawn uniformly from pages that are not dead ends.
 */
import { seededRandom } from '../testing/graph-fixtures.js';

export interface SyntheticGraph {
  readonly nodeCount: number;
  /** Interleaved [source, target] pairs, duplicates and self-links included as a crawler would report them. */
  readonly pairs: Int32Array;
}

const ISLANDS = 3;
const DEAD_END_SHARE = 0.05;

export function syntheticDocGraph(nodeCount: number, linkCount: number, seed = 1): SyntheticGraph {
  const random = seededRandom(seed);
  const islandSize = Math.max(4, Math.floor(nodeCount / 1000));
  const mainCount = nodeCount - ISLANDS * islandSize;
  const page = shuffledIdentity(nodeCount, random);
  const deadEnd = new Uint8Array(nodeCount);
  for (let r = 0; r < mainCount; r++) if (random() < DEAD_END_SHARE) deadEnd[r] = 1;
  const pairs = new Int32Array(2 * linkCount);
  const islandLinks = Math.floor((linkCount * islandSize) / nodeCount);
  let e = 0;
  for (let island = 0; island < ISLANDS; island++) {
    const first = mainCount + island * islandSize;
    for (let k = 0; k < islandLinks; k++, e += 2) {
      pairs[e] = page[first + Math.floor(random() * islandSize)];
      pairs[e + 1] = page[first + Math.floor(random() ** 3 * islandSize)];
    }
  }
  while (e < pairs.length) {
    let source: number;
    do source = Math.floor(random() * mainCount);
    while (deadEnd[source] === 1);
    pairs[e++] = page[source];
    pairs[e++] = page[Math.floor(random() ** 3 * mainCount)];
  }
  return { nodeCount, pairs };
}

/** Fisher-Yates shuffle of 0..n-1 (Knuth, TAOCP vol. 2, Algorithm 3.4.2P). */
function shuffledIdentity(n: number, random: () => number): Int32Array {
  const order = new Int32Array(n);
  for (let i = 0; i < n; i++) order[i] = i;
  for (let i = n - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    const swap = order[i];
    order[i] = order[j];
    order[j] = swap;
  }
  return order;
}
