/**
 * Fragment checks of docs/link-rules.md rule 7: a Markdown link's `#fragment` must equal one of the target's anchors
 * (github-slugger heading slugs, `{#id}`, HTML `id`/`name`), as browsers compare fragments exactly. A wiki
 * link's `#Heading` matches heading text case-insensitively and `#^id` a block marker.
 */
import { closest } from './suggest.js';
import type { PageTargetInfo } from './types.js';

/** Returns null when the fragment is found (or the target's anchors are unknown), else a reason to show. */
export function checkAnchor(info: PageTargetInfo | undefined, target: string, fragment: string, mode: 'slug' | 'wiki'): string | null {
  if (!info) return null;
  if (mode === 'wiki' && fragment.startsWith('^')) {
    const id = fragment.slice(1);
    if (info.blockIds.includes(id)) return null;
    return `Block ^${id} not found on ${target}.`;
  }
  if (mode === 'wiki') {
    // Obsidian-style heading paths `#Part#Section` name the innermost heading last.
    const heading = fragment
      .slice(fragment.lastIndexOf('#') + 1)
      .trim()
      .toLowerCase();
    if (info.headings.some((h) => h.text.trim().toLowerCase() === heading || h.slug === heading)) return null;
    const guess = closest(
      heading,
      info.headings.map((h) => h.text),
    );
    return `Heading "${fragment}" not found on ${target}${guess ? `; did you mean "${guess}"?` : '.'}`;
  }
  if (info.anchors.includes(fragment)) return null;
  const guess = closest(fragment, info.anchors);
  return `Anchor #${fragment} not found on ${target}${guess ? `; did you mean #${guess}?` : '.'}`;
}
