import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { NotificationSettingsService } from './notification-settings.service.js';

describe('digest subscriptions', () => {
  let t: TestApp;
  let docSetId: string;
  beforeAll(async () => {
    t = await createTestApp();
    const created = await t.http
      .post('/api/doc-sets')
      .set('Authorization', `Bearer ${await t.tokenFor('editor')}`)
      .send({ name: 'Subscribed' });
    docSetId = created.body.id;
  });
  afterAll(async () => t?.close());

  it('defaults to the digest for editors and admins, not for writers and viewers', async () => {
    const editor = await t.http.get('/api/me/subscriptions').set('Authorization', `Bearer ${await t.tokenFor('editor')}`);
    expect(editor.body.subscriptions).toEqual([{ docSetId, digest: true, nothingChanged: false }]);
    const writer = await t.http.get('/api/me/subscriptions').set('Authorization', `Bearer ${await t.tokenFor('writer')}`);
    expect(writer.body.subscriptions).toEqual([{ docSetId, digest: false, nothingChanged: false }]);
    const recipients = await t.app.get(NotificationSettingsService).recipients('digest', { docSetId });
    expect(recipients.map((r) => r.email)).toEqual(['admin@demo.linkloom.test', 'editor@demo.linkloom.test']);
  });

  it("stores each user's own choice, which then decides who receives the digest", async () => {
    const writer = await t.tokenFor('writer');
    const put = await t.http
      .put('/api/me/subscriptions')
      .set('Authorization', `Bearer ${writer}`)
      .send({ subscriptions: [{ docSetId, digest: true, nothingChanged: true }] });
    expect(put.status).toBe(200);
    expect(put.body.subscriptions).toEqual([{ docSetId, digest: true, nothingChanged: true }]);
    await t.http
      .put('/api/me/subscriptions')
      .set('Authorization', `Bearer ${await t.tokenFor('admin')}`)
      .send({ subscriptions: [{ docSetId, digest: false, nothingChanged: false }] });
    const recipients = await t.app.get(NotificationSettingsService).recipients('digest', { docSetId });
    expect(recipients.map((r) => [r.email, r.nothingChanged])).toEqual([
      ['editor@demo.linkloom.test', false],
      ['writer@demo.linkloom.test', true],
    ]);
  });

  it('rejects unknown doc sets and malformed bodies', async () => {
    const viewer = await t.tokenFor('viewer');
    const unknown = await t.http
      .put('/api/me/subscriptions')
      .set('Authorization', `Bearer ${viewer}`)
      .send({ subscriptions: [{ docSetId: '00000000-0000-4000-8000-000000000000', digest: true, nothingChanged: false }] });
    expect(unknown.status).toBe(404);
    const bad = await t.http
      .put('/api/me/subscriptions')
      .set('Authorization', `Bearer ${viewer}`)
      .send({ subscriptions: [{ docSetId, digest: 'yes' }] });
    expect(bad.status).toBe(400);
  });
});
