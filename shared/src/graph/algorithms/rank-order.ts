/**
 * Rank of each page by stationary score: 1 = highest.
 *
 * Scores that agree to 12 significant digits count as equal, because the power iteration is only accurate
 * to about its tolerance and two symmetric pages can differ in the last bits from summation order. Equal
 * scores are ordered by page id (code-unit order), so every page gets a distinct, reproducible rank.
 */
export function rankByScore(scores: Float64Array, pageIds: readonly string[]): Int32Array {
  const n = scores.length;
  const keys = new Float64Array(n);
  for (let i = 0; i < n; i++) keys[i] = Number(scores[i].toPrecision(12));
  const order = Array.from({ length: n }, (_, i) => i);
  order.sort((a, b) => keys[b] - keys[a] || compareIds(pageIds[a], pageIds[b]));
  const rank = new Int32Array(n);
  for (let position = 0; position < n; position++) rank[order[position]] = position + 1;
  return rank;
}

function compareIds(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
