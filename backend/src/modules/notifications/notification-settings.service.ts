import { Injectable } from '@nestjs/common';
import {
  isTimeZone,
  MAIL_KINDS,
  roleAtLeast,
  type MailKind,
  type NotificationSettings,
  type UpdateNotificationSettings,
} from '@linkloom/shared';
import { AppError } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { KIND_FIELD, NotificationSettingsRepository, type SettingsPatch } from './notification-settings.repository.js';
import { type SubscriptionChoice, SubscriptionsRepository } from './subscriptions.repository.js';

/** The zone of the server, used until a person picks their own. */
export const serverTimeZone = (): string => Intl.DateTimeFormat().resolvedOptions().timeZone || 'UTC';

/** A person a mail may go to; `timeZone` is always a zone the runtime knows. */
export interface Recipient {
  userId: string;
  email: string;
  name: string;
  timeZone: string;
  nothingChanged: boolean;
}

/** Choices of a role that has chosen nothing yet: editors and admins triage, so they get digests and pruning mail. */
function roleDefaults(role: AuthUser['role']): Omit<SubscriptionChoice, 'docSetId'> {
  const triager = roleAtLeast(role, 'editor');
  return { digest: triager, nothingChanged: false, pruningWaiting: triager };
}

/**
 * Every kind of mail asks here whom it may go to: a person's switch per kind beats any per-doc-set choice,
 * and a disabled account gets nothing.
 */
@Injectable()
export class NotificationSettingsService {
  constructor(
    private readonly settings: NotificationSettingsRepository,
    private readonly subscriptions: SubscriptionsRepository,
  ) {}

  async get(user: AuthUser): Promise<NotificationSettings> {
    const row = await this.settings.find(user.id);
    const stored = new Map((await this.subscriptions.forUser(user.id)).map((s) => [s.docSetId, s]));
    const defaults = roleDefaults(user.role);
    const kinds = Object.fromEntries(MAIL_KINDS.map((k) => [k, row ? row[KIND_FIELD[k]] : true])) as NotificationSettings['kinds'];
    const docSets = (await this.subscriptions.docSets()).map((d) => {
      const choice = stored.get(d.id) ?? { docSetId: d.id, ...defaults };
      return {
        docSetId: d.id,
        docSetName: d.name,
        digest: choice.digest,
        nothingChanged: choice.digest && choice.nothingChanged,
        // Only people who decide on the pruning list get its mail.
        pruningWaiting: roleAtLeast(user.role, 'editor') && (choice.pruningWaiting ?? defaults.pruningWaiting ?? false),
      };
    });
    const zone = row?.timeZone && isTimeZone(row.timeZone) ? row.timeZone : null;
    return { timeZone: zone ?? serverTimeZone(), timeZoneIsDefault: zone === null, kinds, docSets };
  }

  async update(user: AuthUser, patch: UpdateNotificationSettings): Promise<NotificationSettings> {
    if (patch.docSets?.length) {
      const known = new Set((await this.subscriptions.docSets()).map((d) => d.id));
      const unknown = patch.docSets.filter((d) => !known.has(d.docSetId)).map((d) => d.docSetId);
      if (unknown.length) throw new AppError(404, 'NOT_FOUND', `No doc set with the id ${unknown[0]}; nothing was changed.`, unknown);
      await this.subscriptions.apply(user.id, patch.docSets, () => roleDefaults(user.role));
    }
    const row: SettingsPatch = {};
    if (patch.timeZone) row.timeZone = patch.timeZone;
    for (const [kind, on] of Object.entries(patch.kinds ?? {})) row[KIND_FIELD[kind as MailKind]] = on;
    await this.settings.upsert(user.id, row);
    return this.get(user);
  }

  /** Switches one kind off for a person (the one-click unsubscribe). */
  async switchOff(userId: string, kind: MailKind): Promise<void> {
    await this.settings.upsert(userId, { [KIND_FIELD[kind]]: false });
  }

  async isOn(userId: string, kind: MailKind): Promise<boolean> {
    const row = await this.settings.find(userId);
    return row ? row[KIND_FIELD[kind]] : true;
  }

  /** Who may get this kind of mail (about this doc set, or among these users). */
  async recipients(kind: MailKind, scope: { docSetId?: string; userIds?: string[] }): Promise<Recipient[]> {
    const rows = await this.settings.recipients(kind, scope);
    return rows.map((r) => ({ ...r, timeZone: r.timeZone && isTimeZone(r.timeZone) ? r.timeZone : serverTimeZone() }));
  }
}
