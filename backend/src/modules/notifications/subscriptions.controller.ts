import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { z } from 'zod';
import { type AuthUser, CurrentUser } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { SubscriptionsService } from './subscriptions.service.js';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { subscriptionsSchema } from '@linkloom/shared';

const putSchema = z
  .object({
    subscriptions: z.array(z.object({ docSetId: z.string().uuid(), digest: z.boolean(), nothingChanged: z.boolean() }).strict()).max(1000),
  })
  .strict();

@ApiTags('subscriptions')
@ApiBearerAuth()
@Controller('me/subscriptions')
export class SubscriptionsController {
  constructor(private readonly subscriptions: SubscriptionsService) {}

  @Get()
  @ApiZodResponse(subscriptionsSchema)
  get(@CurrentUser() user: AuthUser) {
    return this.subscriptions.get(user);
  }

  @Put()
  @ApiZodBody(putSchema)
  @ApiZodResponse(subscriptionsSchema, { description: 'The stored choices after the change.' })
  put(@CurrentUser() user: AuthUser, @Body(new ZodPipe(putSchema)) body: z.infer<typeof putSchema>) {
    return this.subscriptions.put(user, body.subscriptions);
  }
}
