// Turns the rows an editor selected into task drafts that hold exactly those findings: one draft per row, or
// one grouped draft listing them all. Titles and details are written from the latest run's findings, so a
// writer sees what to fix (each link with its line; suggested source pages with their score gain).
import type { SelectedLink, TaskFinding, TaskGrouping, TaskKind, TaskLinkFinding } from '@linkloom/shared';
import type { PageFinding } from './run-findings.repository.js';

type Source = { path: string; title: string; scoreGain: number };

export interface TaskDraft {
  pagePath: string;
  title: string;
  finding: TaskFinding;
  details: string;
  /** The front-matter owner the task goes to when no assignee is chosen. */
  ownerEmail: string | null;
}

const TITLES: Record<TaskKind, string> = {
  'add-inbound-links': 'Add inbound links to',
  'repair-broken-links': 'Repair broken links on',
  'add-outbound-links': 'Add outbound links from',
  'make-reachable': 'Make reachable:',
  'review-pruning': 'Review for pruning:',
  other: 'Work on',
};

export function pageFlags(page: PageFinding | undefined): string[] {
  if (!page) return [];
  return [page.orphan && 'orphan', page.deadEnd && 'dead-end', !page.reachable && 'unreachable', page.deep && 'deep'].filter(
    Boolean,
  ) as string[];
}

/** One owner for a group only when every page has the same one. */
function commonOwner(paths: string[], pages: ReadonlyMap<string, PageFinding>): string | null {
  const owners = new Set(paths.map((p) => pages.get(p)?.ownerEmail ?? null));
  return owners.size === 1 ? [...owners][0] : null;
}

export function linkLine(link: TaskLinkFinding, pagePath: string): string {
  return `- ${link.sourcePath ?? pagePath} line ${link.line}: ${link.href} (${link.status})`;
}

function linkDraft(links: TaskLinkFinding[], pages: ReadonlyMap<string, PageFinding>, title?: string): TaskDraft {
  const paths = [...new Set(links.map((l) => l.sourcePath!))];
  const where = paths.length === 1 ? paths[0] : `${paths.length} pages`;
  const fallback =
    links.length === 1 ? `Repair broken link on ${where}: ${links[0].href}` : `Repair ${links.length} broken links on ${where}`;
  return {
    pagePath: paths[0],
    title: (title ?? fallback).slice(0, 300),
    finding: { brokenLinks: links, flags: paths.length === 1 ? pageFlags(pages.get(paths[0])) : [] },
    details: [`${links.length === 1 ? 'The broken link' : 'The broken links'} to repair:`, ...links.map((l) => linkLine(l, paths[0]))].join(
      '\n',
    ),
    ownerEmail: commonOwner(paths, pages),
  };
}

/** Drafts for selected links; `links` carry the status the latest run gives them. */
export function linkDrafts(
  links: (SelectedLink & { status: string })[],
  pages: ReadonlyMap<string, PageFinding>,
  grouping: TaskGrouping,
  title?: string,
): TaskDraft[] {
  if (grouping === 'grouped') return [linkDraft(links, pages, title)];
  return links.map((l) => linkDraft([l], pages, links.length === 1 ? title : undefined));
}

function sourcesText(sources: Source[]): string[] {
  return sources.length
    ? ['Pages that could link here (score gain):', ...sources.map((s) => `- ${s.path} (+${s.scoreGain.toPrecision(3)})`)]
    : [];
}

function singlePageDraft(
  kind: TaskKind,
  path: string,
  pages: ReadonlyMap<string, PageFinding>,
  sources: Source[],
  title?: string,
): TaskDraft {
  const page = pages.get(path);
  const flags = pageFlags(page);
  const broken = kind === 'repair-broken-links' ? (page?.brokenLinks ?? []).slice(0, 200).map((b) => ({ sourcePath: path, ...b })) : [];
  const count = broken.length ? ` (${broken.length})` : '';
  const lines = [
    ...(flags.length ? [`Findings in the latest run: ${flags.join(', ')}.`] : []),
    ...(broken.length ? ['Broken links:', ...broken.map((b) => linkLine(b, path))] : []),
    ...sourcesText(sources),
  ];
  return {
    pagePath: path,
    title: (title ?? `${TITLES[kind]} ${path}${count}`).slice(0, 300),
    finding: { flags, ...(broken.length ? { brokenLinks: broken } : {}), ...(sources.length ? { suggestedSources: sources } : {}) },
    details: lines.join('\n'),
    ownerEmail: page?.ownerEmail ?? null,
  };
}

/** Drafts for selected pages (orphans, dead ends, unreachable, or a page's own findings). */
export function pageDrafts(
  kind: TaskKind,
  paths: string[],
  pages: ReadonlyMap<string, PageFinding>,
  sources: ReadonlyMap<string, Source[]>,
  grouping: TaskGrouping,
  title?: string,
): TaskDraft[] {
  if (grouping === 'per-row' || paths.length === 1) {
    return paths.map((p) => singlePageDraft(kind, p, pages, sources.get(p) ?? [], paths.length === 1 ? title : undefined));
  }
  const listed = paths.map((path) => ({ path, flags: pageFlags(pages.get(path)) }));
  return [
    {
      pagePath: paths[0],
      title: (title ?? `${TITLES[kind]} ${paths.length} pages`).slice(0, 300),
      finding: { pages: listed },
      details: ['The pages of this task:', ...listed.map((p) => `- ${p.path}${p.flags.length ? ` (${p.flags.join(', ')})` : ''}`)].join(
        '\n',
      ),
      ownerEmail: commonOwner(paths, pages),
    },
  ];
}
