import { Injectable } from '@nestjs/common';
import { and, asc, eq, inArray, sql, type SQL } from 'drizzle-orm';
import type { MailKind } from '@linkloom/shared';
import { DbService } from '../../db/db.service.js';
import { notificationSettings, subscriptions, users, type NotificationSettingsRow } from '../../db/schema/index.js';

export type KindSwitches = Pick<NotificationSettingsRow, 'digest' | 'taskAssigned' | 'taskReopened' | 'pruningWaiting'>;
export type SettingsPatch = Partial<KindSwitches> & { timeZone?: string };

/** A person a mail may go to, with what the mail needs to address them. */
export interface RecipientRow {
  userId: string;
  email: string;
  name: string;
  timeZone: string | null;
  nothingChanged: boolean;
}

const KIND_COLUMN = {
  digest: notificationSettings.digest,
  'task-assigned': notificationSettings.taskAssigned,
  'task-reopened': notificationSettings.taskReopened,
  'pruning-waiting': notificationSettings.pruningWaiting,
} as const;

export const KIND_FIELD = {
  digest: 'digest',
  'task-assigned': 'taskAssigned',
  'task-reopened': 'taskReopened',
  'pruning-waiting': 'pruningWaiting',
} as const;

/** Who may receive which mail: the per-user switches and zone, joined with users and per-doc-set choices. */
@Injectable()
export class NotificationSettingsRepository {
  constructor(private readonly database: DbService) {}

  async find(userId: string): Promise<NotificationSettingsRow | null> {
    const [row] = await this.database.db.select().from(notificationSettings).where(eq(notificationSettings.userId, userId)).limit(1);
    return row ?? null;
  }

  async upsert(userId: string, patch: SettingsPatch): Promise<void> {
    if (Object.keys(patch).length === 0) return;
    await this.database.db
      .insert(notificationSettings)
      .values({ userId, ...patch })
      .onConflictDoUpdate({ target: notificationSettings.userId, set: { ...patch, updatedAt: new Date() } });
  }

  /**
   * Recipients of one kind of mail. A missing settings row means every kind is on; per doc set, the digest
   * defaults to editors and admins (the people who triage), the pruning list to those who decide on it.
   */
  async recipients(kind: MailKind, scope: { docSetId?: string; userIds?: string[] }): Promise<RecipientRow[]> {
    if (scope.userIds && scope.userIds.length === 0) return [];
    const triager = sql`${users.role} in ('admin', 'editor')`;
    const perDocSet: Partial<Record<MailKind, SQL>> = {
      digest: sql`coalesce(${subscriptions.digest}, ${triager})`,
      'pruning-waiting': sql`${triager} and coalesce(${subscriptions.pruningWaiting}, true)`,
    };
    const conditions: (SQL | undefined)[] = [
      eq(users.disabled, false),
      sql`coalesce(${KIND_COLUMN[kind]}, true)`,
      scope.docSetId ? perDocSet[kind] : undefined,
      scope.userIds ? inArray(users.id, scope.userIds) : undefined,
    ];
    return this.database.db
      .select({
        userId: users.id,
        email: users.email,
        name: users.name,
        timeZone: notificationSettings.timeZone,
        nothingChanged: sql<boolean>`coalesce(${subscriptions.nothingChanged}, false)`,
      })
      .from(users)
      .leftJoin(notificationSettings, eq(notificationSettings.userId, users.id))
      .leftJoin(subscriptions, and(eq(subscriptions.userId, users.id), eq(subscriptions.docSetId, scope.docSetId ?? sql`null`)))
      .where(and(...conditions))
      .orderBy(asc(users.email));
  }
}
