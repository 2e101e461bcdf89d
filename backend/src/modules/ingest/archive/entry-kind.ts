/**
 * Decides what each entry is: a page (read and parsed), an asset (listed so links to it resolve, never
 * read) or ignored (with a reason for the import report). Nothing here is ever recursed into or executed.
 */
import picomatch from 'picomatch';

const ASSET_EXTENSIONS = new Set([
  'png',
  'jpg',
  'jpeg',
  'gif',
  'webp',
  'svg',
  'avif',
  'ico',
  'bmp',
  'tif',
  'tiff',
  'pdf',
  'txt',
  'csv',
  'tsv',
  'json',
  'yaml',
  'yml',
  'toml',
  'xml',
  'html',
  'htm',
  'mp4',
  'webm',
  'mov',
  'mp3',
  'wav',
  'ogg',
  'woff',
  'woff2',
  'ttf',
  'otf',
  'eot',
]);
const ARCHIVE_EXTENSIONS = new Set(['zip', 'jar', 'war', 'tar', 'gz', 'tgz', 'bz2', 'xz', 'zst', '7z', 'rar', 'cab', 'iso']);
// Common practice (from memory): file types Windows and Unix hosts run directly or load as code.
const EXECUTABLE_EXTENSIONS = new Set([
  'exe',
  'dll',
  'com',
  'bat',
  'cmd',
  'msi',
  'scr',
  'ps1',
  'vbs',
  'sh',
  'bash',
  'so',
  'dylib',
  'app',
  'apk',
  'bin',
  'elf',
]);

export type EntryKind = { kind: 'page' | 'asset' } | { kind: 'ignored'; reason: string };

export interface KindRules {
  isPage(extension: string): boolean;
  isIgnoredByGlob(path: string): boolean;
}

export function makeKindRules(pageExtensions: string[], ignoreGlobs: string[]): KindRules {
  const pages = new Set(pageExtensions.map((ext) => ext.replace(/^\./, '').toLowerCase()));
  const matcher = ignoreGlobs.length > 0 ? picomatch(ignoreGlobs, { dot: true }) : () => false;
  return { isPage: (ext) => pages.has(ext), isIgnoredByGlob: (path) => matcher(path) };
}

/** `originalSegments` is the path before the top folder was stripped, `path` the one after. */
export function classifyEntry(originalSegments: string[], path: string, rules: KindRules): EntryKind {
  if (originalSegments[0] === '__MACOSX') return { kind: 'ignored', reason: 'macOS resource fork (__MACOSX)' };
  if (originalSegments.some((segment) => segment.startsWith('.'))) {
    return { kind: 'ignored', reason: 'hidden file or folder' };
  }
  if (rules.isIgnoredByGlob(path)) return { kind: 'ignored', reason: 'matches an ignore pattern' };
  const extension = extensionOf(path);
  if (rules.isPage(extension)) return { kind: 'page' };
  if (ARCHIVE_EXTENSIONS.has(extension)) return { kind: 'ignored', reason: 'nested archive (not opened)' };
  if (EXECUTABLE_EXTENSIONS.has(extension)) return { kind: 'ignored', reason: 'executable (not run)' };
  if (ASSET_EXTENSIONS.has(extension)) return { kind: 'asset' };
  return { kind: 'ignored', reason: 'unknown file type' };
}

function extensionOf(path: string): string {
  const name = path.slice(path.lastIndexOf('/') + 1);
  const dot = name.lastIndexOf('.');
  return dot > 0 ? name.slice(dot + 1).toLowerCase() : '';
}
