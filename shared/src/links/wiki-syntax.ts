/**
 * Wiki links `[[Target|label]]`, embeds `![[Target]]` and block markers `^id` (a note-taking convention,
 * common practice; not CommonMark). Scanned only inside text nodes the CommonMark parser produced, so code
 * spans and code blocks never yield wiki links.
 */
export interface WikiFinding {
  offset: number;
  embed: boolean;
  target: string;
  label: string | null;
}

const MAX_WIKI_LENGTH = 1_000;

export function scanWikiLinks(source: string): WikiFinding[] {
  const found: WikiFinding[] = [];
  let from = 0;
  for (;;) {
    const open = source.indexOf('[[', from);
    if (open < 0) return found;
    const close = source.indexOf(']]', open + 2);
    if (close < 0) return found;
    const inner = source.slice(open + 2, close);
    if (inner.includes('\n') || inner.includes('[[') || inner.length > MAX_WIKI_LENGTH || inner.trim() === '') {
      from = open + 1;
      continue;
    }
    // Inside GFM tables the separator is written `\|`.
    const bar = inner.indexOf('|');
    const targetEnd = bar < 0 ? inner.length : inner[bar - 1] === '\\' ? bar - 1 : bar;
    const embed = open > 0 && source[open - 1] === '!';
    found.push({
      offset: embed ? open - 1 : open,
      embed,
      target: inner.slice(0, targetEnd).trim(),
      label: bar < 0 ? null : inner.slice(bar + 1).trim(),
    });
    from = close + 2;
  }
}

function isBlockIdChar(code: number): boolean {
  return (code >= 48 && code <= 57) || (code >= 65 && code <= 90) || (code >= 97 && code <= 122) || code === 45;
}

/** A `^id` at the end of a line, after whitespace or alone on the line. */
export function scanBlockIds(text: string): string[] {
  const ids: string[] = [];
  for (const rawLine of text.split('\n')) {
    const line = rawLine.trimEnd();
    const caret = line.lastIndexOf('^');
    if (caret < 0 || caret === line.length - 1) continue;
    if (caret > 0 && line[caret - 1] !== ' ' && line[caret - 1] !== '\t') continue;
    const id = line.slice(caret + 1);
    let valid = true;
    for (let i = 0; i < id.length && valid; i++) valid = isBlockIdChar(id.charCodeAt(i));
    if (valid) ids.push(id);
  }
  return ids;
}

/** `.png` in `diagram.png` but not `.2` in `Release 1.2` nor `. Smith` in `Mr. Smith`. */
export function fileExtension(target: string): string | null {
  const name = target.slice(target.lastIndexOf('/') + 1);
  const dot = name.lastIndexOf('.');
  if (dot <= 0) return null;
  const ext = name.slice(dot).toLowerCase();
  let letters = 0;
  for (let i = 1; i < ext.length; i++) {
    const c = ext.charCodeAt(i);
    if (c >= 97 && c <= 122) letters++;
    else if (!(c >= 48 && c <= 57)) return null;
  }
  return letters > 0 && ext.length <= 11 ? ext : null;
}
