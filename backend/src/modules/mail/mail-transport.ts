import nodemailer, { type Transporter } from 'nodemailer';

export interface OutgoingMail {
  messageId: string;
  from: string;
  to: string;
  subject: string;
  text: string;
  html: string;
  headers?: Record<string, string>;
}

export class MailDeliveryError extends Error {
  constructor(
    message: string,
    readonly permanent: boolean,
  ) {
    super(message);
  }
}

/** nodemailer over SMTP with short timeouts, so a silent server fails in seconds, not the 30 s default. */
export class MailTransport {
  private readonly transporter: Transporter;

  constructor(target: string | { host: string; port: number }) {
    const timeouts = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 };
    this.transporter =
      typeof target === 'string'
        ? nodemailer.createTransport({ url: target, ...timeouts } as Parameters<typeof nodemailer.createTransport>[0])
        : nodemailer.createTransport({ ...target, secure: false, ignoreTLS: true, ...timeouts });
  }

  async send(mail: OutgoingMail): Promise<void> {
    try {
      await this.transporter.sendMail({
        messageId: mail.messageId,
        from: mail.from,
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        html: mail.html,
        headers: mail.headers,
        disableFileAccess: true,
        disableUrlAccess: true,
      });
    } catch (error) {
      const code = (error as { responseCode?: number }).responseCode;
      // SMTP 5xx replies are permanent (RFC 5321 section 4.2.1); connection errors and 4xx are worth retrying.
      throw new MailDeliveryError(String((error as Error).message ?? error).slice(0, 500), typeof code === 'number' && code >= 500);
    }
  }

  close(): void {
    this.transporter.close();
  }
}
