/** Public API of `@linkloom/shared/links`: pure Markdown link extraction and resolution. */
export { extractPage, MAX_TEXT_LENGTH, type ExtractOptions } from './extract-page.js';
export { createLinkResolver, type LinkResolver, type LinkResolverInput } from './resolve-link.js';
export { isPagePath, normalisePagePath } from './page-paths.js';
export { MAX_LINKS_PER_PAGE, MAX_URL_LENGTH } from './link-collector.js';
export { FRONT_MATTER_MAX_BYTES, FRONT_MATTER_MAX_ALIASES, FRONT_MATTER_MAX_DEPTH } from './front-matter-parse.js';
export { pageTargetInfo } from './page-target-info.js';
export type {
  FrontMatter,
  Heading,
  LinkKind,
  LinkStatus,
  PageFacts,
  PageTargetInfo,
  PageWarning,
  PageWarningCode,
  RawLink,
  ResolvedLink,
} from './types.js';
export { resolveDocSet, type DocSetLinks } from './resolve-doc-set.js';
