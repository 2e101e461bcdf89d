import { Controller, Get, HttpCode, Param, Post } from '@nestjs/common';
import { ApiTags } from '@nestjs/swagger';
import { Throttle } from '@nestjs/throttler';
import { unsubscribeInfoSchema, unsubscribeResultSchema } from '@linkloom/shared';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { Public } from '../../common/auth.decorators.js';
import { UnsubscribeService } from './unsubscribe.service.js';

/**
 * The link in every mail's List-Unsubscribe header and footer. Public: the signed token is the credential.
 * GET only describes (mail scanners open links); POST unsubscribes, which is what a mail client sends for
 * `List-Unsubscribe-Post: List-Unsubscribe=One-Click` (RFC 8058 section 3.1) and what the app's page sends.
 */
@ApiTags('notifications')
@Public()
@Throttle({ default: { limit: 30, ttl: 60_000 } })
@Controller('unsubscribe')
export class UnsubscribeController {
  constructor(private readonly unsubscribe: UnsubscribeService) {}

  @Get(':token')
  @ApiZodResponse(unsubscribeInfoSchema)
  describe(@Param('token') token: string) {
    return this.unsubscribe.describe(token);
  }

  @Post(':token')
  @HttpCode(200)
  @ApiZodResponse(unsubscribeResultSchema)
  confirm(@Param('token') token: string) {
    return this.unsubscribe.unsubscribe(token);
  }
}
