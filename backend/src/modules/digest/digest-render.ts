// A digest's words: the subject, the plain-text part and the styled HTML, carrying the same numbers.
import { bulletList, button, dataTable, heading, type Html, link, paragraph, smallPrint } from '../mail/mail-layout.js';
import type { MailContent } from '../notifications/mail-composer.service.js';
import { formatInZone } from '../notifications/mail-dates.js';
import type { DigestContent, DigestSection, PruningDecisionFact, TaskOutcome } from './digest-content.js';

export interface DigestLinks {
  /** The newest run's findings in the app. */
  findings: string;
  /** The comparison of the two runs in the app. */
  compare: string | null;
}

const runName = (run: { number: number | null }) => (run.number ? `run ${run.number}` : 'the run');
const DECISION_WORDS = { approve: 'approved for pruning', reject: 'rejected', keep: 'kept' } as const;

const sectionTitle = (s: DigestSection) =>
  `${s.label}: ${s.appeared.total} ${s.appeared.word}, ${s.disappeared.total} ${s.disappeared.word}`;

/** The first kinds that changed, for the subject line. */
function headline(content: DigestContent): string {
  if (content.nothingChanged) return 'nothing changed since your last digest';
  const parts = content.sections.slice(0, 3).map(sectionTitle);
  if (content.sections.length > 3) parts.push('more inside');
  return parts.join('; ') || 'scores and work moved';
}

/** One part of the digest in both forms, so the text and the HTML always carry the same numbers. */
interface Block {
  text: string[];
  html: Html[];
}

function sectionBlock(s: DigestSection): Block {
  const title = sectionTitle(s);
  const block: Block = { text: [title], html: [heading(title)] };
  for (const d of [s.appeared, s.disappeared]) {
    if (d.total === 0) continue;
    const more = d.total > d.items.length ? [`and ${d.total - d.items.length} more`] : [];
    block.text.push(...[...d.items, ...more].map((i) => `  ${d.word}: ${i}`));
    block.html.push(paragraph(`${d.word[0].toUpperCase()}${d.word.slice(1)}:`, true), bulletList([...d.items, ...more]));
  }
  return block;
}

function moversBlock(content: DigestContent): Block[] {
  if (content.scoreMovers.length === 0) return [];
  const title = 'Largest score moves (times the average)';
  const rows = content.scoreMovers.map((m) => [m.path, Number(m.before.toFixed(2)), Number(m.after.toFixed(2))]);
  return [
    {
      text: [`${title}:`, ...rows.map(([path, before, after]) => `  ${path}: ${before} -> ${after}`)],
      html: [heading(title), dataTable(['Page', 'Before', 'After'], rows)],
    },
  ];
}

const taskLine = (t: TaskOutcome) =>
  `${t.title} (${t.pagePath})${t.assigneeName ? `, ${t.assigneeName}` : ''}${t.runNumber ? `, by run ${t.runNumber}` : ''}`;
const decisionLine = (d: PruningDecisionFact, zone: string) =>
  `${d.path}: ${DECISION_WORDS[d.decision]} by ${d.by}, ${formatInZone(d.at, zone)}`;

function workBlocks(content: DigestContent, zone: string): Block[] {
  const lists: [string, string[]][] = [
    ['Tasks fixed and verified', content.tasks.verified.map(taskLine)],
    ['Tasks reopened (the finding is back)', content.tasks.reopened.map(taskLine)],
    ['Pruning decisions', content.pruning.decisions.map((d) => decisionLine(d, zone))],
  ];
  const blocks = lists
    .filter(([, lines]) => lines.length > 0)
    .map(([label, lines]) => ({
      text: [`${label}: ${lines.length}`, ...lines.map((l) => `  ${l}`)],
      html: [heading(`${label}: ${lines.length}`), bulletList(lines)],
    }));
  const waiting = `Pages waiting for a pruning decision: ${content.pruning.waiting}`;
  return content.pruning.waiting > 0 ? [...blocks, { text: [waiting], html: [paragraph(waiting)] }] : blocks;
}

function totalsBlock(content: DigestContent): Block {
  return {
    text: [`Totals now: ${content.totals.map((t) => `${t.label.toLowerCase()} ${t.value}`).join(', ')}`],
    html: [
      heading('Totals now'),
      dataTable(
        ['Finding', 'Count'],
        content.totals.map((t) => [t.label, t.value]),
      ),
    ],
  };
}

function introBlock(content: DigestContent, zone: string, links: DigestLinks): Block {
  const { docSet, run, against } = content;
  const since = against ? `since ${runName(against)} of ${formatInZone(against.finishedAt, zone)}` : 'in the first run of this doc set';
  const intro = `What changed in ${docSet.name} ${since}, up to ${runName(run)} of ${formatInZone(run.finishedAt, zone)}.`;
  const compare = links.compare ? [`Compare the two runs: ${links.compare}`] : [];
  const nothing = content.nothingChanged ? 'Nothing changed since your last digest.' : null;
  return {
    text: [intro, `Open the findings: ${links.findings}`, ...compare, ...(nothing ? ['', nothing] : [])],
    html: [paragraph(intro), button('Open the findings', links.findings), ...(nothing ? [paragraph(nothing)] : [])],
  };
}

export function renderDigest(content: DigestContent, timeZone: string, links: DigestLinks): MailContent {
  const intro = introBlock(content, timeZone, links);
  const blocks = [
    intro,
    ...content.sections.map(sectionBlock),
    ...moversBlock(content),
    ...workBlocks(content, timeZone),
    totalsBlock(content),
  ];
  const compareLink = links.compare ? [smallPrint([link('Compare the two runs in Linkloom', links.compare)])] : [];
  return {
    subject: `Linkloom digest: ${content.docSet.name}: ${headline(content)}`,
    title: `${content.docSet.name}: what changed`,
    preheader: intro.text[0],
    text: blocks.flatMap((b, i) => (i === 0 ? b.text : ['', ...b.text])),
    body: [...blocks.flatMap((b) => b.html), ...compareLink],
    reason: `you follow the digest of ${content.docSet.name}`,
  };
}
