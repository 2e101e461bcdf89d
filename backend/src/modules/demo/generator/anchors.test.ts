import GithubSlugger from 'github-slugger';
import { describe, expect, it } from 'vitest';
import { pageAnchors, slugOf } from './anchors.js';

describe('pageAnchors', () => {
  it('makes the same slugs as github-slugger, repeats included', () => {
    // Reference: the `github-slugger` package itself (docs/link-rules.md, outside references).
    const headings = ['Steps', 'Steps', 'Before you start!', 'How-to: lending desk', 'Steps', 'Steps 1'];
    const slugger = new GithubSlugger();
    const want = ['Lending policy', ...headings].map((h) => slugger.slug(h));
    expect(
      pageAnchors(
        'Lending policy',
        headings.map((h) => `## ${h}`),
      ),
    ).toEqual(want);
  });

  it('uses an explicit {#id} instead of the slug and adds raw HTML ids', () => {
    expect(pageAnchors('Deposits', ['## Deposit bands {#deposit-bands}'], ['key-register'])).toEqual([
      'deposits',
      'deposit-bands',
      'key-register',
    ]);
  });

  it('drops punctuation and keeps hyphens and underscores', () => {
    expect(slugOf("Tool sheet: ladder 3m (don't lend)")).toBe(new GithubSlugger().slug("Tool sheet: ladder 3m (don't lend)"));
  });
});
