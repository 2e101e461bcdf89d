/**
 * Islands as defined in docs/metrics.md ("Islands" and "Isolated pages"): a weakly connected component of two
 * or more pages that holds no entry page. A component of one page has no link in or out at all; that page is
 * an isolated page, listed on its own, never an island. Without entry pages the largest weak component
 * stands in for the main site, so a doc set without entry pages still gets its stray groups reported.
 */
/**
 * 0 for the weak component(s) holding entry pages (or, without entry pages, the largest one) and for
 * single-page components, else 1, 2, ... in order of each island's lowest page index.
 */
export function islandNumbers(componentOf: Int32Array, entries: readonly number[]): Int32Array {
  const componentCount = componentOf.reduce((max, c) => Math.max(max, c + 1), 0);
  const size = componentSizes(componentOf, componentCount);
  const mainland = new Uint8Array(componentCount);
  if (entries.length > 0) for (const e of entries) mainland[componentOf[e]] = 1;
  else if (componentCount > 0) mainland[largestComponent(size)] = 1;
  const islandId = new Int32Array(componentCount);
  let next = 1;
  for (let c = 0; c < componentCount; c++) islandId[c] = mainland[c] || size[c] < 2 ? 0 : next++;
  return componentOf.map((c) => islandId[c]);
}

function componentSizes(componentOf: Int32Array, componentCount: number): Int32Array {
  const size = new Int32Array(componentCount);
  for (const c of componentOf) size[c]++;
  return size;
}

function largestComponent(size: Int32Array): number {
  let best = 0;
  for (let c = 1; c < size.length; c++) if (size[c] > size[best]) best = c;
  return best;
}
