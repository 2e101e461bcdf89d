import { createRequire } from 'node:module';
import { parseFragment } from 'parse5';
import { describe, expect, test } from 'vitest';
import { extractPage } from './extract-page.js';

// Source: the CommonMark Spec 0.31.2 (John MacFarlane, commonmark.org), shipped as the npm package
// `commonmark-spec`, whose `tests` export lists every example with its section and expected HTML.
interface SpecExample {
  markdown: string;
  html: string;
  section: string;
  number: number;
}
const require = createRequire(import.meta.url);
const spec = require('commonmark-spec') as { tests: SpecExample[] };
const SECTIONS = ['Links', 'Link reference definitions', 'Autolinks', 'Images'];

/**
 * Normalisation applied to both sides: the spec's renderer percent-encodes destinations (`ä` -> `%C3%A4`,
 * `\` -> `%5C`, space -> `%20`), while Linkloom keeps the destination as written, so every valid `%XX`
 * UTF-8 sequence is decoded on both sides before comparing. Entities are decoded by the parsers
 * (micromark for Markdown, parse5 for the expected HTML).
 */
function normalise(href: string): string {
  try {
    return decodeURIComponent(href);
  } catch {
    return href.replace(/(%[0-9A-Fa-f]{2})+/g, (run) => {
      try {
        return decodeURIComponent(run);
      } catch {
        return run;
      }
    });
  }
}

interface HtmlNode {
  nodeName: string;
  attrs?: { name: string; value: string }[];
  childNodes?: HtmlNode[];
}

/** `href` of `<a>` and `src` of `<img>` in document order. */
function expectedTargets(html: string): string[] {
  const out: string[] = [];
  const visit = (node: HtmlNode) => {
    const name = node.nodeName === 'a' ? 'href' : node.nodeName === 'img' ? 'src' : null;
    const value = name ? node.attrs?.find((a) => a.name === name)?.value : undefined;
    if (value !== undefined) out.push(normalise(value));
    node.childNodes?.forEach(visit);
  };
  visit(parseFragment(html) as unknown as HtmlNode);
  return out;
}

/**
 * Examples that legitimately differ, each with its reason (none skipped silently). Linkloom parses with GFM
 * on purpose (docs/link-rules.md counts GFM bare-URL autolinks), so text that CommonMark leaves alone but GFM's
 * autolink-literal extension turns into a link yields one more link than the CommonMark HTML shows.
 */
const GFM = 'GFM autolink literal (GFM spec 0.29-gfm, section 6.9 "Autolinks (extension)") finds a bare URL or address';
const EXCLUDED: Record<number, { reason: string; gfmLinks: string[] }> = {
  602: { reason: GFM, gfmLinks: ['https://foo.bar/baz'] },
  606: { reason: GFM, gfmLinks: ['mailto:foo+@bar.example.com'] },
  608: { reason: GFM, gfmLinks: ['https://foo.bar'] },
  611: { reason: GFM, gfmLinks: ['https://example.com'] },
  612: { reason: GFM, gfmLinks: ['mailto:foo@bar.example.com'] },
};

const examples = spec.tests.filter((t) => SECTIONS.includes(t.section));

describe('CommonMark 0.31.2 examples: links, link reference definitions, autolinks, images', () => {
  test('the four sections are all present', () => {
    // Counts from the spec text of 0.31.2 as shipped in the package (Links 90, definitions 27, autolinks 19, images 22).
    expect(examples.length).toBe(90 + 27 + 19 + 22);
  });

  test.each(examples.filter((e) => !(e.number in EXCLUDED)))('example $number ($section)', (example) => {
    const facts = extractPage('spec.md', example.markdown, { wikiLinks: false });
    expect(facts.links.map((l) => normalise(l.href))).toEqual(expectedTargets(example.html));
  });

  test.each(Object.entries(EXCLUDED).map(([n, e]) => ({ n: Number(n), ...e })))('example $n excluded: $reason', ({ n, gfmLinks }) => {
    // The exclusion is checked too: CommonMark finds no link here and we find exactly the GFM literal.
    const example = spec.tests.find((t) => t.number === n)!;
    const found = extractPage('spec.md', example.markdown, { wikiLinks: false }).links.map((l) => normalise(l.href));
    expect(expectedTargets(example.html)).toEqual([]);
    expect(found).toEqual(gfmLinks);
  });
});
