/** The slice of a page's facts that other pages' links resolve against. */
import type { PageFacts, PageTargetInfo } from './types.js';

export function pageTargetInfo(facts: PageFacts): PageTargetInfo {
  return {
    title: facts.title,
    aliases: facts.frontMatter.aliases,
    anchors: facts.anchors,
    headings: facts.headings.map((h) => ({ text: h.text, slug: h.slug })),
    blockIds: facts.blockIds,
    redirectFrom: facts.frontMatter.redirectFrom,
  };
}
