import { Inject, Injectable } from '@nestjs/common';
import type { MailKind } from '@linkloom/shared';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import type { NewOutboxMessage } from '../mail/mail.service.js';
import { MailComposer, type MailContent } from '../notifications/mail-composer.service.js';
import { NotificationSettingsService, type Recipient } from '../notifications/notification-settings.service.js';
import { type AssignedTask, assignmentContent, type ReopenedTask, reopenedContent } from './task-mail.js';

/**
 * The mails about a person's own tasks, one per assignee, built before the caller's transaction (only `tx`
 * may be used inside it) and enqueued in it, so a mail exists exactly when its change does. Whoever switched
 * the kind off gets nothing.
 */
@Injectable()
export class TaskMailer {
  constructor(
    private readonly settings: NotificationSettingsService,
    private readonly composer: MailComposer,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  assignment(tasks: (AssignedTask & { assigneeId?: string | null })[], docSet: { id: string; name: string }): Promise<NewOutboxMessage[]> {
    return this.perAssignee('task-assigned', tasks, docSet, (r, own) => assignmentContent(r.name, own, docSet, this.config.publicUrl));
  }

  reopened(tasks: (ReopenedTask & { assigneeId: string | null })[], docSet: { id: string; name: string }): Promise<NewOutboxMessage[]> {
    return this.perAssignee('task-reopened', tasks, docSet, (r, own) => reopenedContent(r.name, own, docSet, this.config.publicUrl));
  }

  private async perAssignee<T extends { assigneeId?: string | null }>(
    kind: MailKind,
    tasks: T[],
    docSet: { id: string },
    content: (recipient: Recipient, own: T[]) => MailContent,
  ): Promise<NewOutboxMessage[]> {
    const byAssignee = new Map<string, T[]>();
    for (const t of tasks) if (t.assigneeId) byAssignee.set(t.assigneeId, [...(byAssignee.get(t.assigneeId) ?? []), t]);
    if (byAssignee.size === 0) return [];
    const recipients = await this.settings.recipients(kind, { userIds: [...byAssignee.keys()] });
    return recipients.map((r) => this.composer.compose(r, kind, content(r, byAssignee.get(r.userId)!), { docSetId: docSet.id }));
  }
}
