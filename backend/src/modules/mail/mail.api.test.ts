import 'reflect-metadata';
import { simpleParser } from 'mailparser';
import type { AddressInfo } from 'node:net';
import { SMTPServer } from 'smtp-server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { MailService } from './mail.service.js';

describe('the built-in local mailbox', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ mailPollMs: 60_000 });
  });
  afterAll(async () => t?.close());

  it('catches an outbox message and shows it to admins only, with text and HTML', async () => {
    const mail = t.app.get(MailService);
    await mail.enqueue([
      {
        kind: 'test',
        toAddress: 'writer@demo.linkloom.test',
        subject: 'Hello\r\nBcc: victim@example.com',
        text: 'plain body',
        html: '<p>html body</p>',
      },
    ]);
    expect(await mail.deliverDue()).toBe(1);
    const admin = await t.tokenFor('admin');
    const list = await t.http.get('/api/mail').set('Authorization', `Bearer ${admin}`);
    expect(list.status).toBe(200);
    expect(list.body.items).toHaveLength(1);
    // CR/LF from a title can never start a new header (docs/threats.md check 81).
    expect(list.body.items[0]).toMatchObject({ subject: 'Hello Bcc: victim@example.com', to: ['writer@demo.linkloom.test'] });
    const message = await t.http.get(`/api/mail/${list.body.items[0].id}`).set('Authorization', `Bearer ${admin}`);
    expect(message.body.text.trim()).toBe('plain body');
    expect(message.body.html).toContain('<p>html body</p>');
    expect((await t.http.get('/api/mail').set('Authorization', `Bearer ${await t.tokenFor('editor')}`)).status).toBe(403);
    const outbox = await t.http.get('/api/outbox?status=sent').set('Authorization', `Bearer ${admin}`);
    expect(outbox.body.items.map((i: { messageId: string }) => i.messageId)).toEqual([
      expect.stringMatching(/^<[0-9a-f-]+@linkloom\.local>$/),
    ]);
  });

  it('refuses crafted addresses that would add recipients (GHSA-mm7p-fcc7-pg87)', async () => {
    const mail = t.app.get(MailService);
    const ids = await mail.enqueue([
      { kind: 'test', toAddress: '"a@b x"@evil.test', subject: 's', text: 't', html: 'h' },
      { kind: 'test', toAddress: 'one@example.com, two@example.com', subject: 's', text: 't', html: 'h' },
    ]);
    expect(ids).toEqual([]);
  });
});

/** A fake SMTP server we can start, stop and make answer 4xx/5xx (docs/threats.md checks 77-80). */
async function fakeSmtp(port = 0, reply?: () => Error | null) {
  const received: { messageId: string | undefined; rcpt: string[] }[] = [];
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream).then((mail) => {
        const error = reply?.() ?? null;
        if (!error) received.push({ messageId: mail.messageId, rcpt: session.envelope.rcptTo.map((r) => r.address) });
        callback(error);
      }, callback);
    },
  });
  await new Promise<void>((resolve) => server.listen(port, '127.0.0.1', () => resolve()));
  const actual = (server as unknown as { server: { address(): AddressInfo } }).server.address().port;
  return { port: actual, received, close: () => new Promise<void>((r) => server.close(() => r())) };
}

describe('the durable outbox with a real SMTP server', () => {
  it('keeps mail while the server is down, retries, and delivers each message exactly once when it is back', async () => {
    const probe = await fakeSmtp();
    const port = probe.port;
    await probe.close(); // now nothing listens on that port
    const t = await createTestApp({ smtpUrl: `smtp://127.0.0.1:${port}`, mailPollMs: 60_000, mailRetryBaseSeconds: 1 });
    try {
      const mail = t.app.get(MailService);
      await mail.enqueue([{ kind: 'test', toAddress: 'editor@demo.linkloom.test', subject: 'Digest', text: 't', html: 'h' }]);
      expect(await mail.deliverDue()).toBe(0);
      const admin = await t.tokenFor('admin');
      const pending = await t.http.get('/api/outbox').set('Authorization', `Bearer ${admin}`);
      expect(pending.body.items[0]).toMatchObject({ status: 'pending', attempts: 1 });
      expect(pending.body.items[0].lastError).toBeTruthy();
      expect((await t.http.get('/api/health')).status).toBe(200);

      const server = await fakeSmtp(port);
      await new Promise((r) => setTimeout(r, 1_100)); // the first backoff step is 1 s in this test
      expect(await mail.deliverDue()).toBe(1);
      expect(await mail.deliverDue()).toBe(0);
      expect(server.received).toHaveLength(1);
      expect(server.received[0].rcpt).toEqual(['editor@demo.linkloom.test']);
      expect(server.received[0].messageId).toBe(pending.body.items[0].messageId);
      await server.close();
    } finally {
      await t.close();
    }
  });

  it('marks a message failed on a permanent 5xx reply and retries a temporary 4xx one (RFC 5321 section 4.2.1)', async () => {
    let answer: 'temporary' | 'permanent' = 'temporary';
    const server = await fakeSmtp(0, () =>
      Object.assign(new Error(answer === 'temporary' ? 'try later' : 'no such user'), { responseCode: answer === 'temporary' ? 451 : 550 }),
    );
    const t = await createTestApp({ smtpUrl: `smtp://127.0.0.1:${server.port}`, mailPollMs: 60_000, mailRetryBaseSeconds: 1 });
    try {
      const mail = t.app.get(MailService);
      await mail.enqueue([{ kind: 'test', toAddress: 'viewer@demo.linkloom.test', subject: 's', text: 't', html: 'h' }]);
      await mail.deliverDue();
      const admin = await t.tokenFor('admin');
      expect((await t.http.get('/api/outbox').set('Authorization', `Bearer ${admin}`)).body.items[0].status).toBe('pending');
      answer = 'permanent';
      await new Promise((r) => setTimeout(r, 1_100));
      await mail.deliverDue();
      const failed = await t.http.get('/api/outbox?status=failed').set('Authorization', `Bearer ${admin}`);
      expect(failed.body.items).toHaveLength(1);
      expect(failed.body.items[0].lastError).toContain('no such user');
      expect(server.received).toHaveLength(0);
    } finally {
      await t.close();
      await server.close();
    }
  });
});
