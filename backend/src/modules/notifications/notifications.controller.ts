import { Body, Controller, Get, Patch } from '@nestjs/common';
import { ApiBearerAuth, ApiTags } from '@nestjs/swagger';
import { notificationSettingsSchema, updateNotificationSettingsSchema, type UpdateNotificationSettings } from '@linkloom/shared';
import { ApiZodResponse } from '../../common/api-contract/api-response.decorators.js';
import { type AuthUser, CurrentUser } from '../../common/auth.decorators.js';
import { ApiZodBody, ZodPipe } from '../../common/zod-pipe.js';
import { NotificationSettingsService } from './notification-settings.service.js';

/** The signed-in person's own mail choices and time zone; any role may change their own. */
@ApiTags('notifications')
@ApiBearerAuth()
@Controller('me/notifications')
export class NotificationsController {
  constructor(private readonly settings: NotificationSettingsService) {}

  @Get()
  @ApiZodResponse(notificationSettingsSchema)
  get(@CurrentUser() user: AuthUser) {
    return this.settings.get(user);
  }

  @Patch()
  @ApiZodBody(updateNotificationSettingsSchema)
  @ApiZodResponse(notificationSettingsSchema, { description: 'The settings after the change.' })
  update(@CurrentUser() user: AuthUser, @Body(new ZodPipe(updateNotificationSettingsSchema)) body: UpdateNotificationSettings) {
    return this.settings.update(user, body);
  }
}
