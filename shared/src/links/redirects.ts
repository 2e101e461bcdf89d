/**
 * Redirects of docs/link-rules.md rule 8: the doc set's list and each page's front-matter `redirect_from` (a
 * static-site convention, common practice). Old paths are compared in a loose form (no leading or trailing
 * slash, no base path or locale, no extension, no index file name, lower case), since they are written as
 * published URLs (`/docs/old/`) as often as file paths (`old.md`).
 */
import type { DocSetSettings } from '../schemas/doc-set-settings.js';
import { withoutExtension } from './page-paths.js';
import type { TargetIndex } from './target-index.js';

export function stripSitePrefixes(path: string, settings: Pick<DocSetSettings, 'basePath' | 'localePrefix'>): string | null {
  let rest = path;
  const base = settings.basePath.replace(/\/+$/, '');
  if (base) {
    if (rest !== base && !rest.startsWith(base + '/')) return null;
    rest = rest.slice(base.length) || '/';
  }
  const locale = settings.localePrefix ? '/' + settings.localePrefix : null;
  if (locale && (rest === locale || rest.startsWith(locale + '/'))) rest = rest.slice(locale.length) || '/';
  return rest;
}

export function redirectKey(path: string, settings: DocSetSettings): string {
  let key = path.trim();
  if (key.startsWith('/')) key = stripSitePrefixes(key, settings) ?? key;
  key = withoutExtension(key.replace(/^\/+|\/+$/g, ''));
  const indexNames = settings.indexFileNames.map((n) => withoutExtension(n).toLowerCase());
  const slash = key.lastIndexOf('/');
  if (indexNames.includes(key.slice(slash + 1).toLowerCase())) key = key.slice(0, Math.max(0, slash));
  return key.toLowerCase();
}

export interface RedirectTarget {
  to: string;
  /** True when `to` is already a page path (front matter), false for a site path from the settings. */
  isPagePath: boolean;
}

export function buildRedirects(pagePaths: string[], index: TargetIndex): Map<string, RedirectTarget> {
  const map = new Map<string, RedirectTarget>();
  for (const r of index.settings.redirects) map.set(redirectKey(r.from, index.settings), { to: r.to, isPagePath: false });
  for (const path of pagePaths) {
    for (const from of index.pageInfo(path)?.redirectFrom ?? []) map.set(redirectKey(from, index.settings), { to: path, isPagePath: true });
  }
  return map;
}
