import { Module } from '@nestjs/common';
import { JwtModule } from '@nestjs/jwt';
import { UsersModule } from '../users/users.module.js';
import { MailComposer } from './mail-composer.service.js';
import { NotificationSettingsRepository } from './notification-settings.repository.js';
import { NotificationSettingsService } from './notification-settings.service.js';
import { NotificationsController } from './notifications.controller.js';
import { SubscriptionsController } from './subscriptions.controller.js';
import { SubscriptionsRepository } from './subscriptions.repository.js';
import { SubscriptionsService } from './subscriptions.service.js';
import { UnsubscribeController } from './unsubscribe.controller.js';
import { UnsubscribeTokens } from './unsubscribe-tokens.js';
import { UnsubscribeService } from './unsubscribe.service.js';

/**
 * Who gets which mail: each person's switches per kind, time zone and per-doc-set choices, the composer that
 * gives every mail its unsubscribe link and headers, and the public one-click unsubscribe.
 */
@Module({
  imports: [UsersModule, JwtModule.register({})],
  controllers: [NotificationsController, SubscriptionsController, UnsubscribeController],
  providers: [
    SubscriptionsRepository,
    SubscriptionsService,
    NotificationSettingsRepository,
    NotificationSettingsService,
    UnsubscribeTokens,
    UnsubscribeService,
    MailComposer,
  ],
  exports: [NotificationSettingsService, MailComposer],
})
export class NotificationsModule {}
