import { Injectable } from '@nestjs/common';
import type { AuthUser } from '../../common/auth.decorators.js';
import type { RunRow } from '../../db/schema/index.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { ExportService, type ExportView } from './export/export.service.js';
import { attachmentDisposition } from './export/csv.js';
import { FindingsService } from './findings/findings.service.js';
import { PageDetailService } from './pages/page-detail.service.js';
import { publicPageItem } from './pages/page-item.js';
import { PageListRepository, type PageFilters } from './pages/page-list.repository.js';
import type { LinkListQuery, PageListQuery } from './run-queries.js';
import { RunsService } from './runs.service.js';
import { SearchService } from './search/search.service.js';

interface RunRef {
  actor: AuthUser;
  docSetId: string;
  runId: string;
}

/** The read side of a finished run: each method resolves the run (id or `latest`) and delegates. */
@Injectable()
export class RunResultsService {
  constructor(
    private readonly runs: RunsService,
    private readonly pageList: PageListRepository,
    private readonly pageDetail: PageDetailService,
    private readonly findings: FindingsService,
    private readonly searchService: SearchService,
    private readonly exports: ExportService,
    private readonly docSets: DocSetsService,
  ) {}

  private run(ref: RunRef): Promise<RunRow> {
    return this.runs.resolve(ref.actor, ref.docSetId, ref.runId);
  }

  async pages(ref: RunRef, { page, pageSize, ...query }: PageListQuery) {
    const run = await this.run(ref);
    const { rows, total } = await this.pageList.list(run.id, query, (page - 1) * pageSize, pageSize);
    return { items: rows.map(publicPageItem), total, page, pageSize, runId: run.id };
  }

  async page(ref: RunRef, path: string) {
    return this.pageDetail.detail(await this.run(ref), path);
  }

  async links(ref: RunRef, query: LinkListQuery) {
    return this.findings.links(await this.run(ref), query);
  }

  async islands(ref: RunRef, page: number, pageSize: number) {
    return this.findings.islands(await this.run(ref), page, pageSize);
  }

  async scoreDistribution(ref: RunRef) {
    return this.findings.scoreDistribution(await this.run(ref));
  }

  async search(ref: RunRef, query: { q: string; mode: 'blend' | 'subgraph'; page: number; pageSize: number }) {
    return this.searchService.search(await this.run(ref), query);
  }

  async diff(ref: RunRef, against: string) {
    const run = await this.run(ref);
    return this.findings.diff(run, await this.run({ ...ref, runId: against }));
  }

  /** Resolves everything that can fail before the first byte, so errors still get a JSON error body. */
  async prepareExport(ref: RunRef, view: ExportView, filters: PageFilters) {
    const run = await this.run(ref);
    const docSet = await this.docSets.get(ref.docSetId);
    const fileName = `${docSet.name}-run-${run.id.slice(0, 8)}-${view}.csv`;
    return {
      contentDisposition: attachmentDisposition(fileName),
      write: (sink: (chunk: string) => Promise<void>) => this.exports.write(run, view, filters, sink),
    };
  }
}
