import 'reflect-metadata';
import { MAIL_KINDS } from '@linkloom/shared';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { MailComposer } from './mail-composer.service.js';
import { NotificationSettingsService } from './notification-settings.service.js';

describe('notification settings and the one-click unsubscribe', () => {
  let t: TestApp;
  let docSetId: string;
  const ids: Record<string, string> = {};
  const as = async (role: 'admin' | 'editor' | 'writer' | 'viewer') => `Bearer ${await t.tokenFor(role)}`;
  const settingsOf = async (role: 'admin' | 'editor' | 'writer' | 'viewer') =>
    (await t.http.get('/api/me/notifications').set('Authorization', await as(role))).body;
  const recipients = (kind: (typeof MAIL_KINDS)[number], scope: { docSetId?: string; userIds?: string[] }) =>
    t.app
      .get(NotificationSettingsService)
      .recipients(kind, scope)
      .then((r) => r.map((x) => x.email));

  beforeAll(async () => {
    t = await createTestApp();
    docSetId = (
      await t.http
        .post('/api/doc-sets')
        .set('Authorization', await as('editor'))
        .send({ name: 'Quay manual' })
    ).body.id;
    for (const role of ['admin', 'editor', 'writer', 'viewer'] as const) {
      ids[role] = (await t.http.get('/api/me').set('Authorization', await as(role))).body.id;
    }
  });
  afterAll(async () => t?.close());

  it('starts from defaults by role: every kind on, digests and pruning mail for the people who triage', async () => {
    const editor = await settingsOf('editor');
    expect(editor).toMatchObject({
      timeZoneIsDefault: true,
      kinds: { digest: true, 'task-assigned': true, 'task-reopened': true, 'pruning-waiting': true },
    });
    expect(editor.docSets).toEqual([{ docSetId, docSetName: 'Quay manual', digest: true, nothingChanged: false, pruningWaiting: true }]);
    expect((await settingsOf('writer')).docSets[0]).toMatchObject({ digest: false, pruningWaiting: false });
    expect(await recipients('pruning-waiting', { docSetId })).toEqual(['admin@demo.linkloom.test', 'editor@demo.linkloom.test']);
  });

  it('keeps an IANA time zone and refuses a made-up one with a message a person can act on', async () => {
    const writer = await as('writer');
    const good = await t.http.patch('/api/me/notifications').set('Authorization', writer).send({ timeZone: 'Europe/Berlin' });
    expect(good.status).toBe(200);
    expect(good.body).toMatchObject({ timeZone: 'Europe/Berlin', timeZoneIsDefault: false });
    const bad = await t.http.patch('/api/me/notifications').set('Authorization', writer).send({ timeZone: 'Mars/Olympus_Mons' });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toContain('use an IANA name such as Europe/Berlin');
    expect((await settingsOf('writer')).timeZone).toBe('Europe/Berlin');
  });

  it('changes nothing when one doc set in the request is unknown, and rejects unknown kinds and empty requests', async () => {
    const writer = await as('writer');
    const unknown = await t.http
      .patch('/api/me/notifications')
      .set('Authorization', writer)
      .send({ timeZone: 'Asia/Tokyo', docSets: [{ docSetId: '00000000-0000-4000-8000-000000000000', digest: true }] });
    expect(unknown.status).toBe(404);
    expect((await settingsOf('writer')).timeZone).toBe('Europe/Berlin');
    expect(
      (
        await t.http
          .patch('/api/me/notifications')
          .set('Authorization', writer)
          .send({ kinds: { everything: false } })
      ).status,
    ).toBe(400);
    expect((await t.http.patch('/api/me/notifications').set('Authorization', writer).send({})).status).toBe(400);
  });

  it('lets a switch per kind beat every per-doc-set choice, and keeps pruning mail for those who decide', async () => {
    const editor = await as('editor');
    await t.http
      .patch('/api/me/notifications')
      .set('Authorization', editor)
      .send({ kinds: { digest: false } });
    expect(await recipients('digest', { docSetId })).toEqual(['admin@demo.linkloom.test']);
    await t.http
      .patch('/api/me/notifications')
      .set('Authorization', editor)
      .send({ kinds: { digest: true }, docSets: [{ docSetId, pruningWaiting: false }] });
    expect(await recipients('digest', { docSetId })).toEqual(['admin@demo.linkloom.test', 'editor@demo.linkloom.test']);
    expect(await recipients('pruning-waiting', { docSetId })).toEqual(['admin@demo.linkloom.test']);
    // A writer asking for pruning mail still gets none: only editors and admins decide on the list.
    await t.http
      .patch('/api/me/notifications')
      .set('Authorization', await as('writer'))
      .send({ docSets: [{ docSetId, pruningWaiting: true }] });
    expect(await recipients('pruning-waiting', { docSetId })).not.toContain('writer@demo.linkloom.test');
  });

  it('unsubscribes with the link alone, as a mail client does for List-Unsubscribe-Post (RFC 8058 section 3.1)', async () => {
    const links = t.app.get(MailComposer).links(ids.viewer, 'digest');
    const path = new URL(links.oneClick).pathname;
    const info = await t.http.get(path);
    expect(info.status).toBe(200);
    expect(info.body).toEqual({
      kind: 'digest',
      kindLabel: 'Digest of what changed',
      maskedEmail: 'v•••@demo.linkloom.test',
      subscribed: true,
    });
    // RFC 8058 section 3.1: the client POSTs "List-Unsubscribe=One-Click" as a form, without cookies or sign-in.
    const post = await t.http.post(path).type('form').send('List-Unsubscribe=One-Click');
    expect(post.status).toBe(200);
    expect(post.body).toMatchObject({ kind: 'digest', subscribed: false });
    expect((await settingsOf('viewer')).kinds.digest).toBe(false);
    expect((await t.http.post(path).type('form').send('List-Unsubscribe=One-Click')).status).toBe(200);
  });

  it('stops each kind of mail with its own link, and only that kind', async () => {
    for (const kind of MAIL_KINDS) {
      const before = (await settingsOf('admin')).kinds;
      expect(before[kind], kind).toBe(true);
      await t.http.post(new URL(t.app.get(MailComposer).links(ids.admin, kind).oneClick).pathname);
      const after = (await settingsOf('admin')).kinds;
      expect(after[kind], kind).toBe(false);
      expect(await recipients(kind, { docSetId, userIds: [ids.admin] }), kind).toEqual([]);
      for (const other of MAIL_KINDS.filter((k) => k !== kind)) expect(after[other], `${kind} left ${other} as it was`).toBe(before[other]);
    }
  });

  it('refuses an altered or foreign token with 400 and a clear message, and never signs anyone in with it', async () => {
    const oneClick = t.app.get(MailComposer).links(ids.writer, 'task-assigned').oneClick;
    const token = oneClick.slice(oneClick.lastIndexOf('/') + 1);
    const altered = `${token.slice(0, -2)}${token.endsWith('A') ? 'BB' : 'AA'}`;
    const refused = await t.http.post(`/api/unsubscribe/${altered}`);
    expect(refused.status).toBe(400);
    expect(refused.body).toMatchObject({ code: 'UNSUBSCRIBE_LINK_INVALID' });
    expect(refused.body.message).toContain('Copy the whole link');
    const accessToken = await t.tokenFor('writer');
    expect((await t.http.post(`/api/unsubscribe/${accessToken}`)).status).toBe(400);
    expect((await t.http.get('/api/me').set('Authorization', `Bearer ${token}`)).status).toBe(401);
    expect((await settingsOf('writer')).kinds['task-assigned']).toBe(true);
  });
});
