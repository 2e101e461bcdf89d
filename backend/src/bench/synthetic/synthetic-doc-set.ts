import { coprimeStride, resolveOptions, type SyntheticOptions } from './synthetic-layout.js';
import { ASSET_COUNT, renderSyntheticPage } from './synthetic-page.js';

export interface SyntheticFile {
  path: string;
  content: string;
  /** Links written on the page (0 for assets); lets a benchmark report its link total without parsing. */
  linkCount: number;
}

function diagramSvg(k: number): string {
  return `<svg xmlns="http://www.w3.org/2000/svg" width="120" height="40"><rect width="120" height="40" fill="#ddd"/><text x="8" y="26">Diagram ${k}</text></svg>\n`;
}

/**
 * Exactly round(pages * changedFraction) pages are "changed": page i is changed when (i * stride + changeSeed)
 * mod pages falls below that count, a bijection, so the count is exact and the choice follows the change seed.
 */
export function isChangedPage(i: number, pages: number, changedFraction: number, changeSeed: number): boolean {
  const count = Math.round(pages * changedFraction);
  if (count === 0) return false;
  return (i * coprimeStride(pages, 104_729) + changeSeed) % pages < count;
}

/**
 * A large deterministic doc set for benchmarks, one file at a time: the assets, then `index.md` and the pages.
 * Memory stays at one page; paths, titles and anchors of other pages are recomputed from their numbers.
 */
export function* generateSyntheticDocSet(options: SyntheticOptions): Generator<SyntheticFile> {
  const o = resolveOptions(options);
  for (let k = 0; k < ASSET_COUNT; k++) yield { path: `assets/diagram-${k}.svg`, content: diagramSvg(k), linkCount: 0 };
  for (let i = 0; i < o.pages; i++) {
    const changed = isChangedPage(i, o.pages, o.changedFraction, o.changeSeed);
    yield renderSyntheticPage(i, o, changed);
  }
}
