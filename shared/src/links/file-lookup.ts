/**
 * Target lookup of docs/link-rules.md rule 5: the exact file; without a page extension each configured extension;
 * `.html`/`.htm` mapped to the Markdown source; a folder (or trailing `/`) to its index files in order,
 * then a page of the folder's name. Letter case is ignored only when the doc set says so.
 */
import { extensionOf, withoutExtension } from './page-paths.js';
import type { TargetIndex } from './target-index.js';

export type Lookup = { found: true; path: string; caseMismatch: boolean } | { found: false; ambiguous: string[]; caseHint: string | null };

export function candidatePaths(path: string, index: TargetIndex): string[] {
  const { extensions, indexFileNames } = index.settings;
  if (path === '' || path.endsWith('/')) {
    const folder = path;
    const named = folder === '' ? [] : extensions.map((e) => folder.slice(0, -1) + e);
    return [...indexFileNames.map((n) => folder + n), ...named];
  }
  const ext = extensionOf(path);
  const tries = [path];
  if (ext === '.html' || ext === '.htm') {
    const stem = withoutExtension(path);
    tries.push(...extensions.map((e) => stem + e));
    const slash = stem.lastIndexOf('/');
    if (stem.slice(slash + 1).toLowerCase() === 'index') tries.push(...indexFileNames.map((n) => stem.slice(0, slash + 1) + n));
  } else if (!index.isPageExtension(ext)) {
    tries.push(...extensions.map((e) => path + e));
    tries.push(...indexFileNames.map((n) => path + '/' + n));
  }
  return tries;
}

export function lookupFile(path: string, index: TargetIndex): Lookup {
  const tries = candidatePaths(path, index);
  for (const candidate of tries) if (index.files.has(candidate)) return { found: true, path: candidate, caseMismatch: false };
  for (const candidate of tries) {
    const matches = index.find(candidate);
    if (matches.length === 0) continue;
    if (!index.settings.caseInsensitive) return { found: false, ambiguous: [], caseHint: matches[0]!.path };
    if (matches.length > 1) return { found: false, ambiguous: matches.map((m) => m.path).sort(), caseHint: null };
    return { found: true, path: matches[0]!.path, caseMismatch: true };
  }
  return { found: false, ambiguous: [], caseHint: null };
}
