/** Page paths as the importer stores them and the resolver looks them up. */
import picomatch from 'picomatch';
import type { DocSetSettings } from '../schemas/doc-set-settings.js';
import { removeDotSegments } from './rfc3986.js';

export function extensionOf(path: string): string {
  const name = path.slice(path.lastIndexOf('/') + 1);
  const dot = name.lastIndexOf('.');
  return dot > 0 ? name.slice(dot).toLowerCase() : '';
}

export function withoutExtension(path: string): string {
  const ext = extensionOf(path);
  return ext ? path.slice(0, -ext.length) : path;
}

const ignoreMatchers = new WeakMap<string[], (path: string) => boolean>();

function ignored(path: string, globs: string[]): boolean {
  if (globs.length === 0) return false;
  let matcher = ignoreMatchers.get(globs);
  if (!matcher) {
    matcher = picomatch(globs, { dot: true });
    ignoreMatchers.set(globs, matcher);
  }
  return matcher(path);
}

/** A page is a file with one of the doc set's Markdown extensions that no `ignore` glob matches. */
export function isPagePath(path: string, settings: Pick<DocSetSettings, 'extensions' | 'ignore'>): boolean {
  const ext = extensionOf(path);
  return settings.extensions.some((e) => e.toLowerCase() === ext) && !ignored(path, settings.ignore);
}

/**
 * One spelling per file: NFC, `/` separators, no leading `./` or `/`, no empty or dot segments.
 * Returns null for a path that climbs out of the root (`../x.md`) or is empty.
 */
export function normalisePagePath(path: string): string | null {
  const slashed = path.normalize('NFC').replaceAll('\\', '/');
  const collapsed = slashed
    .split('/')
    .filter((s) => s !== '')
    .join('/');
  const { path: clean, aboveRoot } = removeDotSegments(collapsed);
  const result = clean
    .split('/')
    .filter((s) => s !== '')
    .join('/');
  return aboveRoot || result === '' ? null : result;
}

/**
 * Folder that relative links start from: the file's folder, or with `relativeTo: 'published-url'`
 * the folder of its published URL (`a/b.md` is served as `a/b/`, an index file as its folder).
 */
export function baseFolder(sourcePath: string, settings: Pick<DocSetSettings, 'relativeTo' | 'indexFileNames'>): string {
  const slash = sourcePath.lastIndexOf('/');
  const folder = slash < 0 ? '' : sourcePath.slice(0, slash + 1);
  if (settings.relativeTo !== 'published-url') return folder;
  const name = sourcePath.slice(slash + 1);
  const isIndex = settings.indexFileNames.some((n) => n.toLowerCase() === name.toLowerCase());
  return isIndex ? folder : withoutExtension(sourcePath) + '/';
}
