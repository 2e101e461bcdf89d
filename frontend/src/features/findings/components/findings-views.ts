// Pure description of the findings views: which need each serves, where its count comes from in the run's
// counts, and which sub-kinds it offers. The route and the side list both read this table.
import type { LinkStatus, PageFlag, RunCounts, RunPageItem } from '@linkloom/shared';

export type FindingsViewId = 'needs-links' | 'dead-ends' | 'broken-links' | 'unsafe-ambiguous' | 'islands';

export interface SubKind {
  id: string;
  label: string;
  /** Pages views filter by flag, links views by status. */
  flag?: PageFlag;
  status?: LinkStatus;
  count: (c: RunCounts) => number;
}

export interface FindingsView {
  id: FindingsViewId;
  label: string;
  /** The need, in a sentence, shown above the list. */
  need: string;
  source: 'pages' | 'links' | 'islands';
  kinds: SubKind[];
}

const n = (v: number | undefined) => v ?? 0;

export const FINDINGS_VIEWS: FindingsView[] = [
  {
    id: 'needs-links',
    label: 'Pages that need links',
    source: 'pages',
    need: 'Readers cannot find these pages by clicking: link to them from related, well-visited pages.',
    kinds: [
      { id: 'orphan', label: 'Orphans', flag: 'orphan', count: (c) => c.orphans },
      { id: 'unreachable', label: 'Unreachable', flag: 'unreachable', count: (c) => c.unreachable },
      { id: 'deep', label: 'Deep', flag: 'deep', count: (c) => c.deepPages },
    ],
  },
  {
    id: 'dead-ends',
    label: 'Dead ends',
    source: 'pages',
    need: 'These pages link to no other page, so the reader is stranded: add a link onwards.',
    kinds: [{ id: 'dead-end', label: 'Dead ends', flag: 'dead-end', count: (c) => c.deadEnds }],
  },
  {
    id: 'broken-links',
    label: 'Broken links and anchors',
    source: 'links',
    need: 'Links to a page, file or heading that is not there: repair or remove them.',
    kinds: [
      { id: 'broken', label: 'Missing target', status: 'broken', count: (c) => c.brokenLinks },
      { id: 'broken-anchor', label: 'Missing anchor', status: 'broken-anchor', count: (c) => c.brokenAnchors },
    ],
  },
  {
    id: 'unsafe-ambiguous',
    label: 'Unsafe and ambiguous links',
    source: 'links',
    need: 'Unsafe links run code or embed data when clicked; ambiguous wiki links match more than one page.',
    kinds: [
      { id: 'unsafe', label: 'Unsafe', status: 'unsafe', count: (c) => n(c.unsafeLinks) },
      { id: 'ambiguous', label: 'Ambiguous', status: 'ambiguous', count: (c) => n(c.ambiguousLinks) },
    ],
  },
  {
    id: 'islands',
    label: 'Islands',
    source: 'islands',
    need: 'Groups of pages linked among themselves but cut off from the entry pages: link one of them from the main tree.',
    kinds: [{ id: 'island', label: 'Islands', count: (c) => c.islands }],
  },
];

/** Older or shorter view names (the Overview's headline cards use these) and the sub-kind each opens. */
const ALIASES: Record<string, { view: FindingsViewId; kind: string }> = {
  orphans: { view: 'needs-links', kind: 'orphan' },
  unreachable: { view: 'needs-links', kind: 'unreachable' },
  'deep-pages': { view: 'needs-links', kind: 'deep' },
  'broken-anchors': { view: 'broken-links', kind: 'broken-anchor' },
  unsafe: { view: 'unsafe-ambiguous', kind: 'unsafe' },
  ambiguous: { view: 'unsafe-ambiguous', kind: 'ambiguous' },
};

export function resolveView(param: string | undefined, kindParam: string): { view: FindingsView; kind: SubKind } {
  const alias = param ? ALIASES[param] : undefined;
  const view = FINDINGS_VIEWS.find((v) => v.id === (alias?.view ?? param)) ?? FINDINGS_VIEWS[0];
  const wanted = kindParam || alias?.kind;
  const kind = view.kinds.find((k) => k.id === wanted) ?? view.kinds[0];
  return { view, kind };
}

export function viewCount(view: FindingsView, counts: RunCounts): number {
  return view.kinds.reduce((sum, k) => sum + k.count(counts), 0);
}

/** Why a page is listed under a pages view, in a sentence a writer can act on. */
export function pageReason(row: RunPageItem, flag: PageFlag | undefined): string {
  switch (flag) {
    case 'orphan':
      return 'No other page links here.';
    case 'unreachable':
      return 'No chain of links leads here from an entry page.';
    case 'deep':
      return `${row.depth ?? '?'} clicks from the nearest entry page.`;
    case 'dead-end':
      return `Links to no other page${row.brokenLinkCount ? `; ${row.brokenLinkCount} broken link(s) do not count` : ''}.`;
    default:
      return '';
  }
}
