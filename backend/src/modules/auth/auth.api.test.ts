import 'reflect-metadata';
import jwt from 'jsonwebtoken';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { DEMO_PASSWORD } from '../demo/demo-accounts.js';

const SECRET = 'test-secret-that-is-long-enough-0123456789';
const CLAIMS = { iss: 'linkloom', aud: 'linkloom-api' };

describe('sign-in and tokens', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => t?.close());

  it('signs in a demo user and returns a token, its expiry and the user', async () => {
    const response = await t.http.post('/api/auth/sign-in').send({ email: 'Editor@Demo.Linkloom.Test', password: DEMO_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({ email: 'editor@demo.linkloom.test', role: 'editor' });
    expect(Date.parse(response.body.expiresAt)).toBeGreaterThan(Date.now());
    const me = await t.http.get('/api/me').set('Authorization', `Bearer ${response.body.accessToken}`);
    expect(me.status).toBe(200);
    expect(me.body.email).toBe('editor@demo.linkloom.test');
  });

  it('answers a wrong password and an unknown user alike (no account enumeration, OWASP ASVS 5.0 V6.3.8)', async () => {
    const wrong = await t.http.post('/api/auth/sign-in').send({ email: 'viewer@demo.linkloom.test', password: 'not-the-password' });
    const unknown = await t.http.post('/api/auth/sign-in').send({ email: 'nobody@example.com', password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
  });

  it('rejects missing, malformed, tampered, unsigned, expired and exp-less tokens with 401 (RFC 8725 section 3)', async () => {
    const valid = await t.tokenFor('viewer');
    const me = await t.http.get('/api/me').set('Authorization', `Bearer ${valid}`);
    const sub = me.body.id as string;
    const [header, payload, signature] = valid.split('.');
    const forgedPayload = Buffer.from(
      JSON.stringify({ ...JSON.parse(Buffer.from(payload, 'base64url').toString()), role: 'admin', ver: 99 }),
    ).toString('base64url');
    const now = Math.floor(Date.now() / 1000);
    const cases: Record<string, string | undefined> = {
      missing: undefined,
      garbage: 'Bearer not-a-token',
      emptyBearer: 'Bearer ',
      otherScheme: `Basic ${valid}`,
      tampered: `Bearer ${header}.${forgedPayload}.${signature}`,
      algNone: `Bearer ${Buffer.from(JSON.stringify({ alg: 'none', typ: 'JWT' })).toString('base64url')}.${payload}.`,
      hs512: `Bearer ${jwt.sign({ sub, ver: 0, ...CLAIMS }, SECRET, { algorithm: 'HS512', expiresIn: 600 })}`,
      wrongSecret: `Bearer ${jwt.sign({ sub, ver: 0, ...CLAIMS }, 'another-secret-that-is-also-long-enough', { algorithm: 'HS256', expiresIn: 600 })}`,
      expired: `Bearer ${jwt.sign({ sub, ver: 0, ...CLAIMS, exp: now - 120 }, SECRET, { algorithm: 'HS256' })}`,
      noExp: `Bearer ${jwt.sign({ sub, ver: 0, ...CLAIMS }, SECRET, { algorithm: 'HS256' })}`,
      futureIat: `Bearer ${jwt.sign({ sub, ver: 0, ...CLAIMS, iat: now + 3600, exp: now + 7200 }, SECRET, { algorithm: 'HS256' })}`,
      wrongAudience: `Bearer ${jwt.sign({ sub, ver: 0, iss: 'linkloom', aud: 'other' }, SECRET, { algorithm: 'HS256', expiresIn: 600 })}`,
      huge: `Bearer ${'a'.repeat(16_000)}`,
    };
    for (const [name, value] of Object.entries(cases)) {
      const req = t.http.get('/api/me');
      const response = await (value === undefined ? req : req.set('Authorization', value));
      expect(response.status, name).toBe(401);
      expect(response.body.code, name).toBe('UNAUTHENTICATED');
    }
  });

  it('accepts a correctly signed token with the same claims (so the 401s above are not vacuous)', async () => {
    const me = await t.http.get('/api/me').set('Authorization', `Bearer ${await t.tokenFor('viewer')}`);
    const token = jwt.sign({ sub: me.body.id, ver: 0, ...CLAIMS }, SECRET, { algorithm: 'HS256', expiresIn: 600 });
    expect((await t.http.get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(200);
  });

  it('rate-limits failed sign-ins per account without locking out others', async () => {
    const email = 'writer@demo.linkloom.test';
    for (let i = 0; i < 5; i++) {
      expect((await t.http.post('/api/auth/sign-in').send({ email, password: `wrong-${i}` })).status).toBe(401);
    }
    const sixth = await t.http.post('/api/auth/sign-in').send({ email, password: DEMO_PASSWORD });
    expect(sixth.status).toBe(429);
    expect(sixth.body.code).toBe('TOO_MANY_SIGN_IN_ATTEMPTS');
    const other = await t.http.post('/api/auth/sign-in').send({ email: 'admin@demo.linkloom.test', password: DEMO_PASSWORD });
    expect(other.status).toBe(200);
  });

  it('signs out by revoking the token, and a password change revokes older tokens', async () => {
    const signIn = await t.http.post('/api/auth/sign-in').send({ email: 'viewer@demo.linkloom.test', password: DEMO_PASSWORD });
    const token = signIn.body.accessToken as string;
    expect((await t.http.post('/api/auth/sign-out').set('Authorization', `Bearer ${token}`)).status).toBe(204);
    expect((await t.http.get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(401);

    const again = await t.http.post('/api/auth/sign-in').send({ email: 'viewer@demo.linkloom.test', password: DEMO_PASSWORD });
    const weak = await t.http
      .post('/api/me/password')
      .set('Authorization', `Bearer ${again.body.accessToken}`)
      .send({ currentPassword: DEMO_PASSWORD, newPassword: 'short' });
    expect(weak.status).toBe(400);
    const common = await t.http
      .post('/api/me/password')
      .set('Authorization', `Bearer ${again.body.accessToken}`)
      .send({ currentPassword: DEMO_PASSWORD, newPassword: 'password123' });
    expect(common.status).toBe(400);
    const changed = await t.http
      .post('/api/me/password')
      .set('Authorization', `Bearer ${again.body.accessToken}`)
      .send({ currentPassword: DEMO_PASSWORD, newPassword: 'a much longer pass phrase' });
    expect(changed.status).toBe(200);
    expect((await t.http.get('/api/me').set('Authorization', `Bearer ${again.body.accessToken}`)).status).toBe(401);
    expect((await t.http.get('/api/me').set('Authorization', `Bearer ${changed.body.accessToken}`)).status).toBe(200);
  });
});
