/** Extracts and resolves a whole doc set given as path -> Markdown; what an import does, minus storage. */
import type { DocSetSettings } from '../schemas/doc-set-settings.js';
import { extractPage } from './extract-page.js';
import { isPagePath } from './page-paths.js';
import { pageTargetInfo } from './page-target-info.js';
import { createLinkResolver } from './resolve-link.js';
import type { PageFacts, ResolvedLink } from './types.js';

export interface DocSetLinks {
  pages: PageFacts[];
  links: ResolvedLink[];
}

/** `files` holds every file of the snapshot; non-page files are assets and their content is not read. */
export function resolveDocSet(files: Record<string, string>, settings: DocSetSettings): DocSetLinks {
  const paths = Object.keys(files).sort();
  const pagePaths = paths.filter((p) => isPagePath(p, settings));
  const assetPaths = paths.filter((p) => !isPagePath(p, settings));
  const pages = pagePaths.map((p) => extractPage(p, files[p]!, { wikiLinks: settings.wikiLinks, pageExtensions: settings.extensions }));
  const info = new Map(pages.map((page) => [page.path, pageTargetInfo(page)]));
  const resolver = createLinkResolver({ pagePaths, assetPaths, pages: info, settings });
  const links = pages.flatMap((page) => page.links.map((link) => resolver.resolve(page.path, link)));
  return { pages, links };
}
