/**
 * Where suggested source pages come from: pages that already mention the target (unlinked mentions, the
 * strongest hint a writer would act on) and the highest-score pages of the target's own folder (a link from
 * a well-read neighbour is the usual fix for a stranded page). Ranking happens afterwards, by score gain.
 */
export const MENTION_CANDIDATES = 12;
export const FOLDER_CANDIDATES = 8;
export const SUGGESTIONS_PER_PAGE = 10;

export type SuggestionReason = 'unlinked-mention' | 'same-folder';

export function folderOf(path: string): string {
  const slash = path.lastIndexOf('/');
  return slash < 0 ? '' : path.slice(0, slash);
}

/** Page positions grouped by folder, each group by descending score. */
export function folderIndex(paths: readonly string[], scores: ArrayLike<number>): Map<string, number[]> {
  const byFolder = new Map<string, number[]>();
  paths.forEach((path, i) => {
    const folder = folderOf(path);
    const group = byFolder.get(folder);
    if (group) group.push(i);
    else byFolder.set(folder, [i]);
  });
  for (const group of byFolder.values()) group.sort((a, b) => scores[b] - scores[a] || a - b);
  return byFolder;
}

/** Candidate sources of one target with their reason; a mention wins over a folder neighbour. */
export function candidateSources(
  target: number,
  mentions: readonly number[],
  folderGroup: readonly number[],
): Map<number, SuggestionReason> {
  const candidates = new Map<number, SuggestionReason>();
  for (const m of mentions) if (m !== target) candidates.set(m, 'unlinked-mention');
  let added = 0;
  for (const neighbour of folderGroup) {
    if (added >= FOLDER_CANDIDATES) break;
    if (neighbour === target || candidates.has(neighbour)) continue;
    candidates.set(neighbour, 'same-folder');
    added++;
  }
  return candidates;
}

/** The best suggestions: positive gains only (an existing link or a self-link gains nothing), largest first. */
export function bestSuggestions(sources: readonly number[], gains: readonly number[], reasons: ReadonlyMap<number, SuggestionReason>) {
  return sources
    .map((source, k) => ({ source, gain: gains[k], reason: reasons.get(source)! }))
    .filter((s) => s.gain > 0)
    .sort((a, b) => b.gain - a.gain || a.source - b.source)
    .slice(0, SUGGESTIONS_PER_PAGE);
}
