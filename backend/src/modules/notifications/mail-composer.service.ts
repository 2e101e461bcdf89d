import { Inject, Injectable } from '@nestjs/common';
import { MAIL_KIND_LABELS, type MailKind } from '@linkloom/shared';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { type Html, link, renderMailPage, smallPrint } from '../mail/mail-layout.js';
import type { NewOutboxMessage } from '../mail/mail.service.js';
import type { Recipient } from './notification-settings.service.js';
import { UnsubscribeTokens } from './unsubscribe-tokens.js';

/** What one mail says; the composer adds the frame, the unsubscribe links and the headers. */
export interface MailContent {
  subject: string;
  title: string;
  preheader: string;
  /** Lines of the plain-text part. */
  text: string[];
  body: Html[];
  /** Why this person gets it, as a sentence ending without a full stop ("you follow Handbook"). */
  reason: string;
}

export interface UnsubscribeLinks {
  /** Where a mail client POSTs (RFC 8058). */
  oneClick: string;
  /** The app's page that asks before it unsubscribes (a GET must change nothing: scanners open links). */
  page: string;
  settings: string;
}

/**
 * Turns content into an outbox message for one person: styled HTML with a plain-text part, and in both an
 * unsubscribe link for this kind of mail plus the `List-Unsubscribe` and `List-Unsubscribe-Post` headers
 * (RFC 2369 section 3.2, RFC 8058 section 3.1), so every mail can be stopped with one click.
 */
@Injectable()
export class MailComposer {
  constructor(
    private readonly tokens: UnsubscribeTokens,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  links(userId: string, kind: MailKind): UnsubscribeLinks {
    const token = this.tokens.sign({ userId, kind });
    const base = this.config.publicUrl;
    return {
      oneClick: `${base}/api/unsubscribe/${token}`,
      page: `${base}/unsubscribe/${token}`,
      settings: `${base}/account/notifications`,
    };
  }

  compose(
    recipient: Pick<Recipient, 'userId' | 'email'>,
    kind: MailKind,
    content: MailContent,
    options: { docSetId?: string | null; dedupeKey?: string } = {},
  ): NewOutboxMessage {
    const links = this.links(recipient.userId, kind);
    const label = MAIL_KIND_LABELS[kind];
    const text = [
      ...content.text,
      '',
      '--',
      `You get this because ${content.reason}.`,
      `Unsubscribe from “${label}” with one click: ${links.page}`,
      `Choose which e-mails you get: ${links.settings}`,
    ].join('\n');
    const footer: Html[] = [
      smallPrint([`You get this because ${content.reason}.`]),
      smallPrint([link(`Unsubscribe from “${label}”`, links.page), link('Choose which e-mails you get', links.settings)]),
    ];
    return {
      kind,
      toAddress: recipient.email,
      subject: content.subject,
      text,
      html: renderMailPage({ title: content.title, preheader: content.preheader, body: content.body, footer }),
      docSetId: options.docSetId ?? null,
      dedupeKey: options.dedupeKey,
      headers: { 'List-Unsubscribe': `<${links.oneClick}>`, 'List-Unsubscribe-Post': 'List-Unsubscribe=One-Click' },
    };
  }
}
