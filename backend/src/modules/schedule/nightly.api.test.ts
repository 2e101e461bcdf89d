import 'reflect-metadata';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { DigestService } from '../digest/digest.service.js';
import { MailService } from '../mail/mail.service.js';
import { HANDBOOK_LINKS, HANDBOOK_PAGES } from '../runs/testing/findings-fixture.js';
import { createDocSet, read, snapshotOf, startRun, waitForRun } from '../runs/testing/run-test-kit.js';
import { NightlyJobService } from './nightly-job.service.js';

/** The numbers the digest states for one finding kind, e.g. "Broken anchors: 1 new, 0 fixed". */
function stated(text: string, label: string): { appeared: number; disappeared: number } | null {
  const match = new RegExp(`^${label}: (\\d+) [a-z ]+, (\\d+) [a-z ]+$`, 'm').exec(text);
  return match ? { appeared: Number(match[1]), disappeared: Number(match[2]) } : null;
}

const LABELS: [kind: string, label: string][] = [
  ['brokenLinks', 'Broken links'],
  ['brokenAnchors', 'Broken anchors'],
  ['pages', 'Pages'],
  ['orphans', 'Orphan pages'],
  ['unreachable', 'Unreachable pages'],
  ['deadEnds', 'Dead ends'],
  ['deepPages', 'Deep pages'],
];

// The day's changes, drawn by hand: three pages removed (with their links) and one broken anchor more.
const REMOVED = ['swap/left.md', 'swap/right.md', 'notes/100%_done.md'];
const PAGES_V2 = HANDBOOK_PAGES.filter((p) => !REMOVED.includes(p.path));
const LINKS_V2 = [
  ...HANDBOOK_LINKS.filter((l) => !REMOVED.includes(l.from) && !REMOVED.includes(l.to ?? '')),
  { from: 'index.md', to: 'tools/setup.md', href: 'tools/setup.md#vise', anchor: 'vise', status: 'broken-anchor' as const, line: 20 },
];

describe('the nightly job and its digest of what changed since each reader last heard', () => {
  let t: TestApp;
  let docSetId: string;
  const mails = async () => {
    await t.app.get(MailService).deliverDue();
    const admin = await t.tokenFor('admin');
    const list = await t.http.get('/api/mail?pageSize=100').set('Authorization', `Bearer ${admin}`);
    const digests = list.body.items.filter((m: { subject: string }) => m.subject.startsWith('Linkloom digest'));
    return Promise.all(
      digests.map(async (m: { id: string }) => (await t.http.get(`/api/mail/${m.id}`).set('Authorization', `Bearer ${admin}`)).body),
    ) as Promise<{ to: string[]; subject: string; text: string; html: string; headers: Record<string, string> }[]>;
  };
  const nightly = () => t.app.get(NightlyJobService).trigger('run-now');

  beforeAll(async () => {
    t = await createTestApp({ mailPollMs: 600_000 });
    // A doc-set name trying to add a header to the digest's subject (docs/mail-and-work.md, "Threats considered").
    docSetId = await createDocSet(t, 'Workshop\r\nBcc: intruder@evil.test', { entryPages: ['index.md'] });
    await snapshotOf(t, docSetId, HANDBOOK_PAGES, HANDBOOK_LINKS);
    await waitForRun(t, docSetId, await startRun(t, docSetId));
    // The writer follows the digest, also when nothing changed, and reads dates in India's time zone.
    const writer = `Bearer ${await t.tokenFor('writer')}`;
    const patch = await t.http
      .patch('/api/me/notifications')
      .set('Authorization', writer)
      .send({ timeZone: 'Asia/Kolkata', docSets: [{ docSetId, digest: true, nothingChanged: true }] });
    expect(patch.status).toBe(200);
  });
  afterAll(async () => t?.close());

  it('runs once when triggered twice at once; a night with no change mails only who asked for "nothing changed"', async () => {
    const [a, b] = await Promise.all([nightly(), t.app.get(NightlyJobService).trigger('clock')]);
    expect([a.status, b.status].sort()).toEqual(['finished', 'skipped']);
    const done = a.status === 'finished' ? a : b;
    expect(done.docSets).toEqual([expect.objectContaining({ docSetId, action: 're-analysed', outcome: 'finished', digestSentTo: 1 })]);
    const sent = await mails();
    expect(sent.map((m) => m.to[0])).toEqual(['writer@demo.linkloom.test']);
    expect(sent[0].text).toContain('Nothing changed since your last digest.');
    // The current totals also when nothing changed: the newest run's own counts.
    const latest = (await read(t, `/api/doc-sets/${docSetId}/runs/latest`)).body;
    expect(sent[0].text).toContain(
      `Totals now: pages ${latest.counts.pages}, broken links ${latest.counts.brokenLinks}, broken anchors ${latest.counts.brokenAnchors}`,
    );
    expect(sent[0].subject).not.toMatch(/[\r\n]/);
  });

  it('reports every change made during the day (upload and settings change), with the numbers of the run diff', async () => {
    const before = (await read(t, `/api/doc-sets/${docSetId}/runs/latest`)).body;
    await snapshotOf(t, docSetId, PAGES_V2, LINKS_V2);
    await waitForRun(t, docSetId, await startRun(t, docSetId));
    // A settings change saved during the day (pages two clicks deep now count as deep), then re-analysed.
    const editor = `Bearer ${await t.tokenFor('editor')}`;
    expect(
      (
        await t.http
          .patch(`/api/doc-sets/${docSetId}`)
          .set('Authorization', editor)
          .send({ settings: { depthThreshold: 1 } })
      ).status,
    ).toBe(200);
    await waitForRun(t, docSetId, await startRun(t, docSetId));
    const outcome = await nightly();
    const after = (await read(t, `/api/doc-sets/${docSetId}/runs/latest`)).body;
    expect(after.trigger).toBe('nightly');
    // Editors and admins follow a doc set by default; the writer chose to.
    const digests = (await mails()).filter((m) => !m.text.includes('Nothing changed'));
    expect(digests.map((m) => m.to[0]).sort()).toEqual([
      'admin@demo.linkloom.test',
      'editor@demo.linkloom.test',
      'writer@demo.linkloom.test',
    ]);
    expect(outcome.docSets[0].digestSentTo).toBe(3);
    expect(digests.every((m) => m.to.length === 1 && !m.to.includes('intruder@evil.test'))).toBe(true);

    // The digest compares last night's run with tonight's: exactly the diff the API gives for those two runs.
    const diff = (await read(t, `/api/doc-sets/${docSetId}/runs/${after.id}/diff?against=${before.id}`)).body;
    const text = digests[0].text;
    for (const [kind, label] of LABELS) {
      const expected = { appeared: diff.kinds[kind].appeared.total, disappeared: diff.kinds[kind].disappeared.total };
      if (expected.appeared + expected.disappeared === 0) expect(stated(text, label), label).toBeNull();
      else expect(stated(text, label), label).toEqual(expected);
    }
    // The hand-drawn changes themselves: 3 pages removed, 1 broken anchor more, and deep pages from the setting.
    expect(stated(text, 'Pages')).toEqual({ appeared: 0, disappeared: 3 });
    expect(stated(text, 'Broken anchors')).toEqual({ appeared: 1, disappeared: 0 });
    expect(stated(text, 'Deep pages')?.appeared).toBeGreaterThan(0);
    for (const path of REMOVED) expect(text).toContain(`removed: ${path}`);
    expect(digests[0].html).toContain('Broken anchors: 1 new, 0 fixed');
  });

  it('writes dates in the reader’s time zone and links into the app', async () => {
    const latest = (await read(t, `/api/doc-sets/${docSetId}/runs/latest`)).body;
    const writer = (await mails()).find((m) => m.to[0] === 'writer@demo.linkloom.test' && !m.text.includes('Nothing changed'))!;
    // Asia/Kolkata is UTC+05:30 all year (IANA time zone database, no daylight saving since 1945).
    const local = new Date(Date.parse(latest.finishedAt) + 5.5 * 3600_000);
    const hhmm = `${String(local.getUTCHours()).padStart(2, '0')}:${String(local.getUTCMinutes()).padStart(2, '0')}`;
    expect(writer.text).toContain(`${hhmm} (Asia/Kolkata)`);
    expect(writer.text).toContain(`${t.config.publicUrl}/doc-sets/${docSetId}/findings?run=${latest.id}`);
  });

  it('sends each run’s digest once, and nothing to a reader whose last digest covered that run', async () => {
    const latest = (await read(t, `/api/doc-sets/${docSetId}/runs/latest`)).body;
    const count = (await mails()).length;
    expect(await t.app.get(DigestService).sendForRun(docSetId, latest.id)).toBe(0);
    expect(await mails()).toHaveLength(count);
  });

  it('lets editors start it from the API, as the README role table says, and not writers or viewers', async () => {
    // The README's table of roles is what people read; the server must do what it says.
    const readme = readFileSync(new URL('../../../../README.md', import.meta.url), 'utf8');
    const row = (role: string) => readme.split('\n').find((l) => l.startsWith(`| ${role} |`)) ?? '';
    expect(row('editor')).toMatch(/nightly job/);
    expect(row('writer')).not.toMatch(/nightly/);
    for (const role of ['viewer', 'writer'] as const) {
      expect((await t.http.post('/api/schedule/run-now').set('Authorization', `Bearer ${await t.tokenFor(role)}`)).status, role).toBe(403);
    }
    const started = await t.http.post('/api/schedule/run-now').set('Authorization', `Bearer ${await t.tokenFor('editor')}`);
    expect(started.status).toBe(202);
    expect(started.body.started).toBe(true);
  });
});
