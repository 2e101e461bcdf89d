// What one digest says, as data: built from the run diff between the reader's last covered run and the
// newest run (so its numbers are the diff's numbers), the tasks those runs verified or reopened, pruning
// decisions since, and the newest run's totals. Pure; rendering to text and HTML is digest-render.ts.
import type { RunCounts } from '@linkloom/shared';
import { singleLineText } from '../mail/mail-address.js';

type ChangeList = { total: number; items: Record<string, unknown>[] };
export type DiffKinds = Record<string, { appeared: ChangeList; disappeared: ChangeList }>;

export interface DigestRun {
  id: string;
  number: number | null;
  finishedAt: Date;
  /** Pages in the run, to show scores as "times the average" of that run. */
  pageCount: number;
}

export interface TaskOutcome {
  title: string;
  pagePath: string;
  assigneeName: string | null;
  runNumber: number | null;
}

export interface PruningDecisionFact {
  path: string;
  decision: 'approve' | 'reject' | 'keep';
  by: string;
  at: Date;
}

export interface DigestInput {
  docSet: { id: string; name: string };
  run: DigestRun & { counts: RunCounts | null };
  /** The run the reader's last digest covered (or the run before, for a first digest); null when there is none. */
  against: DigestRun | null;
  diff: { kinds: DiffKinds; scoreMoves: { path: string; title: string; before: number; after: number }[] } | null;
  tasks: { verified: TaskOutcome[]; reopened: TaskOutcome[] };
  pruning: { decisions: PruningDecisionFact[]; waiting: number };
}

export interface ChangeSide {
  word: string;
  total: number;
  items: string[];
}

export interface DigestSection {
  kind: string;
  label: string;
  appeared: ChangeSide;
  disappeared: ChangeSide;
}

export interface ScoreMover {
  path: string;
  title: string;
  before: number;
  after: number;
}

export interface DigestContent {
  docSet: { id: string; name: string };
  run: DigestRun;
  against: DigestRun | null;
  /** Only kinds with a change, in reading order. */
  sections: DigestSection[];
  scoreMovers: ScoreMover[];
  tasks: DigestInput['tasks'];
  pruning: DigestInput['pruning'];
  totals: { label: string; value: number }[];
  nothingChanged: boolean;
}

/** Finding kinds of the diff a digest reports, with the words for their two directions. Broken links and anchors stay apart. */
export const DIGEST_KINDS: { kind: string; label: string; appeared: string; disappeared: string }[] = [
  { kind: 'brokenLinks', label: 'Broken links', appeared: 'new', disappeared: 'fixed' },
  { kind: 'brokenAnchors', label: 'Broken anchors', appeared: 'new', disappeared: 'fixed' },
  { kind: 'pages', label: 'Pages', appeared: 'added', disappeared: 'removed' },
  { kind: 'orphans', label: 'Orphan pages', appeared: 'became orphans', disappeared: 'no longer orphans' },
  { kind: 'unreachable', label: 'Unreachable pages', appeared: 'became unreachable', disappeared: 'no longer unreachable' },
  { kind: 'deadEnds', label: 'Dead ends', appeared: 'new', disappeared: 'gone' },
  { kind: 'deepPages', label: 'Deep pages', appeared: 'new', disappeared: 'gone' },
];

const TOTALS: { key: keyof RunCounts; label: string }[] = [
  { key: 'pages', label: 'Pages' },
  { key: 'brokenLinks', label: 'Broken links' },
  { key: 'brokenAnchors', label: 'Broken anchors' },
  { key: 'orphans', label: 'Orphan pages' },
  { key: 'unreachable', label: 'Unreachable pages' },
  { key: 'deadEnds', label: 'Dead ends' },
  { key: 'deepPages', label: 'Deep pages' },
];

/** Listed items per direction; the totals are always the diff's exact totals. */
export const ITEMS_SHOWN = 10;
const MOVERS = 5;
/** A move smaller than this (in "times the average") is noise for a reader. */
const MOVE_THRESHOLD = 0.05;

/** A finding as one line; a finding that is gone because its page was removed says so, not "fixed". */
function describeItem(item: Record<string, unknown>, removed: ReadonlySet<string>): string {
  const page = String(item.sourcePath ?? item.path ?? '');
  const text = typeof item.href === 'string' ? `${page} → ${item.href}` : page;
  return removed.has(page) ? `${text} (page removed)` : text;
}

function side(word: string, list: ChangeList | undefined, removed: ReadonlySet<string>): ChangeSide {
  return { word, total: list?.total ?? 0, items: (list?.items ?? []).slice(0, ITEMS_SHOWN).map((i) => describeItem(i, removed)) };
}

function scoreMovers(moves: NonNullable<DigestInput['diff']>['scoreMoves'], before: number, after: number): ScoreMover[] {
  return moves
    .map((m) => ({ path: m.path, title: m.title, before: m.before * before, after: m.after * after }))
    .filter((m) => Math.abs(m.after - m.before) >= MOVE_THRESHOLD)
    .slice(0, MOVERS);
}

export function buildDigestContent(input: DigestInput): DigestContent {
  const kinds = input.diff?.kinds ?? {};
  const removed = new Set((kinds.pages?.disappeared.items ?? []).map((p) => String(p.path)));
  const sections = DIGEST_KINDS.map(({ kind, label, appeared, disappeared }) => ({
    kind,
    label,
    appeared: side(appeared, kinds[kind]?.appeared, kind === 'pages' ? new Set() : removed),
    disappeared: side(disappeared, kinds[kind]?.disappeared, kind === 'pages' ? new Set() : removed),
  })).filter((s) => s.appeared.total + s.disappeared.total > 0);
  const movers = scoreMovers(input.diff?.scoreMoves ?? [], input.against?.pageCount ?? 0, input.run.pageCount);
  const work = input.tasks.verified.length + input.tasks.reopened.length + input.pruning.decisions.length;
  const totals = input.run.counts ? TOTALS.map(({ key, label }) => ({ label, value: input.run.counts![key] })) : [];
  return {
    // A name is the reader's to see, never a way to start a line or a header of its own.
    docSet: { id: input.docSet.id, name: singleLineText(input.docSet.name) },
    run: { id: input.run.id, number: input.run.number, finishedAt: input.run.finishedAt, pageCount: input.run.pageCount },
    against: input.against,
    sections,
    scoreMovers: movers,
    tasks: input.tasks,
    pruning: input.pruning,
    totals,
    nothingChanged: sections.length === 0 && movers.length === 0 && work === 0,
  };
}
