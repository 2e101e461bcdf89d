import { Injectable } from '@nestjs/common';
import type { RunRow } from '../../db/schema/index.js';
import { FindingsService } from './findings/findings.service.js';
import { RunHistoryRepository } from './run-history.repository.js';

export type RunDiff = Awaited<ReturnType<FindingsService['diff']>>;

/**
 * Looks back over a doc set's finished runs on behalf of the server itself (no person's access to check): the
 * run a reader's last digest covered, the runs since, and the diff between two runs, the same diff the API shows.
 */
@Injectable()
export class RunHistoryService {
  constructor(
    private readonly history: RunHistoryRepository,
    private readonly findings: FindingsService,
  ) {}

  finishedRun(docSetId: string, runId: string): Promise<RunRow | null> {
    return this.history.finishedRun(docSetId, runId);
  }

  /** The run before this one: the previous nightly run when there is one (last night's digest), else any. */
  async previousNightlyOrAny(run: RunRow): Promise<RunRow | null> {
    return (await this.history.finishedBefore(run, 'nightly')) ?? this.history.finishedBefore(run);
  }

  /** Runs finished after `after` (exclusive) up to `upto` (inclusive); every run when `after` is null. */
  finishedBetween(after: RunRow | null, upto: RunRow): Promise<RunRow[]> {
    return this.history.finishedBetween(upto.docSetId, after?.finishedAt ?? null, upto.finishedAt!);
  }

  diff(run: RunRow, against: RunRow): Promise<RunDiff> {
    return this.findings.diff(run, against);
  }
}
