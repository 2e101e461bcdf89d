import { createHmac } from 'node:crypto';
import { JwtService } from '@nestjs/jwt';
import { describe, expect, it } from 'vitest';
import type { AppConfig } from '../../config/app-config.js';
import { UnsubscribeTokens } from './unsubscribe-tokens.js';

const SECRET = 'a-server-secret-that-is-long-enough-0123456789';
const USER = '5d06e5f8-98bd-457e-a1c9-0afb1dafcd57';
const tokens = new UnsubscribeTokens(new JwtService({}), { jwtSecret: SECRET } as AppConfig);
const b64url = (value: Buffer | string) => Buffer.from(value).toString('base64url');

describe('unsubscribe tokens', () => {
  it('are JWS compact tokens with HS256 over "header.payload" (RFC 7515 section 7.1, RFC 7518 section 3.2)', () => {
    const token = tokens.sign({ userId: USER, kind: 'digest' });
    const [header, payload, signature] = token.split('.');
    expect(JSON.parse(Buffer.from(header, 'base64url').toString())).toEqual({ alg: 'HS256', typ: 'JWT' });
    expect(JSON.parse(Buffer.from(payload, 'base64url').toString())).toMatchObject({
      sub: USER,
      kind: 'digest',
      aud: 'linkloom-unsubscribe',
    });
    // Recomputed here from the definitions, with the purpose-derived key, not with the library under test.
    const key = createHmac('sha256', SECRET).update('linkloom unsubscribe links').digest('base64url');
    expect(signature).toBe(b64url(createHmac('sha256', key).update(`${header}.${payload}`).digest()));
    expect(tokens.verify(token)).toEqual({ userId: USER, kind: 'digest' });
  });

  it('refuse anything altered, cut short, or signed with the sign-in secret or another purpose', () => {
    const token = tokens.sign({ userId: USER, kind: 'task-assigned' });
    const [header, payload, signature] = token.split('.');
    const otherKind = b64url(JSON.stringify({ ...JSON.parse(Buffer.from(payload, 'base64url').toString()), kind: 'digest' }));
    expect(tokens.verify(`${header}.${otherKind}.${signature}`)).toBeNull();
    expect(tokens.verify(token.slice(0, -3))).toBeNull();
    const withServerSecret = new JwtService({}).sign(
      { sub: USER, kind: 'digest' },
      { secret: SECRET, algorithm: 'HS256', issuer: 'linkloom', audience: 'linkloom-unsubscribe' },
    );
    expect(tokens.verify(withServerSecret)).toBeNull();
    const unknownKind = new JwtService({}).sign(
      { sub: USER, kind: 'everything' },
      {
        secret: createHmac('sha256', SECRET).update('linkloom unsubscribe links').digest('base64url'),
        algorithm: 'HS256',
        issuer: 'linkloom',
        audience: 'linkloom-unsubscribe',
      },
    );
    expect(tokens.verify(unknownKind)).toBeNull();
    // "alg: none" (RFC 7518 section 3.6) must never pass.
    expect(tokens.verify(`${b64url(JSON.stringify({ alg: 'none', typ: 'JWT' }))}.${payload}.`)).toBeNull();
  });
});
