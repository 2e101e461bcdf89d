/**
 * A synthetic doc set's pages and links for benchmarks: sections of 50 pages under one root index, most
 * links inside the section, the rest skewed towards a few popular pages (as real docs link to their setup
 * and reference pages), 2% of pages that nothing links to and 1% broken links. Seeded, so reproducible.
 */
import { mulberry32 } from '../../demo/generator/prng.js';
import type { FixtureLink, FixturePage } from './snapshot-writer.js';

const SECTION_SIZE = 50;
const WORDS = ['install', 'configure', 'deploy', 'cluster', 'backup', 'token', 'schedule', 'export', 'mirror', 'quota', 'audit', 'gateway'];

export function syntheticLinkGraph(pageCount: number, linksPerPage: number, seed = 42): { pages: FixturePage[]; links: FixtureLink[] } {
  const random = mulberry32(seed);
  const paths = Array.from({ length: pageCount }, (_, i) =>
    i === 0 ? 'index.md' : `section-${Math.floor(i / SECTION_SIZE)}/page-${i % SECTION_SIZE}.md`,
  );
  const pages = paths.map((path, i) => ({
    path,
    title: i === 0 ? 'Home' : `${WORDS[i % WORDS.length]} guide ${i}`,
    text: `How to ${WORDS[i % WORDS.length]} and ${WORDS[(i * 7) % WORDS.length]} in section ${Math.floor(i / SECTION_SIZE)}.`,
    wordCount: 200 + (i % 900),
  }));
  const unlinked = (i: number) => i % 50 === 17;
  const links: FixtureLink[] = [];
  for (let s = 0; s < pageCount; s++) {
    const sectionStart = Math.floor(s / SECTION_SIZE) * SECTION_SIZE;
    for (let k = 0; k < linksPerPage; k++) {
      if (random() < 0.01) {
        links.push({ from: paths[s], href: `missing-${k}.md`, targetPath: `missing-${k}.md`, status: 'broken', line: k + 1 });
        continue;
      }
      let t = random() < 0.6 ? sectionStart + Math.floor(random() * SECTION_SIZE) : Math.floor(pageCount * random() ** 2);
      t = Math.min(t, pageCount - 1);
      if (unlinked(t) || t === s) continue;
      links.push({ from: paths[s], to: paths[t], line: k + 1 });
    }
  }
  // The root index links to each section's first page, so most of the site is reachable.
  for (let start = SECTION_SIZE; start < pageCount; start += SECTION_SIZE) links.push({ from: 'index.md', to: paths[start], line: 1 });
  return { pages, links };
}
