import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('user administration', () => {
  let t: TestApp;
  let admin: string;
  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.tokenFor('admin');
  });
  afterAll(async () => t?.close());

  it('lets an admin list users, paged', async () => {
    const response = await t.http.get('/api/users?page=1&pageSize=2').set('Authorization', `Bearer ${admin}`);
    expect(response.status).toBe(200);
    expect(response.body.total).toBe(4);
    expect(response.body.items).toHaveLength(2);
    expect(response.body.items[0]).not.toHaveProperty('passwordHash');
  });

  it('refuses the user list to every other role with 403', async () => {
    for (const role of ['editor', 'writer', 'viewer'] as const) {
      const response = await t.http.get('/api/users').set('Authorization', `Bearer ${await t.tokenFor(role)}`);
      expect(response.status, role).toBe(403);
      expect(response.body.code).toBe('FORBIDDEN');
    }
  });

  it('creates a user, disables them (they can no longer sign in, old tokens stop working) and audits both', async () => {
    const created = await t.http
      .post('/api/users')
      .set('Authorization', `Bearer ${admin}`)
      .send({ email: 'new.writer@example.com', name: 'New Writer', role: 'writer', password: 'a fine long password' });
    expect(created.status).toBe(201);
    const signIn = await t.http.post('/api/auth/sign-in').send({ email: 'new.writer@example.com', password: 'a fine long password' });
    expect(signIn.status).toBe(200);

    const disabled = await t.http.patch(`/api/users/${created.body.id}`).set('Authorization', `Bearer ${admin}`).send({ disabled: true });
    expect(disabled.status).toBe(200);
    expect(disabled.body.disabled).toBe(true);
    expect(
      (await t.http.post('/api/auth/sign-in').send({ email: 'new.writer@example.com', password: 'a fine long password' })).status,
    ).toBe(401);
    expect((await t.http.get('/api/me').set('Authorization', `Bearer ${signIn.body.accessToken}`)).status).toBe(401);

    const audit = await t.http.get(`/api/audit?entityType=user&entityId=${created.body.id}`).set('Authorization', `Bearer ${admin}`);
    expect(audit.body.items.map((i: { action: string }) => i.action).sort()).toEqual(['user.created', 'user.updated']);
    expect(audit.body.items.find((i: { action: string }) => i.action === 'user.updated').actorEmail).toBe('admin@demo.linkloom.test');
  });

  it('rejects duplicate e-mails, unknown fields (mass assignment) and self-demotion', async () => {
    const dup = await t.http
      .post('/api/users')
      .set('Authorization', `Bearer ${admin}`)
      .send({ email: 'viewer@demo.linkloom.test', name: 'x', role: 'viewer', password: 'another long password' });
    expect(dup.status).toBe(409);
    const me = await t.http.get('/api/me').set('Authorization', `Bearer ${admin}`);
    const extra = await t.http.patch(`/api/users/${me.body.id}`).set('Authorization', `Bearer ${admin}`).send({ tokenVersion: 5 });
    expect(extra.status).toBe(400);
    const self = await t.http.patch(`/api/users/${me.body.id}`).set('Authorization', `Bearer ${admin}`).send({ role: 'viewer' });
    expect(self.status).toBe(403);
  });

  it('a role change takes effect at once: the demoted user is refused with the old token', async () => {
    const created = await t.http
      .post('/api/users')
      .set('Authorization', `Bearer ${admin}`)
      .send({ email: 'temp.admin@example.com', name: 'Temp', role: 'admin', password: 'temporary long password' });
    const token = (await t.http.post('/api/auth/sign-in').send({ email: 'temp.admin@example.com', password: 'temporary long password' }))
      .body.accessToken;
    expect((await t.http.get('/api/users').set('Authorization', `Bearer ${token}`)).status).toBe(200);
    await t.http.patch(`/api/users/${created.body.id}`).set('Authorization', `Bearer ${admin}`).send({ role: 'viewer' });
    expect((await t.http.get('/api/users').set('Authorization', `Bearer ${token}`)).status).toBe(401);
  });
});
