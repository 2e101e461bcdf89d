// Turns a page's findings from the latest run into a task's title, details and finding record, so a writer
// sees exactly what to fix (broken hrefs with their lines; suggested source pages with their score gain).
import type { TaskFinding } from '../../db/schema/work.js';
import type { PageFinding } from './run-findings.repository.js';
import type { TaskKind } from './task-verification.js';

type Source = { path: string; title: string; scoreGain: number };

const TITLES: Record<TaskKind, string> = {
  'add-inbound-links': 'Add inbound links to',
  'repair-broken-links': 'Repair broken links on',
  'add-outbound-links': 'Add outbound links from',
  'make-reachable': 'Make reachable:',
  'review-pruning': 'Review for pruning:',
  other: 'Work on',
};

export function defaultTitle(kind: TaskKind, pagePath: string, page?: PageFinding): string {
  const count = kind === 'repair-broken-links' && page?.brokenLinks.length ? ` (${page.brokenLinks.length})` : '';
  return `${TITLES[kind]} ${pagePath}${count}`.slice(0, 300);
}

export function prefillFinding(kind: TaskKind, page: PageFinding | undefined, sources: Source[] = []): TaskFinding {
  if (!page) return {};
  const flags = [page.orphan && 'orphan', page.deadEnd && 'dead-end', !page.reachable && 'unreachable', page.deep && 'deep'].filter(
    Boolean,
  ) as string[];
  if (kind === 'repair-broken-links') return { flags, brokenLinks: page.brokenLinks.slice(0, 200) };
  if (kind === 'add-inbound-links' || kind === 'make-reachable') return { flags, suggestedSources: sources };
  return { flags };
}

export function prefillDetails(kind: TaskKind, finding: TaskFinding): string {
  const lines: string[] = [];
  if (finding.flags?.length) lines.push(`Findings in the latest run: ${finding.flags.join(', ')}.`);
  if (kind === 'repair-broken-links' && finding.brokenLinks?.length) {
    lines.push('Broken links:');
    for (const b of finding.brokenLinks) lines.push(`- line ${b.line}: ${b.href} (${b.status})`);
  }
  if (finding.suggestedSources?.length) {
    lines.push('Pages that could link here (score gain):');
    for (const s of finding.suggestedSources) lines.push(`- ${s.path} (+${s.scoreGain.toPrecision(3)})`);
  }
  return lines.join('\n');
}
