import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { ApiZodBody, ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { RunIdPipe } from './run-id.pipe.js';
import { runListQuerySchema, startRunSchema, type StartRunInput } from './run-queries.js';
import { RunsService } from './runs.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { runAcceptedSchema, runListSchema, runSchema } from '@linkloom/shared';

@ApiTags('runs')
@ApiBearerAuth()
@Controller('doc-sets/:docSetId/runs')
export class RunsController {
  constructor(private readonly runs: RunsService) {}

  @Post()
  @HttpCode(202)
  @MinRole('editor')
  @ApiZodBody(startRunSchema)
  @ApiZodResponse(runAcceptedSchema, { status: 202 })
  async start(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Body(new ZodPipe(startRunSchema)) body: StartRunInput,
  ) {
    return { run: await this.runs.startManual(actor, docSetId, body.settings) };
  }

  @Get()
  @ApiZodQuery(runListQuerySchema)
  @ApiZodResponse(runListSchema)
  list(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Query(new ZodPipe(runListQuerySchema)) query: { page: number; pageSize: number },
  ) {
    return this.runs.list(actor, docSetId, query.page, query.pageSize);
  }

  @Get(':runId')
  @ApiZodResponse(runSchema)
  get(@CurrentUser() actor: AuthUser, @Param('docSetId', ParseUUIDPipe) docSetId: string, @Param('runId', RunIdPipe) runId: string) {
    return this.runs.get(actor, docSetId, runId);
  }
}
