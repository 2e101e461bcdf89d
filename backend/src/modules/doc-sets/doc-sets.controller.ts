import { Body, Controller, Get, Param, ParseUUIDPipe, Patch, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import {
  createDocSetSchema,
  docSetListSchema,
  docSetSchema,
  updateDocSetSchema,
  type CreateDocSetInput,
  type UpdateDocSetInput,
} from '@linkloom/shared';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { DocSetsService } from './doc-sets.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';

@ApiTags('doc-sets')
@ApiBearerAuth()
@Controller('doc-sets')
export class DocSetsController {
  constructor(private readonly docSets: DocSetsService) {}

  @Get()
  @ApiZodResponse(docSetListSchema)
  async list() {
    const items = await this.docSets.list();
    return { items, total: items.length, page: 1, pageSize: items.length };
  }

  @Post()
  @MinRole('editor')
  @ApiZodBody(createDocSetSchema)
  @ApiZodResponse(docSetSchema, { status: 201 })
  create(@CurrentUser() actor: AuthUser, @Body(new ZodPipe(createDocSetSchema)) body: CreateDocSetInput) {
    return this.docSets.create(actor, body);
  }

  @Get(':docSetId')
  @ApiZodResponse(docSetSchema)
  get(@Param('docSetId', ParseUUIDPipe) id: string) {
    return this.docSets.get(id);
  }

  @Patch(':docSetId')
  @MinRole('editor')
  @ApiZodBody(updateDocSetSchema)
  @ApiZodResponse(docSetSchema)
  update(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) id: string,
    @Body(new ZodPipe(updateDocSetSchema)) body: UpdateDocSetInput,
  ) {
    return this.docSets.update(actor, id, body);
  }
}
