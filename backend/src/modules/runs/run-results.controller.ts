import { Controller, Get, Param, ParseUUIDPipe, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { once } from 'node:events';
import { type AuthUser, CurrentUser } from '../../common/auth.decorators.js';
import { ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { RunIdPipe } from './run-id.pipe.js';
import {
  diffQuerySchema,
  exportQuerySchema,
  type ExportQuery,
  islandsQuerySchema,
  linkListQuerySchema,
  pageDetailQuerySchema,
  pageListQuerySchema,
  searchQuerySchema,
  type LinkListQuery,
  type PageListQuery,
} from './run-queries.js';
import { RunResultsService } from './run-results.service.js';
import type { ExportView } from './export/export.service.js';

/** Results of one run; `:runId` may be `latest`. Every signed-in role may read them. */
@ApiTags('runs')
@ApiBearerAuth()
@Controller('doc-sets/:docSetId/runs/:runId')
export class RunResultsController {
  constructor(private readonly results: RunResultsService) {}

  @Get('pages')
  @ApiZodQuery(pageListQuerySchema)
  pages(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(pageListQuerySchema)) query: PageListQuery,
  ) {
    return this.results.pages({ actor, docSetId, runId }, query);
  }

  @Get('page')
  @ApiZodQuery(pageDetailQuerySchema)
  page(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(pageDetailQuerySchema)) query: { path: string },
  ) {
    return this.results.page({ actor, docSetId, runId }, query.path);
  }

  @Get('links')
  @ApiZodQuery(linkListQuerySchema)
  links(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(linkListQuerySchema)) query: LinkListQuery,
  ) {
    return this.results.links({ actor, docSetId, runId }, query);
  }

  @Get('islands')
  @ApiZodQuery(islandsQuerySchema)
  islands(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(islandsQuerySchema)) query: { page: number; pageSize: number },
  ) {
    return this.results.islands({ actor, docSetId, runId }, query.page, query.pageSize);
  }

  @Get('score-distribution')
  scoreDistribution(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
  ) {
    return this.results.scoreDistribution({ actor, docSetId, runId });
  }

  @Get('search')
  @ApiZodQuery(searchQuerySchema)
  search(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(searchQuerySchema)) query: { q: string; mode: 'blend' | 'subgraph'; page: number; pageSize: number },
  ) {
    return this.results.search({ actor, docSetId, runId }, query);
  }

  @Get('diff')
  @ApiZodQuery(diffQuerySchema)
  diff(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(diffQuerySchema)) query: { against: string },
  ) {
    return this.results.diff({ actor, docSetId, runId }, query.against);
  }

  @Get('export.csv')
  @ApiZodQuery(exportQuerySchema)
  async exportCsv(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(exportQuerySchema)) query: ExportQuery,
    @Res() response: Response,
  ): Promise<void> {
    const { view, sort: _sort, ...filters } = query;
    const csv = await this.results.prepareExport({ actor, docSetId, runId }, view, filters);
    response
      .status(200)
      .set({ 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': csv.contentDisposition, 'Cache-Control': 'no-store' });
    await csv.write(async (chunk) => {
      if (!response.write(chunk)) await once(response, 'drain');
    });
    response.end();
  }
}
