import { Injectable } from '@nestjs/common';
import { roleAtLeast } from '@linkloom/shared';
import { AppError } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { type SubscriptionChoice, SubscriptionsRepository } from './subscriptions.repository.js';

@Injectable()
export class SubscriptionsService {
  constructor(private readonly repository: SubscriptionsRepository) {}

  /** One entry per doc set: the stored choice, or the default for the user's role. */
  async get(user: AuthUser): Promise<{ subscriptions: SubscriptionChoice[] }> {
    const stored = new Map((await this.repository.forUser(user.id)).map((s) => [s.docSetId, s]));
    const byDefault = roleAtLeast(user.role, 'editor');
    const subscriptions = (await this.repository.docSetIds()).map(
      (docSetId) => stored.get(docSetId) ?? { docSetId, digest: byDefault, nothingChanged: false },
    );
    return { subscriptions };
  }

  async put(user: AuthUser, choices: SubscriptionChoice[]): Promise<{ subscriptions: SubscriptionChoice[] }> {
    const known = new Set(await this.repository.docSetIds());
    const unknown = choices.filter((c) => !known.has(c.docSetId)).map((c) => c.docSetId);
    if (unknown.length) throw new AppError(404, 'NOT_FOUND', `No doc set with the id ${unknown[0]}.`, unknown);
    await this.repository.replace(user.id, choices);
    return this.get(user);
  }
}
