import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { MailService } from '../mail/mail.service.js';
import { HANDBOOK_LINKS, HANDBOOK_LINKS_V2, HANDBOOK_PAGES, HANDBOOK_PAGES_V2 } from '../runs/testing/findings-fixture.js';
import { createDocSet, read, snapshotOf, startRun, waitForRun } from '../runs/testing/run-test-kit.js';
import { NightlyJobService } from './nightly-job.service.js';

/** The number of new and gone items the digest states for one finding kind. */
function stated(text: string, label: string): { appeared: number; disappeared: number } | null {
  const match = new RegExp(`^${label}: (\\d+) new, (\\d+) gone$`, 'm').exec(text);
  return match ? { appeared: Number(match[1]), disappeared: Number(match[2]) } : null;
}

describe('the nightly job and its digest', () => {
  let t: TestApp;
  let docSetId: string;
  let firstRunId: string;
  beforeAll(async () => {
    t = await createTestApp({ mailPollMs: 600_000 });
    // A doc-set name trying to add a header to the digest's subject (RELIABILITY check 81).
    docSetId = await createDocSet(t, 'Workshop\r\nBcc: intruder@evil.test', { entryPages: ['index.md'] });
    await snapshotOf(t, docSetId, HANDBOOK_PAGES, HANDBOOK_LINKS);
    firstRunId = (await waitForRun(t, docSetId, await startRun(t, docSetId))).id;
    await snapshotOf(t, docSetId, HANDBOOK_PAGES_V2, HANDBOOK_LINKS_V2);
  });
  afterAll(async () => t?.close());

  it('runs once when triggered twice at once, re-analysing the latest snapshot', async () => {
    const nightly = t.app.get(NightlyJobService);
    const [a, b] = await Promise.all([nightly.trigger('run-now'), nightly.trigger('clock')]);
    const outcomes = [a.status, b.status].sort();
    expect(outcomes).toEqual(['finished', 'skipped']);
    const done = a.status === 'finished' ? a : b;
    expect(done.docSets).toEqual([expect.objectContaining({ docSetId, action: 're-analysed', outcome: 'finished' })]);
    const runs = await read(t, `/api/doc-sets/${docSetId}/runs`);
    expect(runs.body.items.filter((r: { trigger: string }) => r.trigger === 'nightly')).toHaveLength(1);
    const status = await t.http.get('/api/schedule').set('Authorization', `Bearer ${await t.tokenFor('editor')}`);
    expect(status.body).toMatchObject({ nightlyTime: '02:00', running: false });
    expect(Date.parse(status.body.nextRunAt)).toBeGreaterThan(Date.now());
  });

  it('delivers a digest to the local mailbox whose numbers match the run diff, with a one-line subject', async () => {
    await t.app.get(MailService).deliverDue();
    const admin = await t.tokenFor('admin');
    const list = await t.http.get('/api/mail').set('Authorization', `Bearer ${admin}`);
    const digests = list.body.items.filter((m: { subject: string }) => m.subject.startsWith('Linkloom nightly'));
    // Editors and admins follow a doc set by default.
    expect(digests.map((m: { to: string[] }) => m.to[0]).sort()).toEqual(['admin@demo.linkloom.test', 'editor@demo.linkloom.test']);
    expect(digests[0].subject).not.toMatch(/[\r\n]/);
    expect(digests.every((m: { to: string[] }) => m.to.length === 1 && !m.to.includes('intruder@evil.test'))).toBe(true);

    const message = await t.http.get(`/api/mail/${digests[0].id}`).set('Authorization', `Bearer ${admin}`);
    const runs = await read(t, `/api/doc-sets/${docSetId}/runs`);
    const nightlyRun = runs.body.items.find((r: { trigger: string }) => r.trigger === 'nightly');
    const diff = await read(t, `/api/doc-sets/${docSetId}/runs/${nightlyRun.id}/diff?against=${firstRunId}`);
    for (const [kind, label] of [
      ['brokenLinks', 'Broken links'],
      ['orphans', 'Orphan pages'],
      ['deadEnds', 'Dead ends'],
      ['unreachable', 'Unreachable pages'],
    ]) {
      const expected = { appeared: diff.body.kinds[kind].appeared.total, disappeared: diff.body.kinds[kind].disappeared.total };
      const found = stated(message.body.text, label);
      if (expected.appeared + expected.disappeared === 0) expect(found, label).toBeNull();
      else expect(found, label).toEqual(expected);
    }
    // The fixture's second snapshot fixes one broken link and adds another (hand-drawn, see findings-fixture.ts).
    expect(stated(message.body.text, 'Broken links')).toEqual({ appeared: 1, disappeared: 1 });
    expect(message.body.html).toContain('Broken links: 1 new, 1 gone');
  });

  it('lets editors start it from the API, and not viewers', async () => {
    expect((await t.http.post('/api/schedule/run-now').set('Authorization', `Bearer ${await t.tokenFor('viewer')}`)).status).toBe(403);
    const started = await t.http.post('/api/schedule/run-now').set('Authorization', `Bearer ${await t.tokenFor('editor')}`);
    expect(started.status).toBe(202);
    expect(started.body.started).toBe(true);
  });
});
