/** "Did you mean" hints for broken links: Levenshtein edit distance (Levenshtein 1966), bounded. */
export function editDistance(a: string, b: string, limit: number): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    let rowMin = i;
    for (let j = 1; j <= b.length; j++) {
      const cost = a[i - 1] === b[j - 1] ? 0 : 1;
      current[j] = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + cost);
      rowMin = Math.min(rowMin, current[j]!);
    }
    if (rowMin > limit) return limit + 1;
    previous = current;
  }
  return previous[b.length]!;
}

/** The closest candidate within a third of the wanted length (at least 1, at most 4 edits), or null. */
export function closest(wanted: string, candidates: Iterable<string>): string | null {
  const limit = Math.min(4, Math.max(1, Math.floor(wanted.length / 3)));
  let best: string | null = null;
  let bestDistance = limit + 1;
  for (const candidate of candidates) {
    const d = editDistance(wanted.toLowerCase(), candidate.toLowerCase(), limit);
    if (d < bestDistance) {
      best = candidate;
      bestDistance = d;
    }
  }
  return best;
}
