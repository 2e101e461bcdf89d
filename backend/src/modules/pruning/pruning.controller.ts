import { Body, Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Res } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { ApiZodBody, ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { type ExportFile, PruningService } from './pruning.service.js';
import {
  type DecisionsInput,
  decisionsSchema,
  type NominationInput,
  nominationSchema,
  type PruningListQuery,
  pruningListQuerySchema,
} from './pruning.schemas.js';
import { ApiFileResponse, ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { pruningDecisionsResultSchema, pruningItemSchema, pruningListSchema } from '@linkloom/shared';

function send(res: Response, file: ExportFile): string {
  res.setHeader('Content-Type', file.contentType);
  res.setHeader('Content-Disposition', file.disposition);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  return file.body;
}

@ApiTags('pruning')
@ApiBearerAuth()
@Controller('doc-sets/:docSetId/pruning')
export class PruningController {
  constructor(private readonly pruning: PruningService) {}

  @Get()
  @ApiZodQuery(pruningListQuerySchema)
  @ApiZodResponse(pruningListSchema)
  list(@Param('docSetId', ParseUUIDPipe) docSetId: string, @Query(new ZodPipe(pruningListQuerySchema)) query: PruningListQuery) {
    return this.pruning.get(docSetId, query);
  }

  @Post('nominations')
  @MinRole('writer')
  @ApiZodBody(nominationSchema)
  @ApiZodResponse(pruningItemSchema, { status: 201 })
  nominate(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Body(new ZodPipe(nominationSchema)) body: NominationInput,
  ) {
    return this.pruning.nominate(actor, docSetId, body);
  }

  @Post('decisions')
  @HttpCode(200)
  @MinRole('editor')
  @ApiZodBody(decisionsSchema)
  @ApiZodResponse(pruningDecisionsResultSchema)
  decide(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Body(new ZodPipe(decisionsSchema)) body: DecisionsInput,
  ) {
    return this.pruning.decide(actor, docSetId, body);
  }

  @Get('export.csv')
  @ApiFileResponse('text/csv', 'The approved pages with notes, as CSV.')
  async exportCsv(@Param('docSetId', ParseUUIDPipe) docSetId: string, @Res({ passthrough: true }) res: Response) {
    return send(res, await this.pruning.exportApproved(docSetId, 'csv'));
  }

  @Get('export.txt')
  @ApiFileResponse('text/plain', 'The approved paths, one per line, for scripts.')
  async exportTxt(@Param('docSetId', ParseUUIDPipe) docSetId: string, @Res({ passthrough: true }) res: Response) {
    return send(res, await this.pruning.exportApproved(docSetId, 'txt'));
  }
}
