import { describe, expect, test } from 'vitest';
import { docSetSettingsSchema, type DocSetSettingsPatch } from '../schemas/doc-set-settings.js';
import { isPagePath, normalisePagePath } from './page-paths.js';
import { createLinkResolver } from './resolve-link.js';
import type { LinkKind, PageTargetInfo, RawLink } from './types.js';

// Hand-drawn cases for docs/link-rules.md "How links resolve"; the rule number is named beside each check.
const info = (title: string, extra: Partial<PageTargetInfo> = {}): PageTargetInfo => ({
  title,
  aliases: [],
  anchors: [],
  headings: [],
  blockIds: [],
  redirectFrom: [],
  ...extra,
});
const pages = new Map<string, PageTargetInfo>([
  ['guide/index.md', info('Guide')],
  ['guide.md', info('Guide page')],
  ['guide/setup.md', info('Setup', { anchors: ['install'], headings: [{ text: 'Install', slug: 'install' }] })],
  ['guide/deep/page.md', info('Deep')],
  ['notes/Plan A.md', info('Plan A', { aliases: ['First plan'], blockIds: ['goal'], headings: [{ text: 'Budget', slug: 'budget' }] })],
  ['notes/plan b.md', info('Plan B', { redirectFrom: ['/legacy/plan-b/'] })],
  ['other/Plan A.md', info('Other plan A')],
  ['releases/Release 1.2.md', info('Release 1.2')],
]);
const assets = ['img/cat.png'];

function resolverWith(patch: DocSetSettingsPatch = {}) {
  const settings = docSetSettingsSchema.parse(patch);
  return createLinkResolver({ pagePaths: [...pages.keys()], assetPaths: assets, pages: (p) => pages.get(p), settings });
}
const raw = (href: string, kind: LinkKind = 'inline', asset = false): RawLink => ({ kind, href, line: 1, column: 1, text: '', asset });

describe('Markdown links', () => {
  const r = resolverWith();
  test('rule 5: trailing slash tries the index file, then a page of that name', () => {
    expect(r.resolve('a.md', raw('guide/')).targetPath).toBe('guide/index.md');
    const onlyPage = createLinkResolver({
      pagePaths: ['guide.md'],
      assetPaths: [],
      pages: new Map(),
      settings: docSetSettingsSchema.parse({}),
    });
    expect(onlyPage.resolve('a.md', raw('guide/')).targetPath).toBe('guide.md');
  });
  test('rule 5: .html maps to the Markdown source; backslashes read as / and flagged', () => {
    expect(r.resolve('guide/index.md', raw('setup.html#install'))).toMatchObject({
      status: 'ok',
      targetPath: 'guide/setup.md',
      anchor: 'install',
    });
    expect(r.resolve('guide/deep/page.md', raw('..\\setup.md'))).toMatchObject({
      status: 'ok',
      targetPath: 'guide/setup.md',
      flags: ['backslash'],
    });
  });
  test('rule 5: relative to the published URL (a/b.md served as a/b/)', () => {
    const published = resolverWith({ relativeTo: 'published-url' });
    expect(published.resolve('guide/setup.md', raw('../index.md')).targetPath).toBe('guide/index.md');
    expect(published.resolve('guide/index.md', raw('setup.md')).targetPath).toBe('guide/setup.md');
    expect(r.resolve('guide/setup.md', raw('../index.md')).status).toBe('broken');
  });
  test('rule 8: redirects from settings and from front matter', () => {
    const withList = resolverWith({ redirects: [{ from: '/old/setup/', to: '/guide/setup' }] });
    expect(withList.resolve('a.md', raw('/old/setup/#install'))).toMatchObject({
      status: 'redirected',
      targetPath: 'guide/setup.md',
      anchor: 'install',
    });
    expect(r.resolve('a.md', raw('/legacy/plan-b'))).toMatchObject({ status: 'redirected', targetPath: 'notes/plan b.md' });
  });
  test('rules 2 and 9: site base URL, same host outside it, other hosts', () => {
    const site = resolverWith({ siteBaseUrls: ['https://docs.example/handbook/'] });
    expect(site.resolve('a.md', raw('https://docs.example/handbook/guide/setup#install'))).toMatchObject({
      status: 'ok',
      targetPath: 'guide/setup.md',
    });
    expect(site.resolve('a.md', raw('https://docs.example/blog/')).status).toBe('out-of-scope');
    expect(site.resolve('a.md', raw('//elsewhere.example/x')).status).toBe('external');
  });
  test('rule 11: a missing asset is a broken asset link', () => {
    expect(r.resolve('a.md', raw('img/cat.png', 'image', true))).toMatchObject({ status: 'ok', targetIsAsset: true });
    expect(r.resolve('a.md', raw('img/dog.png', 'image', true))).toMatchObject({ status: 'broken', targetIsAsset: true });
  });
});

describe('wiki links (rule 6)', () => {
  const r = resolverWith();
  test('order: root path, source folder, suffix, unique name, title/alias; ambiguity is reported', () => {
    expect(r.resolve('x.md', raw('guide/setup', 'wiki')).targetPath).toBe('guide/setup.md');
    expect(r.resolve('notes/x.md', raw('plan a', 'wiki')).targetPath).toBe('notes/Plan A.md');
    expect(r.resolve('x.md', raw('deep/page', 'wiki')).targetPath).toBe('guide/deep/page.md');
    expect(r.resolve('x.md', raw('Plan B', 'wiki')).targetPath).toBe('notes/plan b.md');
    expect(r.resolve('x.md', raw('Release 1.2', 'wiki')).targetPath).toBe('releases/Release 1.2.md');
    expect(r.resolve('x.md', raw('guide/setup.md', 'wiki')).targetPath).toBe('guide/setup.md');
    expect(r.resolve('x.md', raw('First plan', 'wiki')).targetPath).toBe('notes/Plan A.md');
    const ambiguous = r.resolve('x.md', raw('Plan A', 'wiki'));
    expect(ambiguous).toMatchObject({ status: 'ambiguous', candidates: ['notes/Plan A.md', 'other/Plan A.md'] });
  });
  test('#Heading by text, #^id by block marker', () => {
    expect(r.resolve('notes/x.md', raw('Plan A#budget', 'wiki')).status).toBe('ok');
    expect(r.resolve('notes/x.md', raw('Plan A#^goal', 'wiki')).status).toBe('ok');
    expect(r.resolve('notes/x.md', raw('Plan A#^gaol', 'wiki')).status).toBe('broken-anchor');
  });
  test('embeds of files are asset links', () => {
    expect(r.resolve('x.md', raw('cat.png', 'wiki-embed', true))).toMatchObject({
      status: 'ok',
      targetPath: 'img/cat.png',
      targetIsAsset: true,
    });
    expect(r.resolve('x.md', raw('dog.png', 'wiki-embed', true))).toMatchObject({ status: 'broken', targetIsAsset: true });
  });
});

describe('page paths', () => {
  test('normalisePagePath', () => {
    expect(normalisePagePath('.\\docs//guide/./a.md')).toBe('docs/guide/a.md');
    expect(normalisePagePath('../x.md')).toBeNull();
    expect(normalisePagePath('Cafe\u0301.md')).toBe('Caf\u00e9.md');
  });
  test('isPagePath honours extensions and ignore globs (picomatch)', () => {
    const settings = docSetSettingsSchema.parse({ ignore: ['drafts/**'] });
    expect(isPagePath('guide/a.MD', settings)).toBe(true);
    expect(isPagePath('drafts/a.md', settings)).toBe(false);
    expect(isPagePath('img/a.png', settings)).toBe(false);
  });
});
