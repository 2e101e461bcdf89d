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
import { ApiFileResponse, ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import {
  islandListSchema,
  linkListOrGroupsSchema,
  pageDetailSchema,
  runDiffSchema,
  runPageListSchema,
  scoreDistributionSchema,
  searchResultSchema,
} from '@linkloom/shared';

/** Results of one run; `:runId` may be `latest`. Every signed-in role may read them. */
@ApiTags('runs')
@ApiBearerAuth()
@Controller('doc-sets/:docSetId/runs/:runId')
export class RunResultsController {
  constructor(private readonly results: RunResultsService) {}

  @Get('pages')
  @ApiZodQuery(pageListQuerySchema)
  @ApiZodResponse(runPageListSchema)
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
  @ApiZodResponse(pageDetailSchema)
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
  @ApiZodResponse(linkListOrGroupsSchema, { description: 'LinkList, or LinkTargetGroupList with `groupBy=target`' })
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
  @ApiZodResponse(islandListSchema)
  islands(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(islandsQuerySchema)) query: { page: number; pageSize: number },
  ) {
    return this.results.islands({ actor, docSetId, runId }, query.page, query.pageSize);
  }

  @Get('score-distribution')
  @ApiZodResponse(scoreDistributionSchema)
  scoreDistribution(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
  ) {
    return this.results.scoreDistribution({ actor, docSetId, runId });
  }

  @Get('search')
  @ApiZodQuery(searchQuerySchema)
  @ApiZodResponse(searchResultSchema)
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
  @ApiZodResponse(runDiffSchema)
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
  @ApiFileResponse('text/csv', 'The rows of the chosen view, as CSV.')
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
