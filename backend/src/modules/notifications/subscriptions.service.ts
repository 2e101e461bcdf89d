import { Injectable } from '@nestjs/common';
import type { Subscription } from '@linkloom/shared';
import type { AuthUser } from '../../common/auth.decorators.js';
import { NotificationSettingsService } from './notification-settings.service.js';

/** The older digest-only view of the notification settings (GET|PUT /api/me/subscriptions). */
@Injectable()
export class SubscriptionsService {
  constructor(private readonly settings: NotificationSettingsService) {}

  /** One entry per doc set: the stored choice, or the default for the user's role. */
  async get(user: AuthUser): Promise<{ subscriptions: Subscription[] }> {
    const { docSets } = await this.settings.get(user);
    return { subscriptions: docSets.map(({ docSetId, digest, nothingChanged }) => ({ docSetId, digest, nothingChanged })) };
  }

  async put(user: AuthUser, choices: Subscription[]): Promise<{ subscriptions: Subscription[] }> {
    await this.settings.update(user, { docSets: choices });
    return this.get(user);
  }
}
