import { createHmac } from 'node:crypto';
import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { MAIL_KINDS, type MailKind } from '@linkloom/shared';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';

const ISSUER = 'linkloom';
const AUDIENCE = 'linkloom-unsubscribe';

export interface UnsubscribeClaims {
  userId: string;
  kind: MailKind;
}

/**
 * The token inside an unsubscribe link: signed (HS256), bound to one person and one kind of mail, so it can
 * switch off exactly that and nothing else. It is signed with a key derived from the server secret for this
 * purpose alone and carries its own audience, so it can never pass for a sign-in token. It does not expire:
 * an unsubscribe link in an old mail must keep working (RFC 8058 section 3 expects the link to be usable
 * without signing in).
 */
@Injectable()
export class UnsubscribeTokens {
  private readonly key: string;

  constructor(
    private readonly jwt: JwtService,
    @Inject(APP_CONFIG) config: AppConfig,
  ) {
    this.key = createHmac('sha256', config.jwtSecret).update('linkloom unsubscribe links').digest('base64url');
  }

  sign(claims: UnsubscribeClaims): string {
    return this.jwt.sign(
      { sub: claims.userId, kind: claims.kind },
      { secret: this.key, algorithm: 'HS256', issuer: ISSUER, audience: AUDIENCE, noTimestamp: true },
    );
  }

  /** The claims, or null for anything not made by `sign` (cut short, altered, another kind of token). */
  verify(token: string): UnsubscribeClaims | null {
    try {
      const claims = this.jwt.verify<{ sub?: unknown; kind?: unknown }>(token, {
        secret: this.key,
        algorithms: ['HS256'],
        issuer: ISSUER,
        audience: AUDIENCE,
      });
      if (typeof claims.sub !== 'string' || !/^[0-9a-f-]{36}$/i.test(claims.sub)) return null;
      if (!(MAIL_KINDS as readonly unknown[]).includes(claims.kind)) return null;
      return { userId: claims.sub, kind: claims.kind as MailKind };
    } catch {
      return null;
    }
  }
}
