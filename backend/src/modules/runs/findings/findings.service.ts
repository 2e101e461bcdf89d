import { Injectable } from '@nestjs/common';
import type { RunRow } from '../../../db/schema/index.js';
import type { LinkListQuery } from '../run-queries.js';
import { DiffRepository, LINK_FINDINGS, PAGE_FINDINGS } from './diff.repository.js';
import { FindingsRepository, type LinkRowView } from './findings.repository.js';
import { hrefFields } from './safe-href.js';

/** Link findings, islands, the score distribution and the comparison of two runs. */
@Injectable()
export class FindingsService {
  constructor(
    private readonly findings: FindingsRepository,
    private readonly diffs: DiffRepository,
  ) {}

  async links(run: RunRow, query: LinkListQuery) {
    const offset = (query.page - 1) * query.pageSize;
    const filter = { status: query.status, source: query.source };
    if (query.groupBy === 'target') {
      const { rows, total } = await this.findings.brokenByTarget(run.snapshotId, filter, offset, query.pageSize);
      return { items: rows, total, page: query.page, pageSize: query.pageSize, groupBy: 'target' as const };
    }
    const { rows, total } = await this.findings.links(run.snapshotId, filter, offset, query.pageSize);
    return { items: rows.map(toLinkItem), total, page: query.page, pageSize: query.pageSize };
  }

  async islands(run: RunRow, page: number, pageSize: number) {
    const { items, total } = await this.findings.islands(run.id, (page - 1) * pageSize, pageSize);
    return { items, total, page, pageSize };
  }

  scoreDistribution(run: RunRow) {
    return this.findings.scoreDistribution(run.id);
  }

  /** What appeared in `run` and disappeared since `against`, per finding kind (and `pages`: added and removed), and the largest score moves. */
  async diff(run: RunRow, against: RunRow) {
    const kinds: Record<string, unknown> = {
      pages: {
        appeared: await this.diffs.pagesMissingFrom(run.id, against.id),
        disappeared: await this.diffs.pagesMissingFrom(against.id, run.id),
      },
    };
    for (const [kind, flag] of Object.entries(PAGE_FINDINGS)) {
      kinds[kind] = {
        appeared: await this.diffs.pagesOnlyIn(run.id, against.id, flag),
        disappeared: await this.diffs.pagesOnlyIn(against.id, run.id, flag),
      };
    }
    for (const [kind, status] of Object.entries(LINK_FINDINGS)) {
      kinds[kind] = {
        appeared: await this.diffs.linksOnlyIn(run.snapshotId, against.snapshotId, status),
        disappeared: await this.diffs.linksOnlyIn(against.snapshotId, run.snapshotId, status),
      };
    }
    return { runId: run.id, againstRunId: against.id, kinds, scoreMoves: await this.diffs.scoreMoves(run.id, against.id) };
  }
}

export function toLinkItem(row: LinkRowView) {
  return { ...row, ...hrefFields(row.href, row.status) };
}
