/** Collects a page's links under the limits of docs/threats.md, "Limits" (20,000 per page, 2,048 chars per URL). */
import type { PageWarning, RawLink } from './types.js';

export const MAX_LINKS_PER_PAGE = 20_000;
export const MAX_URL_LENGTH = 2_048;

export class LinkCollector {
  readonly links: RawLink[] = [];
  private overCount = 0;
  private tooLong = 0;
  private firstTooLongLine: number | undefined;
  private backslashLines: number[] = [];

  add(link: RawLink): void {
    if (link.href.length > MAX_URL_LENGTH) {
      this.tooLong++;
      this.firstTooLongLine ??= link.line;
      return;
    }
    if (this.links.length >= MAX_LINKS_PER_PAGE) {
      this.overCount++;
      return;
    }
    if (link.kind !== 'wiki' && link.kind !== 'wiki-embed' && link.href.includes('\\')) this.backslashLines.push(link.line);
    this.links.push(link);
  }

  warnings(): PageWarning[] {
    const out: PageWarning[] = [];
    if (this.overCount > 0) {
      out.push({ code: 'LINK_LIMIT', message: `The page has more than ${MAX_LINKS_PER_PAGE} links; ${this.overCount} were dropped.` });
    }
    if (this.tooLong > 0) {
      out.push({
        code: 'LINK_LIMIT',
        line: this.firstTooLongLine,
        message: `${this.tooLong} link(s) longer than ${MAX_URL_LENGTH} characters were dropped.`,
      });
    }
    for (const line of this.backslashLines.slice(0, 20)) {
      out.push({ code: 'BACKSLASH_PATH', line, message: `The link on line ${line} uses "\\" as a folder separator; write "/" instead.` });
    }
    return out;
  }
}
