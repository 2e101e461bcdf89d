import { Inject, Injectable } from '@nestjs/common';
import { JwtService } from '@nestjs/jwt';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { UsersRepository } from '../users/users.repository.js';

const ISSUER = 'linkloom';
const AUDIENCE = 'linkloom-api';

interface AccessClaims {
  sub: string;
  ver: number;
  exp?: number;
  iat?: number;
}

/** Issues and checks access tokens (HS256 only, expiry required); the user is re-read on every request. */
@Injectable()
export class AccessTokenService {
  constructor(
    private readonly jwt: JwtService,
    private readonly users: UsersRepository,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async issue(userId: string, tokenVersion: number): Promise<{ accessToken: string; expiresAt: string }> {
    const ttl = this.config.accessTokenTtlSeconds;
    const accessToken = await this.jwt.signAsync(
      { sub: userId, ver: tokenVersion },
      { secret: this.config.jwtSecret, algorithm: 'HS256', expiresIn: ttl, issuer: ISSUER, audience: AUDIENCE },
    );
    return { accessToken, expiresAt: new Date(Date.now() + ttl * 1000).toISOString() };
  }

  async verify(token: string): Promise<AuthUser | null> {
    let claims: AccessClaims;
    try {
      claims = await this.jwt.verifyAsync<AccessClaims & object>(token, {
        secret: this.config.jwtSecret,
        algorithms: ['HS256'],
        issuer: ISSUER,
        audience: AUDIENCE,
        clockTolerance: 30,
      });
    } catch {
      return null;
    }
    const now = Date.now() / 1000;
    if (typeof claims.exp !== 'number' || typeof claims.sub !== 'string' || typeof claims.ver !== 'number') return null;
    if (typeof claims.iat === 'number' && claims.iat > now + 30) return null;
    if (!/^[0-9a-f-]{36}$/i.test(claims.sub)) return null;
    const user = await this.users.findById(claims.sub);
    if (!user || user.disabled || user.tokenVersion !== claims.ver) return null;
    return { id: user.id, email: user.email, name: user.name, role: user.role };
  }
}
