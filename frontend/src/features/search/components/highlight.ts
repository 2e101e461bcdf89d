// Splits a server snippet on its match markers into plain segments, so the screen never parses server text
// as HTML. Whatever else the snippet holds (tags, entities, script) stays literal text.

/** The markers the search route puts around each match (the back end's ts_headline StartSel/StopSel). */
export const MATCH_OPEN = '«';
export const MATCH_CLOSE = '»';

export interface Segment {
  text: string;
  match: boolean;
}

export function splitHighlights(snippet: string): Segment[] {
  const segments: Segment[] = [];
  const push = (text: string, match: boolean) => {
    if (text) segments.push({ text, match });
  };
  let at = 0;
  while (at < snippet.length) {
    const open = snippet.indexOf(MATCH_OPEN, at);
    if (open < 0) break;
    const close = snippet.indexOf(MATCH_CLOSE, open + MATCH_OPEN.length);
    // An unclosed marker is a server slip: keep the rest as plain text, markers dropped.
    if (close < 0) {
      push(snippet.slice(at, open), false);
      at = open + MATCH_OPEN.length;
      break;
    }
    push(snippet.slice(at, open), false);
    push(snippet.slice(open + MATCH_OPEN.length, close), true);
    at = close + MATCH_CLOSE.length;
  }
  push(snippet.slice(at), false);
  return segments;
}
