import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { type Subscription, subscriptionsSchema, updateSubscriptionsSchema } from '@linkloom/shared';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { type AuthUser, CurrentUser } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { SubscriptionsService } from './subscriptions.service.js';

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
  @ApiZodBody(updateSubscriptionsSchema)
  @ApiZodResponse(subscriptionsSchema, { description: 'The stored choices after the change.' })
  put(@CurrentUser() user: AuthUser, @Body(new ZodPipe(updateSubscriptionsSchema)) body: { subscriptions: Subscription[] }) {
    return this.subscriptions.put(user, body.subscriptions);
  }
}
