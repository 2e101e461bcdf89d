/**
 * Input hygiene before parsing: BOM and line endings (so LF and CRLF files give identical facts), and
 * budgets against micromark's super-linear cases, measured here on a loaded 2-core machine: 2,000 nested
 * `*` took ~10 s and 40,000 unmatched `]` ~23 s. Over the emphasis budget the page is parsed with emphasis
 * turned off (destinations are unaffected); over the bracket budget, brackets that cannot pair up in their
 * block are blanked (same length, so every line and column stays exact).
 */
import type { PageWarning } from './types.js';

export const EMPHASIS_BUDGET = 1_000;
export const BRACKET_BUDGET = 2_000;

export function normaliseLineEndings(markdown: string): string {
  const text = markdown.charCodeAt(0) === 0xfeff ? markdown.slice(1) : markdown;
  return text.replaceAll('\r\n', '\n').replaceAll('\r', '\n');
}

interface Block {
  start: number;
  end: number;
  line: number;
}

/** Runs of non-blank lines: a rough split that only bounds work; the parser decides structure. */
function blocks(text: string): Block[] {
  const out: Block[] = [];
  let line = 1;
  let current: Block | null = null;
  let lineStart = 0;
  for (let i = 0; i <= text.length; i++) {
    if (i < text.length && text.charCodeAt(i) !== 10) continue;
    const blank = text.slice(lineStart, i).trim() === '';
    if (!blank && !current) current = { start: lineStart, end: i, line };
    if (!blank && current) current.end = i;
    if (blank && current) {
      out.push(current);
      current = null;
    }
    line++;
    lineStart = i + 1;
  }
  if (current) out.push(current);
  return out;
}

/** Offsets of `[` and `]` that no simple left-to-right pairing can match. */
function unmatchedBrackets(text: string, block: Block): number[] {
  const open: number[] = [];
  const lonely: number[] = [];
  for (let i = block.start; i < block.end; i++) {
    const c = text[i];
    if (c === '[') open.push(i);
    else if (c === ']') {
      if (open.length > 0) open.pop();
      else lonely.push(i);
    }
  }
  return [...lonely, ...open];
}

export interface PreparedSource {
  text: string;
  emphasisOff: boolean;
}

export function applyParseBudgets(text: string, warnings: PageWarning[]): PreparedSource {
  const blank = new Set<number>();
  let emphasisOff = false;
  for (const block of blocks(text)) {
    let emphasis = 0;
    for (let i = block.start; i < block.end; i++) if (text[i] === '*' || text[i] === '_' || text[i] === '~') emphasis++;
    if (emphasis > EMPHASIS_BUDGET && !emphasisOff) {
      emphasisOff = true;
      warnings.push({
        code: 'PARSE_LIMIT',
        line: block.line,
        message: `The block at line ${block.line} has more than ${EMPHASIS_BUDGET} emphasis marks; emphasis was not read on this page (links were).`,
      });
    }
    const lonely = unmatchedBrackets(text, block);
    if (lonely.length <= BRACKET_BUDGET) continue;
    for (const offset of lonely) blank.add(offset);
    warnings.push({
      code: 'PARSE_LIMIT',
      line: block.line,
      message: `The block at line ${block.line} has ${lonely.length} unpaired brackets; they were read as plain spaces.`,
    });
  }
  if (blank.size === 0) return { text, emphasisOff };
  const chars = text.split('');
  for (const offset of blank) chars[offset] = ' ';
  return { text: chars.join(''), emphasisOff };
}
