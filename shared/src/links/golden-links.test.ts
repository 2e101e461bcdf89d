import { describe, expect, test } from 'vitest';
import { docSetSettingsSchema } from '../schemas/doc-set-settings.js';
import { resolveDocSet } from './resolve-doc-set.js';

// docs/threats.md check 35, link extraction golden test. Expected values were written by hand from
// docs/link-rules.md "How links resolve" (rules cited per row), not copied from a run.
const source = [
  '# Install',
  '',
  '[same folder](set-up.md) [parent](../index.md) [anchor](set-up.md#install-steps)',
  '[bad anchor](set-up.md#instal) [by reference][ref] <https://example.com/x> [mail](mailto:team@example.com)',
  '[encoded](../my%20page.md) [query](set-up.md?tab=linux#install-steps) [case](../reference.md)',
  '[missing](setup.md) [here](#install) ![chart](../img/chart.png) www.example.com [no extension](set-up)',
  '[climb](../../../etc/passwd) [empty]() [collapsed][] [shortcut] [tel](tel:+15550100)',
  '',
  '[ref]: ../Reference.md',
  '[collapsed]: set-up.md "title"',
  '[shortcut]: <../my page.md>',
  '[unused]: nowhere.md',
].join('\n');

const files = {
  'docs/guide/install.md': source,
  'docs/guide/set-up.md': '# Set up\n\n## Install steps\n',
  'docs/Reference.md': '# Reference\n',
  'docs/index.md': '# Docs\n',
  'docs/my page.md': '# My page\n',
  'docs/img/chart.png': '',
};

type Row = [href: string, kind: string, status: string, target: string | null, anchor: string | null, flags: string[]];
const expected: Row[] = [
  ['set-up.md', 'inline', 'ok', 'docs/guide/set-up.md', null, []], // rule 4
  ['../index.md', 'inline', 'ok', 'docs/index.md', null, []], // rule 4, RFC 3986 5.2.4
  ['set-up.md#install-steps', 'inline', 'ok', 'docs/guide/set-up.md', 'install-steps', []], // rule 7 (github-slugger)
  ['set-up.md#instal', 'inline', 'broken-anchor', 'docs/guide/set-up.md', 'instal', []], // rule 7
  ['../Reference.md', 'reference', 'ok', 'docs/Reference.md', null, []], // full reference
  ['https://example.com/x', 'autolink', 'external', null, null, []], // rule 2
  ['mailto:team@example.com', 'inline', 'external', null, null, []], // rule 2
  ['../my%20page.md', 'inline', 'ok', 'docs/my page.md', null, []], // rule 1, percent-decoding
  ['set-up.md?tab=linux#install-steps', 'inline', 'ok', 'docs/guide/set-up.md', 'install-steps', []], // rule 1, query split off
  ['../reference.md', 'inline', 'broken', null, null, ['case-mismatch']], // rule 5, case-sensitive doc set
  ['setup.md', 'inline', 'broken', null, null, []], // missing page
  ['#install', 'inline', 'ok', 'docs/guide/install.md', 'install', []], // own page anchor
  ['../img/chart.png', 'image', 'ok', 'docs/img/chart.png', null, []], // rule 11, asset
  ['http://www.example.com', 'autolink', 'external', null, null, []], // GFM bare URL
  ['set-up', 'inline', 'ok', 'docs/guide/set-up.md', null, []], // rule 5, no extension
  ['../../../etc/passwd', 'inline', 'broken', null, null, []], // rule 4, outside the doc set
  ['', 'inline', 'ok', 'docs/guide/install.md', null, []], // rule 10, empty target
  ['set-up.md', 'reference', 'ok', 'docs/guide/set-up.md', null, []], // collapsed reference
  ['../my page.md', 'reference', 'ok', 'docs/my page.md', null, []], // shortcut reference, <...> destination
  ['tel:+15550100', 'inline', 'external', null, null, []], // rule 2
];

function resolveWith(caseInsensitive: boolean) {
  const settings = docSetSettingsSchema.parse({ caseInsensitive });
  return resolveDocSet(files, settings).links.filter((l) => l.sourcePath === 'docs/guide/install.md');
}

describe('golden link classification (docs/threats.md check 35)', () => {
  const links = resolveWith(false);

  test('every link, in document order, with kind, status, target, anchor and flags', () => {
    const seen = links.map((l): Row => [l.href, l.kind, l.status, l.targetPath, l.anchor, l.flags]);
    expect(seen).toEqual(expected);
  });

  test('an unused reference definition is no link (rule 10)', () => {
    expect(links.some((l) => l.href === 'nowhere.md')).toBe(false);
  });

  test('reasons a writer can act on', () => {
    const reason = (href: string) => links.find((l) => l.href === href)?.reason;
    expect(reason('setup.md')).toBe('No page docs/guide/setup.md; did you mean docs/guide/set-up.md?');
    expect(reason('set-up.md#instal')).toMatch(/^Anchor #instal not found on docs\/guide\/set-up\.md/);
    expect(reason('../reference.md')).toBe('No page docs/reference.md; did you mean docs/Reference.md? Only the letter case differs.');
    expect(reason('../../../etc/passwd')).toContain('outside the doc set');
  });

  test('lines and columns are 1-based positions in the source', () => {
    const at = (href: string) => links.find((l) => l.href === href)!;
    expect([at('set-up.md').line, at('set-up.md').column]).toEqual([3, 1]);
    expect([at('../index.md').line, at('../index.md').column]).toEqual([3, 26]);
    expect([at('https://example.com/x').line, at('https://example.com/x').column]).toEqual([4, 52]);
  });

  test('a case-insensitive doc set resolves the case mismatch and keeps the flag', () => {
    const link = resolveWith(true).find((l) => l.href === '../reference.md')!;
    expect(link).toMatchObject({ status: 'ok', targetPath: 'docs/Reference.md', flags: ['case-mismatch'] });
  });
});
