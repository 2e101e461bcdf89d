/** Lookup tables over one snapshot's files, built once and shared by every link of the snapshot. */
import type { DocSetSettings } from '../schemas/doc-set-settings.js';
import { extensionOf, withoutExtension } from './page-paths.js';
import type { PageTargetInfo } from './types.js';

export type PagesSource = Map<string, PageTargetInfo> | ((path: string) => PageTargetInfo | undefined);

function push(map: Map<string, string[]>, key: string, value: string): void {
  const list = map.get(key);
  if (!list) map.set(key, [value]);
  else if (!list.includes(value)) list.push(value);
}

function folderOf(path: string): string {
  return path.slice(0, path.lastIndexOf('/') + 1);
}

export class TargetIndex {
  readonly files = new Map<string, 'page' | 'asset'>();
  readonly lowerPaths = new Map<string, string[]>();
  /** Wiki keys: lower-cased path suffixes (`setup`, `guides/setup`), pages without extension, assets with. */
  readonly pageSuffixes = new Map<string, string[]>();
  readonly assetSuffixes = new Map<string, string[]>();
  readonly byTitle = new Map<string, string[]>();
  readonly byFolder = new Map<string, string[]>();
  readonly pageInfo: (path: string) => PageTargetInfo | undefined;

  constructor(
    pagePaths: string[],
    assetPaths: string[],
    pages: PagesSource,
    readonly settings: DocSetSettings,
  ) {
    this.pageInfo = typeof pages === 'function' ? pages : (path) => pages.get(path);
    for (const path of assetPaths) this.addFile(path, 'asset', path.toLowerCase(), this.assetSuffixes);
    for (const path of pagePaths) this.addFile(path, 'page', withoutExtension(path).toLowerCase(), this.pageSuffixes);
    for (const path of pagePaths) {
      const info = this.pageInfo(path);
      if (!info) continue;
      for (const name of [info.title, ...info.aliases]) if (name.trim()) push(this.byTitle, name.trim().toLowerCase(), path);
    }
  }

  private addFile(path: string, kind: 'page' | 'asset', key: string, suffixes: Map<string, string[]>): void {
    this.files.set(path, kind);
    push(this.lowerPaths, path.toLowerCase(), path);
    push(this.byFolder, folderOf(path), path);
    const segments = key.split('/');
    for (let i = segments.length - 1; i >= 0; i--) push(suffixes, segments.slice(i).join('/'), path);
  }

  isPageExtension(ext: string): boolean {
    return this.settings.extensions.some((e) => e.toLowerCase() === ext);
  }

  /** Exact match, else (lower-cased) every file that differs only in letter case. */
  find(path: string): { path: string; caseMismatch: boolean }[] {
    if (this.files.has(path)) return [{ path, caseMismatch: false }];
    return (this.lowerPaths.get(path.toLowerCase()) ?? []).map((p) => ({ path: p, caseMismatch: true }));
  }

  isAsset(path: string): boolean {
    return this.files.get(path) === 'asset';
  }

  /** A target with a non-page extension is an asset even when missing (docs/link-rules.md rule 11). */
  looksLikeAsset(path: string): boolean {
    const ext = extensionOf(path);
    return ext !== '' && !this.isPageExtension(ext) && ext !== '.html' && ext !== '.htm';
  }
}
