import { describe, expect, it } from 'vitest';
import { bestSuggestions, candidateSources, folderIndex, folderOf, FOLDER_CANDIDATES } from './suggestion-candidates.js';

describe('suggestion candidates', () => {
  it('groups pages by folder, highest score first', () => {
    const index = folderIndex(['a/x.md', 'a/y.md', 'b/z.md', 'top.md', 'a/w.md'], [0.1, 0.3, 0.2, 0.25, 0.15]);
    expect(index.get('a')).toEqual([1, 4, 0]);
    expect(index.get('')).toEqual([3]);
    expect(folderOf('a/b/c.md')).toBe('a/b');
  });

  it('prefers a mention over the same page as folder neighbour, skips the target, caps the neighbours', () => {
    const folder = Array.from({ length: 20 }, (_, i) => i);
    const reasons = candidateSources(0, [5, 0], folder);
    expect(reasons.get(5)).toBe('unlinked-mention');
    expect(reasons.has(0)).toBe(false);
    expect([...reasons.values()].filter((r) => r === 'same-folder')).toHaveLength(FOLDER_CANDIDATES);
  });

  it('keeps positive gains only, largest first', () => {
    const reasons = new Map([
      [1, 'same-folder'],
      [2, 'unlinked-mention'],
      [3, 'same-folder'],
    ] as const);
    expect(bestSuggestions([1, 2, 3], [0.002, 0.005, 0], reasons).map((s) => s.source)).toEqual([2, 1]);
  });
});
