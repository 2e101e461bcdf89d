import { Injectable } from '@nestjs/common';
import { MAIL_KIND_LABELS, type UnsubscribeInfo, type UnsubscribeResult } from '@linkloom/shared';
import { AppError } from '../../common/app-error.js';
import { AuditService } from '../audit/audit.service.js';
import { UsersService } from '../users/users.service.js';
import { NotificationSettingsService } from './notification-settings.service.js';
import { UnsubscribeTokens } from './unsubscribe-tokens.js';

const invalidLink = () =>
  new AppError(
    400,
    'UNSUBSCRIBE_LINK_INVALID',
    'This unsubscribe link is not valid; your mail program may have cut it short. Copy the whole link from the e-mail, or sign in and choose what you get under Notifications.',
  );

/** "a.person@example.org" -> "a•••@example.org": enough to recognise one's own address, not to harvest it. */
export function maskEmail(email: string): string {
  const at = email.lastIndexOf('@');
  return at <= 0 ? '•••' : `${email[0]}•••${email.slice(at)}`;
}

/** The one-click unsubscribe (RFC 8058): the link alone, without signing in, switches off one kind of mail. */
@Injectable()
export class UnsubscribeService {
  constructor(
    private readonly tokens: UnsubscribeTokens,
    private readonly settings: NotificationSettingsService,
    private readonly users: UsersService,
    private readonly audit: AuditService,
  ) {}

  async describe(token: string): Promise<UnsubscribeInfo> {
    const { userId, kind, email } = await this.resolve(token);
    return { kind, kindLabel: MAIL_KIND_LABELS[kind], maskedEmail: maskEmail(email), subscribed: await this.settings.isOn(userId, kind) };
  }

  /** Idempotent: a second click (or a mail client's automatic POST after a person's click) changes nothing more. */
  async unsubscribe(token: string): Promise<UnsubscribeResult> {
    const { userId, kind, email } = await this.resolve(token);
    const wasOn = await this.settings.isOn(userId, kind);
    await this.settings.switchOff(userId, kind);
    if (wasOn) await this.audit.record(null, 'notifications.unsubscribed', 'user', userId, { kind });
    const label = MAIL_KIND_LABELS[kind];
    return {
      kind,
      kindLabel: label,
      maskedEmail: maskEmail(email),
      subscribed: false,
      message: `You will get no more e-mails of the kind “${label}”. Sign in and open Notifications to turn it on again.`,
    };
  }

  private async resolve(token: string) {
    const claims = this.tokens.verify(token);
    if (!claims) throw invalidLink();
    const user = await this.users.findActive(claims.userId);
    if (!user) throw invalidLink();
    return { ...claims, email: user.email };
  }
}
