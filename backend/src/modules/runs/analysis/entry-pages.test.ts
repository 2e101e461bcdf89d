import { describe, expect, it } from 'vitest';
import { chooseEntryPages } from './entry-pages.js';

const INDEX_NAMES = ['index.md', 'README.md', '_index.md'];

describe('chooseEntryPages', () => {
  it('uses the configured entry pages and reports the ones missing', () => {
    const choice = chooseEntryPages(new Set(['start.md', 'guide/a.md']), ['/start.md', 'gone.md'], INDEX_NAMES);
    expect(choice.paths).toEqual(['start.md']);
    expect(choice.warnings.map((w) => w.code)).toEqual(['ENTRY_PAGE_MISSING']);
  });

  // docs/metrics.md: the default entry page is the root index page (first of indexFileNames present).
  it('falls back to the first root index file, never to one in a folder', () => {
    expect(chooseEntryPages(new Set(['guide/index.md', 'README.md', '_index.md']), [], INDEX_NAMES)).toEqual({
      paths: ['README.md'],
      warnings: [],
    });
    const none = chooseEntryPages(new Set(['guide/index.md']), [], INDEX_NAMES);
    expect(none.paths).toEqual([]);
    expect(none.warnings[0].code).toBe('NO_ENTRY_PAGE');
  });

  it('falls back to the root index when no configured entry page exists', () => {
    const choice = chooseEntryPages(new Set(['index.md']), ['gone.md'], INDEX_NAMES);
    expect(choice.paths).toEqual(['index.md']);
    expect(choice.warnings.map((w) => w.code)).toEqual(['ENTRY_PAGE_MISSING']);
  });
});
