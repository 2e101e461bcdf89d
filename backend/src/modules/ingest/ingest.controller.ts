import { Controller, Get, HttpCode, Param, ParseUUIDPipe, Post, Query, Req, UseInterceptors } from '@nestjs/common';
import { ApiBearerAuth, ApiBody, ApiConsumes, ApiTags } from '@nestjs/swagger';
import { listQuerySchema, snapshotAcceptedSchema, snapshotListSchema, snapshotSchema } from '@linkloom/shared';
import type { Request } from 'express';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { ApiZodQuery, ZodPipe } from '../../common/zod-pipe.js';
import { IngestService } from './ingest.service.js';
import { ArchiveUploadInterceptor } from './upload/archive-upload.interceptor.js';
import type { StoredUpload } from './upload/hashing-disk-storage.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';

@ApiTags('snapshots')
@ApiBearerAuth()
@Controller('doc-sets/:docSetId/snapshots')
export class IngestController {
  constructor(private readonly ingest: IngestService) {}

  @Post()
  @HttpCode(202)
  @MinRole('editor')
  @UseInterceptors(ArchiveUploadInterceptor)
  @ApiConsumes('multipart/form-data')
  @ApiBody({ schema: { type: 'object', required: ['archive'], properties: { archive: { type: 'string', format: 'binary' } } } })
  @ApiZodResponse(snapshotAcceptedSchema, { status: 202 })
  async upload(@CurrentUser() actor: AuthUser, @Param('docSetId', ParseUUIDPipe) docSetId: string, @Req() request: Request) {
    return { snapshot: await this.ingest.importUpload(actor, docSetId, request.file as unknown as StoredUpload | undefined) };
  }

  @Post('from-source')
  @HttpCode(202)
  @MinRole('admin')
  @ApiZodResponse(snapshotAcceptedSchema, { status: 202 })
  async fromSource(@CurrentUser() actor: AuthUser, @Param('docSetId', ParseUUIDPipe) docSetId: string) {
    return { snapshot: await this.ingest.importFromSource(docSetId, actor, 'import') };
  }

  @Get()
  @ApiZodQuery(listQuerySchema)
  @ApiZodResponse(snapshotListSchema)
  list(@Param('docSetId', ParseUUIDPipe) docSetId: string, @Query(new ZodPipe(listQuerySchema)) query: { page: number; pageSize: number }) {
    return this.ingest.list(docSetId, query.page, query.pageSize);
  }

  @Get(':snapshotId')
  @ApiZodResponse(snapshotSchema)
  get(@Param('docSetId', ParseUUIDPipe) docSetId: string, @Param('snapshotId', ParseUUIDPipe) snapshotId: string) {
    return this.ingest.get(docSetId, snapshotId);
  }
}
