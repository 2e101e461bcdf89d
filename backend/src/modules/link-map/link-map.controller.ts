import { Controller, Get, Param, ParseUUIDPipe, Query } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { type AuthUser, CurrentUser } from '../../common/auth.decorators.js';
import { ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { RunIdPipe } from '../runs/run-id.pipe.js';
import { LinkMapService } from './link-map.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { linkMapSchema } from '@linkloom/shared';

const mapQuerySchema = z
  .object({
    folder: z
      .string()
      .trim()
      .max(512)
      .regex(/^[^\0]*$/)
      .default(''),
    folderDepth: z.coerce.number().int().min(1).max(5).default(1),
    limit: z.coerce.number().int().min(10).max(1000).default(300),
  })
  .strict();

@ApiTags('runs')
@ApiBearerAuth()
@Controller('doc-sets/:docSetId/runs/:runId')
export class LinkMapController {
  constructor(private readonly map: LinkMapService) {}

  /** The link map: pages, or folders when the pages would not fit (`limit`); drill down with `folder`. */
  @Get('graph')
  @ApiZodQuery(mapQuerySchema)
  @ApiZodResponse(linkMapSchema)
  graph(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('runId', RunIdPipe) runId: string,
    @Query(new ZodPipe(mapQuerySchema)) query: z.infer<typeof mapQuerySchema>,
  ) {
    return this.map.graph(actor, docSetId, runId, query);
  }
}
