/**
 * Link resolution per docs/link-rules.md "How links resolve" (rules 1-11): scheme classification (WHATWG URL
 * reading, see href-scheme.ts), RFC 3986 section 5.2 merging for relative paths, target lookup, anchors,
 * redirects and wiki links. Build one resolver per snapshot; `resolve` is then a few map look-ups.
 */
import type { DocSetSettings } from '../schemas/doc-set-settings.js';
import { checkAnchor } from './anchors.js';
import { lookupFile } from './file-lookup.js';
import { classifyHref } from './href-scheme.js';
import { baseFolder } from './page-paths.js';
import { buildRedirects, redirectKey, stripSitePrefixes, type RedirectTarget } from './redirects.js';
import { mergePaths, removeDotSegments, splitReference } from './rfc3986.js';
import { closest } from './suggest.js';
import { TargetIndex, type PagesSource } from './target-index.js';
import type { RawLink, ResolvedLink } from './types.js';
import { outcome, type Outcome } from './outcome.js';
import { resolveWiki } from './resolve-wiki.js';
import { classifyWebUrl } from './web-url.js';

export interface LinkResolverInput {
  pagePaths: string[];
  assetPaths: string[];
  pages: PagesSource;
  settings: DocSetSettings;
}

export interface LinkResolver {
  resolve(sourcePath: string, raw: RawLink): ResolvedLink;
}

function decode(text: string, flags: string[]): string {
  try {
    return decodeURIComponent(text);
  } catch {
    flags.push('bad-percent-encoding');
    return text;
  }
}

const MAX_REDIRECT_HOPS = 10;

class Resolver implements LinkResolver {
  private readonly index: TargetIndex;
  private readonly redirects: Map<string, RedirectTarget>;

  constructor(input: LinkResolverInput) {
    this.index = new TargetIndex(input.pagePaths, input.assetPaths, input.pages, input.settings);
    this.redirects = buildRedirects(input.pagePaths, this.index);
  }

  resolve(sourcePath: string, raw: RawLink): ResolvedLink {
    const where = { sourcePath, line: raw.line, column: raw.column, href: raw.href, kind: raw.kind };
    if (raw.kind === 'wiki' || raw.kind === 'wiki-embed') return { ...where, ...resolveWiki(this.index, sourcePath, raw) };
    return { ...where, ...this.resolveHref(sourcePath, raw.href) };
  }

  private resolveHref(sourcePath: string, href: string): Outcome {
    const classified = classifyHref(href);
    switch (classified.type) {
      case 'unsafe':
        return outcome('unsafe', { reason: `The "${classified.scheme}:" scheme can run code or read local files; it is blocked.` });
      case 'other-scheme':
        return outcome('external');
      case 'web': {
        const web = classifyWebUrl(classified.url, this.index.settings);
        if (web.type !== 'internal') return outcome(web.type, web.type === 'out-of-scope' ? { reason: web.reason } : {});
        return this.resolveSitePath(sourcePath, web.path, web.fragment, []);
      }
      case 'reference':
        return this.resolveReference(sourcePath, classified.reference);
    }
  }

  private resolveReference(sourcePath: string, reference: string): Outcome {
    const flags: string[] = [];
    let text = reference;
    if (text.includes('\\')) {
      flags.push('backslash');
      text = text.replaceAll('\\', '/');
    }
    const parts = splitReference(text);
    const fragment = parts.fragment === null || parts.fragment === '' ? null : decode(parts.fragment, flags);
    const path = decode(parts.path, flags);
    if (path === '') return this.finish(sourcePath, fragment, flags);
    if (path.startsWith('/')) {
      const inSite = stripSitePrefixes(path, this.index.settings);
      if (inSite === null)
        return outcome('out-of-scope', { flags, reason: `${path} is outside this doc set's base path ${this.index.settings.basePath}.` });
      return this.resolveSitePath(sourcePath, inSite, fragment, flags);
    }
    const merged = removeDotSegments(mergePaths('/' + baseFolder(sourcePath, this.index.settings), path));
    if (merged.aboveRoot)
      return outcome('broken', { flags, reason: `${reference} climbs above the doc set's root: the target is outside the doc set.` });
    return this.lookup(sourcePath, merged.path.slice(1), fragment, flags);
  }

  /** A path from the site root with base path and locale already removed. */
  private resolveSitePath(sourcePath: string, sitePath: string, fragment: string | null, flags: string[]): Outcome {
    const clean = removeDotSegments(sitePath.startsWith('/') ? sitePath : '/' + sitePath);
    return this.lookup(sourcePath, clean.path.slice(1), fragment, flags);
  }

  private lookup(sourcePath: string, path: string, fragment: string | null, flags: string[], hops = 0): Outcome {
    const found = lookupFile(path, this.index);
    if (found.found) {
      if (found.caseMismatch) flags.push('case-mismatch');
      return this.finish(found.path, fragment, flags, hops > 0 ? 'redirected' : 'ok');
    }
    if (found.ambiguous.length > 0) {
      return outcome('ambiguous', {
        flags,
        candidates: found.ambiguous,
        reason: `${path} matches ${found.ambiguous.length} files that differ only in letter case: ${found.ambiguous.join(', ')}.`,
      });
    }
    const redirect = this.redirects.get(redirectKey(path, this.index.settings));
    if (redirect && hops < MAX_REDIRECT_HOPS) {
      const next = redirect.isPagePath ? redirect.to : (stripSitePrefixes(redirect.to, this.index.settings) ?? redirect.to);
      return this.lookup(sourcePath, removeDotSegments('/' + next.replace(/^\/+/, '')).path.slice(1), fragment, flags, hops + 1);
    }
    return this.missing(path, found.caseHint, flags);
  }

  private missing(path: string, caseHint: string | null, flags: string[]): Outcome {
    const asset = this.index.looksLikeAsset(path);
    const what = asset ? 'file' : 'page';
    if (caseHint) {
      flags.push('case-mismatch');
      return outcome('broken', {
        flags,
        targetIsAsset: asset,
        reason: `No ${what} ${path}; did you mean ${caseHint}? Only the letter case differs.`,
      });
    }
    const folder = path.slice(0, path.lastIndexOf('/') + 1);
    const guess = closest(path, this.index.byFolder.get(folder) ?? []);
    const hint = guess ? `; did you mean ${guess}?` : '.';
    return outcome('broken', { flags, targetIsAsset: asset, reason: `No ${what} ${path}${hint}` });
  }

  private finish(target: string, fragment: string | null, flags: string[], status: 'ok' | 'redirected' = 'ok'): Outcome {
    if (this.index.isAsset(target)) return outcome(status, { targetPath: target, targetIsAsset: true, anchor: fragment, flags });
    const anchorProblem = fragment === null ? null : checkAnchor(this.index.pageInfo(target), target, fragment, 'slug');
    if (anchorProblem) return outcome('broken-anchor', { targetPath: target, anchor: fragment, flags, reason: anchorProblem });
    return outcome(status, { targetPath: target, anchor: fragment, flags });
  }
}

export function createLinkResolver(input: LinkResolverInput): LinkResolver {
  return new Resolver(input);
}
