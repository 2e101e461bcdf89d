/**
 * The pages around one page, up to two link steps away in either direction, for the page detail's graph
 * view. Big hubs would make this thousands of nodes, so only the highest-score ones are kept (the page
 * itself always stays); edges are those among the kept nodes.
 */
export const NEIGHBOURHOOD_NODES = 150;

/** Steps from the centre following links either way, for the pages within two steps. */
export function distancesFrom(
  centre: number,
  firstStep: readonly [number, number][],
  secondStep: readonly [number, number][],
): Map<number, number> {
  const distance = new Map<number, number>([[centre, 0]]);
  for (const [s, t] of firstStep) for (const node of [s, t]) if (!distance.has(node)) distance.set(node, 1);
  for (const [s, t] of secondStep) {
    const near = (distance.get(s) ?? 9) <= 1 || (distance.get(t) ?? 9) <= 1;
    if (!near) continue;
    for (const node of [s, t]) if (!distance.has(node)) distance.set(node, 2);
  }
  return distance;
}

/** Keeps the centre and the highest-score others, up to `limit` nodes. */
export function keepTopNodes(centre: number, scores: ReadonlyMap<number, number>, limit = NEIGHBOURHOOD_NODES): Set<number> {
  const others = [...scores.keys()].filter((id) => id !== centre).sort((a, b) => scores.get(b)! - scores.get(a)! || a - b);
  return new Set([centre, ...others.slice(0, limit - 1)]);
}
