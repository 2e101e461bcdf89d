import { describe, expect, it } from 'vitest';
import { splitHighlights } from './highlight.js';

describe('splitHighlights', () => {
  it('marks the text between markers and keeps the rest plain', () => {
    expect(splitHighlights('Set up «webhooks» for «deploys».')).toEqual([
      { text: 'Set up ', match: false },
      { text: 'webhooks', match: true },
      { text: ' for ', match: false },
      { text: 'deploys', match: true },
      { text: '.', match: false },
    ]);
  });

  it('keeps other tags as literal text', () => {
    expect(splitHighlights('<img src=x onerror=alert(1)> «x»')).toEqual([
      { text: '<img src=x onerror=alert(1)> ', match: false },
      { text: 'x', match: true },
    ]);
  });

  it('drops an unclosed marker instead of marking the rest', () => {
    expect(splitHighlights('a «b')).toEqual([
      { text: 'a ', match: false },
      { text: 'b', match: false },
    ]);
  });
});
