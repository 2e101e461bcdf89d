import { fillerParagraph, fillerSentence, LINK_SENTENCES } from './filler-text.js';
import { linkSyntax, type SyntaxContext } from './link-syntax.js';
import { pick, randomFor, type Random } from './prng.js';
import type { PagePlan, PlannedLink, RenderedLink } from './types.js';

/** Raw HTML anchors (`id` attributes) some pages carry, which docs/link-rules.md rule 7 counts as link targets. */
export const HTML_IDS: Record<string, string[]> = { 'policies/key-holding.md': ['key-register'] };

const STANDALONE = new Set(['image', 'wiki-image', 'embed']);

/** Writes lines and remembers, for every link, the 1-based file line it lands on. */
class PageWriter {
  readonly lines: string[] = [];
  readonly links: RenderedLink[] = [];
  readonly definitions = new Map<string, string>();
  constructor(
    private readonly ctx: SyntaxContext,
    private readonly random: Random,
  ) {}

  push(...lines: string[]): void {
    this.lines.push(...lines);
  }

  linkLine(link: PlannedLink, prefix: string): void {
    const { snippet, href, definition } = linkSyntax(link, this.ctx);
    if (definition) this.definitions.set(definition.slice(0, definition.indexOf(']:')).toLowerCase(), definition);
    const sentence = STANDALONE.has(link.form) ? snippet : pick(this.random, LINK_SENTENCES).replace('{L}', snippet);
    this.links.push({ ...link, href, line: this.lines.length + 1 });
    this.lines.push(prefix + sentence);
  }
}

function frontMatter(page: PagePlan): string[] {
  const lines = ['---', `title: ${JSON.stringify(page.title)}`];
  if (page.aliases) lines.push(`aliases: [${page.aliases.map((a) => JSON.stringify(a)).join(', ')}]`);
  if (page.owner) lines.push(`owner: ${page.owner}`);
  lines.push(`tags: [${page.tags.join(', ')}]`, `reviewed: ${page.reviewed}`);
  if (page.redirectFrom) lines.push('redirect_from:', ...page.redirectFrom.map((r) => `  - ${r}`));
  return [...lines, '---', ''];
}

/** Blocks that make pages look real and carry link-like text that must not count as links. */
function kindBlock(page: PagePlan, heading: string, random: Random): string[] {
  const h = heading.replace(/^#+\s+/, '');
  if (h === 'Steps') {
    return [
      '1. ' + fillerSentence(random),
      '2. ' + fillerSentence(random),
      '3. ' + fillerSentence(random),
      '',
      'Paste this note into Hatchbook when you are done (it is an example, not a link):',
      '',
      '```markdown',
      'Checked against [the old slip](forms/loan-slip-v1.md) and [[Paper Loan Cards]].',
      '<a href="../../nowhere.md">legacy form</a> https://old.brackenridge-tools.example/slips',
      '```',
      '',
    ];
  }
  if (h === 'First five minutes') {
    return [
      '```sh',
      'curl -s https://status.hatchbook.example/api/v1/health | jq .status',
      '# then see [runbook](../missing.md)',
      '```',
      '',
    ];
  }
  if (h === 'The rules' || h === 'At a glance') {
    return [
      '| Item | Rule | Since |',
      '| --- | --- | --- |',
      `| Loans | Two weeks, one renewal | 2021 |`,
      `| Deposits | Sliding scale, see desk | 2022 |`,
      `| Kit bundles | Hosts only | 2024 |`,
      '',
    ];
  }
  if (h === 'Decisions') return [`- ${fillerSentence(random)}`, `- ${fillerSentence(random)}`, ''];
  if (h === 'Before you start')
    return ['Type `[[Van Rota]]` or `[rota](rota.md)` in a Hatchbook note to point at the rota; in this handbook it is plain text.', ''];
  if (h === 'Purpose' && HTML_IDS[page.path]) return HTML_IDS[page.path]!.map((id) => `<div id="${id}"></div>`).concat('');
  return [];
}

/** Markdown of one page and the links it holds, each with its line. */
export function renderPage(page: PagePlan, outgoing: readonly PlannedLink[], ctx: SyntaxContext): { text: string; links: RenderedLink[] } {
  const random = randomFor(0x11d0, page.path);
  const w = new PageWriter(ctx, random);
  w.push(...frontMatter(page), `# ${page.title}`, '');
  if (page.thin || page.headings.length === 0) {
    w.push(fillerSentence(random));
    for (const link of outgoing) w.linkLine(link, '');
  } else {
    w.push(...fillerParagraph(random, 2), '');
    const sections = page.headings.map(() => [] as PlannedLink[]);
    outgoing.forEach((l, i) => sections[i % sections.length]!.push(l));
    page.headings.forEach((heading, i) => {
      w.push(heading, '', ...fillerParagraph(random, 1 + (i % 2)), '');
      const mine = sections[i]!;
      for (const link of mine) w.linkLine(link, mine.length >= 3 ? '- ' : '');
      if (mine.length) w.push('');
      w.push(...kindBlock(page, heading, random));
    });
  }
  if (w.definitions.size) w.push('', ...w.definitions.values());
  if (page.path === 'reference/glossary.md') w.push('', '[old-keys-page]: ../archive/2018-depot-keys.md');
  return { text: w.lines.join('\n') + '\n', links: w.links };
}
