import { bench } from 'vitest';
import { extractPage } from './extract-page.js';
import { generatedMarkdown } from './generated-markdown.js';

// Single-thread parse throughput on generated pages (about 4.5 KB each); MB/s = bytes / mean time.
const pages = generatedMarkdown(20);
bench('extractPage over 20 generated pages', () => {
  for (let i = 0; i < pages.length; i++) extractPage(`batch-${i}.md`, pages[i]!);
});
