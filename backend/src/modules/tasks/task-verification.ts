// Verification by the next run: a task is "done" in the trade's sense only when the run no longer shows its
// finding. Pure decision functions; the service loads tasks and findings and applies what they return.
import type { PageFinding } from './run-findings.repository.js';

export type TaskKind = 'add-inbound-links' | 'repair-broken-links' | 'add-outbound-links' | 'make-reachable' | 'review-pruning' | 'other';
export type TaskStatus = 'open' | 'in-progress' | 'done' | 'wont-fix';
export type Verification = 'verified' | 'flagged' | null;

/**
 * Whether the run still shows the finding the task is about; `null` when a run cannot tell (review-pruning,
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

export interface VerificationInput {
  status: TaskStatus;
  verification: Verification;
}

export interface VerificationChange {
  status: TaskStatus;
  verification: Verification;
  /** A sentence for the task's history. */
  note: string;
}

/**
 * gone -> verified (the status moves to done: the work is visibly finished);
 * back after being verified -> reopened; done but still there -> flagged. Returns null when nothing changes.
 */
export function verificationStep(task: VerificationInput, present: boolean | null): VerificationChange | null {
  if (present === null || task.status === 'wont-fix') return null;
  if (!present) {
    if (task.verification === 'verified' && task.status === 'done') return null;
    return { status: 'done', verification: 'verified', note: 'The latest run no longer shows this finding: verified.' };
  }
  if (task.verification === 'verified') {
    return { status: 'open', verification: null, note: 'The finding is back in the latest run: reopened.' };
  }
  if (task.status === 'done' && task.verification !== 'flagged') {
    return { status: 'done', verification: 'flagged', note: 'Marked done, but the latest run still shows the finding.' };
  }
  return null;
}
