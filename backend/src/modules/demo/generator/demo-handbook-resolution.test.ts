/**
 * Re-resolves every link of the demo handbook independently of the generator, to show the seeded statuses
 * follow the rules of docs/link-rules.md and not the generator's intentions. Relative and root-absolute hrefs are merged
 * with the WHATWG URL parser (which implements RFC 3986, section 5.2 reference resolution); wiki links follow
 * docs/link-rules.md rule 6 written out here from scratch; front matter is read with the `yaml` package.
 */
import { describe, expect, it } from 'vitest';
import { parse as parseYaml } from 'yaml';
import { renderHandbook } from './generate-demo-handbook.js';
import type { LinkStatus, RenderedLink } from './types.js';

const SITE = 'https://brackenridge-tools.example';
const BASE = '/handbook/';
// A deep fake root: a relative link that climbs out of it has left the doc set (docs/link-rules.md rule 4).
const ROOT = 'https://resolve.invalid/r/r/r/r/r/r/';

type Files = Record<string, string | Uint8Array>;

function lookup(path: string, files: Files): string | undefined {
  const p = decodeURIComponent(path);
  const tries = p === '' || p.endsWith('/') ? [`${p}index.md`, `${p.replace(/\/$/, '')}.md`] : [p, `${p}.md`, `${p}/index.md`];
  return tries.find((t) => files[t] !== undefined);
}

function redirectTarget(path: string, files: Files): string | undefined {
  const wanted = `/${path.replace(/\/$/, '')}`;
  return Object.keys(files).find((f) => {
    if (!f.endsWith('.md')) return false;
    const fm = /^---\n([\s\S]*?)\n---/.exec(files[f] as string);
    return ((fm && (parseYaml(fm[1]!)?.redirect_from as string[] | undefined)) ?? []).includes(wanted);
  });
}

function resolveUrlLink(link: RenderedLink, files: Files): LinkStatus {
  const { href, source } = link;
  if (href === '' || href.startsWith('#')) return 'self';
  const scheme = /^([a-z][a-z0-9+.-]*):/i.exec(href)?.[1]?.toLowerCase();
  if (scheme && ['javascript', 'data', 'vbscript'].includes(scheme)) return 'unsafe';
  if (scheme && !href.startsWith(SITE)) return 'external';
  let path: string;
  if (scheme || href.startsWith('/')) {
    const url = new URL(href, SITE);
    if (!url.pathname.startsWith(BASE)) return 'out-of-scope';
    path = url.pathname.slice(BASE.length);
  } else {
    const url = new URL(href, ROOT + source);
    if (!url.href.startsWith(ROOT)) return 'broken';
    path = url.pathname.slice(new URL(ROOT).pathname.length);
  }
  const found = lookup(path, files);
  if (found) return found === source ? 'self' : found.endsWith('.md') ? 'page' : 'asset';
  if (redirectTarget(path, files)) return 'redirected';
  return link.form === 'image' ? 'broken-asset' : 'broken';
}

function resolveWikiLink(link: RenderedLink, files: Files): LinkStatus {
  const name = link.href.split('#')[0]!.toLowerCase();
  const paths = Object.keys(files);
  const stemless = (p: string) => p.toLowerCase().replace(/\.md$/, '');
  const folder = link.source.includes('/') ? link.source.slice(0, link.source.lastIndexOf('/') + 1) : '';
  const steps: Array<(p: string) => boolean> = [
    (p) => stemless(p) === name,
    (p) => stemless(p) === (folder + name).toLowerCase(),
    (p) => stemless(p).endsWith(name),
    (p) => stemless(p).split('/').pop() === name,
    (p) => {
      if (!p.endsWith('.md')) return false;
      const fm = parseYaml(/^---\n([\s\S]*?)\n---/.exec(files[p] as string)![1]!);
      return [fm.title, ...(fm.aliases ?? [])].some((t: string) => t.toLowerCase() === name);
    },
  ];
  for (const step of steps) {
    const hits = paths.filter(step);
    if (hits.length > 1) return 'ambiguous';
    if (hits.length === 1) return hits[0] === link.source ? 'self' : hits[0]!.endsWith('.md') ? 'page' : 'asset';
  }
  return 'broken';
}

describe.each([1, 2, 3] as const)('demo handbook version %i, resolved independently', (version) => {
  const { files, links } = renderHandbook(version);

  it('every link resolves to the status the generator recorded', () => {
    for (const link of links) {
      const isWiki = link.form.startsWith('wiki') || link.form === 'embed';
      const got = isWiki ? resolveWikiLink(link, files) : resolveUrlLink(link, files);
      // A bad fragment still reaches its page; the fragment itself is checked in the remark test.
      const want = link.status === 'broken-anchor' ? (link.target === link.source ? 'self' : 'page') : link.status;
      expect(got, `${link.source}:${link.line} ${link.href}`).toBe(want);
    }
  });

  it('resolved page links land on the page the generator meant', () => {
    const plain = links.filter((l) => l.status === 'page' && l.form === 'relative');
    expect(plain.length).toBeGreaterThan(300);
    for (const l of plain) {
      const url = new URL(l.href, ROOT + l.source);
      expect(lookup(url.pathname.slice(new URL(ROOT).pathname.length), files)).toBe(l.target);
    }
  });
});
