/**
 * Islands: weakly connected components other than the one(s) holding the entry pages (docs/metrics.md,
 * "Metrics"). Without entry pages the largest weak component stands in for the main site, so a doc set
 * without configured entry pages still gets its stray clusters reported rather than every page flagged.
 */
/**
 * 0 for the weak component(s) holding entry pages (or, without entry pages, the largest one), else 1, 2, ...
 * in order of each island's lowest page index.
 */
export function islandNumbers(componentOf: Int32Array, entries: readonly number[]): Int32Array {
  const componentCount = componentOf.reduce((max, c) => Math.max(max, c + 1), 0);
  const mainland = new Uint8Array(componentCount);
  if (entries.length > 0) for (const e of entries) mainland[componentOf[e]] = 1;
  else if (componentCount > 0) mainland[largestComponent(componentOf, componentCount)] = 1;
  const islandId = new Int32Array(componentCount);
  let next = 1;
  for (let c = 0; c < componentCount; c++) islandId[c] = mainland[c] ? 0 : next++;
  return componentOf.map((c) => islandId[c]);
}

function largestComponent(componentOf: Int32Array, componentCount: number): number {
  const size = new Int32Array(componentCount);
  for (const c of componentOf) size[c]++;
  let best = 0;
  for (let c = 1; c < componentCount; c++) if (size[c] > size[best]) best = c;
  return best;
}
