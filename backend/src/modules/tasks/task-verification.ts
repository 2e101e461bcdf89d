// Verification by later runs: a task is fixed only when a run no longer finds any of its findings, judged
// finding by finding (which link is still found). Pure decision functions; the verifier service loads tasks
// and findings and applies what they return.
import type { TaskCheck, TaskCheckItem, TaskFinding, TaskKind, TaskStatus } from '@linkloom/shared';
import type { PageFinding } from './run-findings.repository.js';

export type { TaskKind, TaskStatus };
export type Verification = 'verified' | 'flagged' | null;

/**
 * Whether the run still shows a page finding of this kind; `null` when a run cannot tell (review-pruning,
 * other). A page missing from the run has no finding any more (it was moved or removed).
 */
export function findingPresent(kind: TaskKind, page: PageFinding | undefined): boolean | null {
  if (kind === 'review-pruning' || kind === 'other') return null;
  if (!page) return false;
  switch (kind) {
    case 'add-inbound-links':
      return page.orphan;
    case 'repair-broken-links':
      return page.brokenLinks.length > 0;
    case 'add-outbound-links':
      return page.deadEnd;
    case 'make-reachable':
      return !page.reachable;
  }
}

export interface CheckedTask {
  kind: TaskKind;
  pagePath: string;
  finding: TaskFinding;
}

function linkItems(task: CheckedTask, pages: ReadonlyMap<string, PageFinding>): TaskCheckItem[] {
  return (task.finding.brokenLinks ?? []).map((link) => {
    const pagePath = link.sourcePath ?? task.pagePath;
    // Lines move when text is edited above a link, so the same href on the same page is the same finding.
    const still = pages.get(pagePath)?.brokenLinks.find((b) => b.href === link.href);
    return { pagePath, href: link.href, line: still?.line ?? link.line, stillFound: !!still, status: still?.status ?? null };
  });
}

/** The task's findings as this run sees them, one item per link or page; null when a run cannot judge the kind. */
export function checkItems(task: CheckedTask, pages: ReadonlyMap<string, PageFinding>): TaskCheckItem[] | null {
  if (task.kind === 'repair-broken-links' && task.finding.brokenLinks?.length) return linkItems(task, pages);
  const paths = task.finding.pages?.length ? task.finding.pages.map((p) => p.path) : [task.pagePath];
  const items = paths.map((pagePath) => {
    const present = findingPresent(task.kind, pages.get(pagePath));
    return present === null ? null : { pagePath, href: null, line: null, stillFound: present, status: null };
  });
  return items.some((i) => i === null) ? null : (items as TaskCheckItem[]);
}

/** "guide/a.md line 12: ../b.md (broken)" or just the page path. */
export function describeItem(item: TaskCheckItem): string {
  if (item.href === null) return item.pagePath;
  return `${item.pagePath} line ${item.line}: ${item.href}${item.status ? ` (${item.status})` : ''}`;
}

export interface VerificationInput {
  status: TaskStatus;
  verification: Verification;
}

export interface VerificationChange {
  status: TaskStatus;
  verification: Verification;
  outcome: TaskCheck['outcome'];
  /** A sentence for the task's history. */
  note: string;
}

const runName = (runNumber: number | null) => (runNumber ? `Run ${runNumber}` : 'The latest run');

function stillFoundText(items: TaskCheckItem[]): string {
  const found = items.filter((i) => i.stillFound);
  return `${found.length} of ${items.length}: ${found.map(describeItem).join('; ')}`;
}

/** The outcome recorded with a check, whether or not the status changes. */
export function checkOutcome(items: TaskCheckItem[], change: VerificationChange | null): TaskCheck['outcome'] {
  if (change) return change.outcome;
  const found = items.filter((i) => i.stillFound).length;
  if (found === 0) return 'verified';
  return found < items.length ? 'partly-fixed' : 'still-found';
}

/**
 * Everything gone -> `verified` ("fixed and verified by run N", a state of its own, whatever the writer set);
 * back after being verified -> reopened; marked done but still found -> flagged, naming what is still found.
 * Returns null when the status stays as it is.
 */
export function verificationStep(task: VerificationInput, items: TaskCheckItem[], runNumber: number | null): VerificationChange | null {
  if (task.status === 'wont-fix' || items.length === 0) return null;
  const run = runName(runNumber);
  if (items.every((i) => !i.stillFound)) {
    if (task.status === 'verified') return null;
    return { status: 'verified', verification: 'verified', outcome: 'verified', note: `${run} no longer finds this: fixed and verified.` };
  }
  if (task.status === 'verified') {
    return {
      status: 'open',
      verification: null,
      outcome: 'reopened',
      note: `${run} finds it again, so it is reopened. Still found: ${stillFoundText(items)}.`,
    };
  }
  if (task.status === 'done' && task.verification !== 'flagged') {
    return {
      status: 'done',
      verification: 'flagged',
      outcome: 'still-found',
      note: `Marked done, but ${run.toLowerCase()} still finds ${stillFoundText(items)}.`,
    };
  }
  return null;
}
