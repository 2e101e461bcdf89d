import { Body, Controller, Get, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { subscriptionsSchema, type Subscription } from '@linkloom/shared';
import { type AuthUser, CurrentUser } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { SubscriptionsService } from './subscriptions.service.js';

@ApiTags('subscriptions')
@ApiBearerAuth()
@Controller('me/subscriptions')
export class SubscriptionsController {
  constructor(private readonly subscriptions: SubscriptionsService) {}

  @Get()
  get(@CurrentUser() user: AuthUser) {
    return this.subscriptions.get(user);
  }

  @Put()
  @ApiZodBody(subscriptionsSchema)
  put(@CurrentUser() user: AuthUser, @Body(new ZodPipe(subscriptionsSchema)) body: { subscriptions: Subscription[] }) {
    return this.subscriptions.put(user, body.subscriptions);
  }
}
