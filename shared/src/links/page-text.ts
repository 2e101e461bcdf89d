/** Title and word count of a page, from its front matter, headings and plain text. */
import type { Heading } from './types.js';

/** Front-matter `title`, else the first heading, else the file name without extension. */
export function titleFrom(path: string, frontTitle: string | undefined, headings: Heading[]): string {
  if (frontTitle) return frontTitle;
  if (headings[0]?.text) return headings[0].text;
  const name = path.slice(path.lastIndexOf('/') + 1);
  const dot = name.lastIndexOf('.');
  return dot > 0 ? name.slice(0, dot) : name;
}

export function countWords(text: string): number {
  let words = 0;
  let inWord = false;
  for (let i = 0; i < text.length; i++) {
    const space = text.charCodeAt(i) <= 32;
    if (!space && !inWord) words++;
    inWord = !space;
  }
  return words;
}
