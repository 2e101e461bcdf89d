import { Body, Controller, Delete, Get, HttpCode, Param, ParseUUIDPipe, Post } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { type AuthUser, CurrentUser, MinRole } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { ApiTokensService } from './api-tokens.service.js';
import { ApiNoContentResponse, ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { apiTokenListSchema, createdApiTokenSchema } from '@linkloom/shared';

const createTokenSchema = z.object({ name: z.string().trim().min(1, 'give the token a name, e.g. the CI job').max(80) }).strict();

@ApiTags('api-tokens')
@ApiBearerAuth()
@MinRole('admin')
@Controller('doc-sets/:docSetId/tokens')
export class ApiTokensController {
  constructor(private readonly tokens: ApiTokensService) {}

  /** The secret is in this answer only; store it in the CI job's secrets. */
  @Post()
  @ApiZodBody(createTokenSchema)
  @ApiZodResponse(createdApiTokenSchema, { status: 201 })
  create(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Body(new ZodPipe(createTokenSchema)) body: { name: string },
  ) {
    return this.tokens.create(actor, docSetId, body.name);
  }

  @Get()
  @ApiZodResponse(apiTokenListSchema)
  list(@Param('docSetId', ParseUUIDPipe) docSetId: string) {
    return this.tokens.list(docSetId);
  }

  @Delete(':tokenId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async revoke(
    @CurrentUser() actor: AuthUser,
    @Param('docSetId', ParseUUIDPipe) docSetId: string,
    @Param('tokenId', ParseUUIDPipe) tokenId: string,
  ) {
    await this.tokens.revoke(actor, docSetId, tokenId);
  }
}
