/**
 * Wiki-link resolution of docs/link-rules.md rule 6 (a note-taking convention, common practice), case-insensitive, in
 * order: path from the doc-set root, path from the source page's folder, pages whose path ends with the given
 * path, a unique file name, then front-matter titles and aliases. Several matches at one step are reported
 * as ambiguous with the candidates, never guessed.
 */
import { checkAnchor } from './anchors.js';
import { extensionOf, withoutExtension } from './page-paths.js';
import { removeDotSegments } from './rfc3986.js';
import type { TargetIndex } from './target-index.js';
import type { RawLink } from './types.js';
import { outcome, type Outcome } from './outcome.js';
import { fileExtension } from './wiki-syntax.js';

interface Step {
  name: string;
  matches: string[];
}

function keyOf(path: string, asset: boolean): string {
  return (asset ? path : withoutExtension(path)).toLowerCase();
}

/** `Setup.md` and `Setup` name the same page, but `Release 1.2` keeps its dot. */
function targetKey(index: TargetIndex, target: string, asset: boolean): string {
  const clean = target.replace(/^\/+/, '');
  return asset || !index.isPageExtension(extensionOf(clean)) ? clean.toLowerCase() : keyOf(clean, false);
}

function steps(index: TargetIndex, sourcePath: string, target: string, asset: boolean): Step[] {
  const suffixes = asset ? index.assetSuffixes : index.pageSuffixes;
  const key = targetKey(index, target, asset);
  const folder = sourcePath.slice(0, sourcePath.lastIndexOf('/') + 1);
  const fromFolder = removeDotSegments('/' + folder.toLowerCase() + key).path.slice(1);
  const exactly = (k: string) => (suffixes.get(k) ?? []).filter((p) => keyOf(p, asset) === k);
  const list: Step[] = [
    { name: 'path from the root', matches: exactly(key) },
    { name: "path from the page's folder", matches: exactly(fromFolder) },
    { name: 'path ending', matches: key.includes('/') ? (suffixes.get(key) ?? []) : [] },
    { name: 'file name', matches: key.includes('/') ? [] : (suffixes.get(key) ?? []) },
  ];
  if (!asset) list.push({ name: 'title or alias', matches: index.byTitle.get(target.trim().toLowerCase()) ?? [] });
  return list;
}

export function resolveWiki(index: TargetIndex, sourcePath: string, raw: RawLink): Outcome {
  const hash = raw.href.indexOf('#');
  const target = (hash < 0 ? raw.href : raw.href.slice(0, hash)).replaceAll('\\', '/').trim();
  const fragment = hash < 0 ? null : raw.href.slice(hash + 1).trim() || null;
  const flags = raw.href.includes('\\') ? ['backslash'] : [];
  if (target === '') return finish(index, sourcePath, fragment, flags);
  const ext = fileExtension(target);
  const asset = raw.asset || (ext !== null && !index.isPageExtension(ext) && extensionOf(target) === ext);
  for (const step of steps(index, sourcePath, target, asset)) {
    const matches = [...new Set(step.matches)].sort();
    if (matches.length === 1) return finish(index, matches[0]!, fragment, flags);
    if (matches.length > 1) {
      const reason = `[[${target}]] matches ${matches.length} ${asset ? 'files' : 'pages'} by ${step.name}: ${matches.join(', ')}. Write more of the path.`;
      return outcome('ambiguous', { flags, candidates: matches, anchor: fragment, reason });
    }
  }
  const reason = asset ? `No file named ${target} in the doc set.` : `No page, title or alias matches [[${target}]].`;
  return outcome('broken', { flags, targetIsAsset: asset, anchor: fragment, reason });
}

function finish(index: TargetIndex, target: string, fragment: string | null, flags: string[]): Outcome {
  if (index.isAsset(target)) return outcome('ok', { targetPath: target, targetIsAsset: true, anchor: fragment, flags });
  const problem = fragment === null ? null : checkAnchor(index.pageInfo(target), target, fragment, 'wiki');
  if (problem) return outcome('broken-anchor', { targetPath: target, anchor: fragment, flags, reason: problem });
  return outcome('ok', { targetPath: target, anchor: fragment, flags });
}
