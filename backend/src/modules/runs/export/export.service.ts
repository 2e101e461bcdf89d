import { Injectable } from '@nestjs/common';
import type { RunRow } from '../../../db/schema/index.js';
import { toLinkItem } from '../findings/findings.service.js';
import type { EXPORT_VIEWS } from '../run-queries.js';
import { csvLine } from './csv.js';
import { ExportRepository } from './export.repository.js';
import type { PageFilters } from '../pages/page-list.repository.js';

export type ExportView = (typeof EXPORT_VIEWS)[number];
const CHUNK = 2_000;

const PAGE_VIEWS: Partial<Record<ExportView, string>> = {
  pages: 'true',
  orphans: 'orphan',
  'dead-ends': 'dead_end',
  unreachable: 'not reachable',
  deep: 'deep',
  islands: 'island_id is not null',
};
const PAGE_COLUMNS = [
  'path',
  'title',
  'stationaryScore',
  'timesAverage',
  'rank',
  'inboundCount',
  'outboundCount',
  'depth',
  'reachable',
  'orphan',
  'deadEnd',
  'deep',
  'island',
  'brokenLinkCount',
  'wordCount',
] as const;
const LINK_COLUMNS = ['sourcePath', 'line', 'column', 'hrefText', 'targetPath', 'anchor', 'kind', 'status', 'reason'] as const;

/** Streams the rows of a view as CSV, chunk by chunk, so a 100,000-row export never sits in memory. */
@Injectable()
export class ExportService {
  constructor(private readonly repository: ExportRepository) {}

  async write(run: RunRow, view: ExportView, filters: PageFilters, sink: (chunk: string) => Promise<void>): Promise<void> {
    const condition = PAGE_VIEWS[view];
    if (condition) return this.writePages(run, condition, filters, sink);
    return this.writeLinks(run, view === 'broken' ? ['broken', 'broken-anchor'] : null, sink);
  }

  private async writePages(run: RunRow, condition: string, filters: PageFilters, sink: (chunk: string) => Promise<void>): Promise<void> {
    await sink(csvLine(PAGE_COLUMNS));
    for (let after = 0; ;) {
      const rows = await this.repository.pagesAfterRank(run.id, condition, filters, after, CHUNK);
      if (rows.length === 0) return;
      await sink(rows.map((row) => csvLine(PAGE_COLUMNS.map((c) => row[c]))).join(''));
      after = rows[rows.length - 1].rank;
    }
  }

  private async writeLinks(run: RunRow, statuses: string[] | null, sink: (chunk: string) => Promise<void>): Promise<void> {
    await sink(csvLine(LINK_COLUMNS));
    for (let after = 0; ;) {
      const rows = await this.repository.linksAfterId(run.snapshotId, statuses, after, CHUNK);
      if (rows.length === 0) return;
      // The raw href is written as text (hrefText); a CSV cell is never a clickable link.
      await sink(rows.map((row) => csvLine(LINK_COLUMNS.map((c) => toLinkItem(row)[c]))).join(''));
      after = rows[rows.length - 1].id;
    }
  }
}
