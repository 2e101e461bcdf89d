/**
 * The import pipeline over HTTP: per-page content problems (docs/threats.md checks 27-34) skip or flag pages
 * without failing the import, one import per doc set (check 61), incremental re-import, interrupted imports
 * after a restart, the per-user quota (check 26), server-folder imports and the `snapshot.ready` event.
 */
import 'reflect-metadata';
import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DomainEvents } from '../../common/events/domain-events.js';
import { DbService } from '../../db/db.service.js';
import { snapshots } from '../../db/schema/index.js';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { wellFormedZip } from '../../testing/zip/well-formed-zip.js';
import { FirstStartSeeder } from '../demo/first-start.seeder.js';
import { generateDemoHandbook } from '../demo/generator/index.js';
import { DEMO_DOC_SET_NAME, DemoDocSetSeeder } from './demo-doc-set.seeder.js';
import { ImportExecutor } from './import-executor.js';
import { PageStoreRepository } from './storage/page-store.repository.js';
import { linkFixtures } from '@linkloom/shared/fixtures';
import { createDocSet, importKit } from './testing/ingest-test-kit.js';

const handbook = (pages: number, changed = -1): Record<string, string> => {
  const files: Record<string, string> = {};
  for (let i = 0; i < pages; i += 1) {
    const next = (i + 1) % pages;
    files[`book/p${i}.md`] =
      `# Page ${i}${i === changed ? ' (edited)' : ''}\n\n## Details\n\nGo to [page ${next}](p${next}.md#details) or [home](p0.md).\n`;
  }
  return files;
};

describe('snapshot import pipeline', () => {
  let t: TestApp;
  const ready: Array<{ snapshotId: string; trigger: string }> = [];

  beforeAll(async () => {
    const sourceRoot = mkdtempSync(join(process.env.TMPDIR ?? '/tmp', 'linkloom-source-'));
    t = await createTestApp({ sourceRoot });
    t.app.get(DomainEvents).on('snapshot.ready', (event) => void ready.push(event));
  });
  afterAll(async () => t?.close());

  it('27-29: invalid UTF-8, binary and UTF-16 pages are skipped with a warning; CRLF and LF read the same', async () => {
    const kit = await importKit(t, await createDocSet(t, {}, 'Encodings'));
    const done = await kit.importAndWait(
      await wellFormedZip({
        'docs/index.md': '# Home\n\n[LF](lf.md) [CRLF](crlf.md) [CR](cr.md)\n',
        'docs/lf.md': '# Same title\n\nText [home](index.md).\n',
        'docs/crlf.md': '\uFEFF# Same title\r\n\r\nText [home](index.md).\r\n',
        'docs/cr.md': '# Same title\r\rText [home](index.md).\r',
        'docs/bad-utf8.md': Buffer.from([0x23, 0x20, 0xc3, 0x28, 0x0a]),
        'docs/image.md': Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]),
        'docs/wide.md': Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from('# Wide\n', 'utf16le')]),
      }),
    );
    expect(done.status).toBe('ready');
    expect(await kit.pagePaths(done.id)).toEqual(['cr.md', 'crlf.md', 'index.md', 'lf.md']);
    const codes = Object.fromEntries(done.warnings.map((w: { path: string; code: string }) => [w.path, w.code]));
    expect(codes).toMatchObject({ 'bad-utf8.md': 'INVALID_UTF8', 'image.md': 'BINARY_CONTENT', 'wide.md': 'UNSUPPORTED_ENCODING' });
    const titles = await pageTitles(t, done.id);
    expect([titles['lf.md'], titles['crlf.md'], titles['cr.md']]).toEqual(['Same title', 'Same title', 'Same title']);
    expect(done.linkCount).toBe(6);
  });

  it('30-33: bad, executable and oversized front matter imports the page without metadata and runs nothing', async () => {
    const kit = await importKit(t, await createDocSet(t, {}, 'Front matter'));
    const done = await kit.importAndWait(
      await wellFormedZip({
        'index.md': '# Home\n',
        'unclosed.md': '---\ntitle: "open\n---\n# Unclosed\n',
        'tabs.md': '---\ntitle: x\n\tbad: 1\n---\n# Tabs\n',
        'js.md': '---js\n{ title: (globalThis.__pwned = 1) }\n---\n# Js\n',
        'javascript.md': '---javascript\nglobalThis.__pwned = 1\n---\n# Javascript\n',
        'proto.md': '---\n__proto__:\n  polluted: yes\nconstructor:\n  prototype:\n    polluted: yes\n---\n# Proto\n',
        'bomb.md': `---\na: &a ["x","x","x","x","x","x","x","x","x"]\n${Array.from({ length: 19 }, (_, i) => `${String.fromCharCode(98 + i)}: &${String.fromCharCode(98 + i)} [*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)},*${String.fromCharCode(97 + i)}]`).join('\n')}\n---\n# Bomb\n`,
        'big.md': `---\nnote: "${'x'.repeat(70 * 1024)}"\n---\n# Big\n`,
      }),
    );
    expect(done.status).toBe('ready');
    expect(done.pageCount).toBe(8);
    const flagged = new Set(
      done.warnings.filter((w: { code: string }) => w.code === 'FRONT_MATTER_INVALID').map((w: { path: string }) => w.path),
    );
    for (const path of ['unclosed.md', 'tabs.md', 'bomb.md', 'big.md']) expect(flagged.has(path), path).toBe(true);
    expect((globalThis as { __pwned?: unknown }).__pwned).toBeUndefined();
    expect(({} as { polluted?: unknown }).polluted).toBeUndefined();
  });

  it('34: pathological Markdown is parsed in time or skipped as PARSE_TIMEOUT; the event loop stays responsive', async () => {
    const kit = await importKit(t, await createDocSet(t, {}, 'Pathological'));
    const zip = await wellFormedZip({
      'index.md': '# Home\n',
      'brackets.md': '['.repeat(1024 * 1024),
      'emphasis.md': `${'*a '.repeat(10_000)}${' a*'.repeat(10_000)}\n`,
      'links.md': Array.from({ length: 100_000 }, (_, i) => `[l${i}](p${i % 50}.md)`).join(' '),
      'headings.md': Array.from({ length: 10_000 }, (_, i) => `## Heading ${i}\n`).join('\n'),
    });
    const delay = monitorEventLoopDelay({ resolution: 10 });
    delay.enable();
    const done = await kit.importAndWait(zip);
    delay.disable();
    expect(done.status, done.error).toBe('ready');
    const skipped = done.warnings.filter((w: { code: string }) => w.code === 'PARSE_TIMEOUT').map((w: { path: string }) => w.path);
    expect(done.pageCount + skipped.length).toBe(5);
    // Measured and reported only: a wall-clock bound fails on a busy CI machine, so the event-loop target
    // lives in the benchmarks (npm run bench), not here.
    const p99 = delay.percentile(99) / 1e6;
    console.info(
      `check 34: import ${done.importMs} ms, event-loop delay p99 ${p99.toFixed(1)} ms, max ${(delay.max / 1e6).toFixed(1)} ms, timed out: ${skipped.join(', ') || 'none'}`,
    );
  });

  it('61: five uploads at once give exactly one 202 and four 409 IMPORT_IN_PROGRESS; the accepted archive wins', async () => {
    const kit = await importKit(t, await createDocSet(t, {}, 'Race'));
    const zips = await Promise.all(
      [1, 2, 3, 4, 5].map((n) => wellFormedZip({ [`v${n}/index.md`]: `# Version ${n}\n`, [`v${n}/only-${n}.md`]: `# Only ${n}\n` })),
    );
    // Hold the accepted import until every upload has been answered: a small archive could otherwise finish
    // importing before the last request arrives, and a second import after it would rightly be accepted.
    const executor = t.app.get(ImportExecutor);
    const start = executor.start.bind(executor);
    let release!: () => void;
    const gate = new Promise<void>((resolve) => (release = resolve));
    executor.start = (job) => gate.then(() => start(job));
    const responses = await Promise.all(zips.map((zip) => kit.upload(zip)));
    executor.start = start;
    release();
    const statuses = responses.map((r) => r.status).sort();
    expect(statuses).toEqual([202, 409, 409, 409, 409]);
    for (const r of responses.filter((x) => x.status === 409)) expect(r.body.code).toBe('IMPORT_IN_PROGRESS');
    const accepted = responses.findIndex((r) => r.status === 202);
    const done = await kit.waitFor(responses[accepted].body.snapshot.id);
    expect(done.status).toBe('ready');
    expect(await kit.pagePaths(done.id)).toEqual(['index.md', `only-${accepted + 1}.md`]);
    const state = await kit.state();
    expect(state.snapshotIds).toEqual([done.id]);
    expect(state.uploadFiles).toEqual([]);
  });

  it('re-imports incrementally: one changed page of N is parsed, N-1 reused, results equal a full import', async () => {
    const n = 40;
    const kit = await importKit(t, await createDocSet(t, {}, 'Incremental'));
    const first = await kit.importAndWait(await wellFormedZip(handbook(n)));
    expect(first).toMatchObject({ status: 'ready', pageCount: n, reusedPageCount: 0 });
    const second = await kit.importAndWait(await wellFormedZip(handbook(n, 7)));
    expect(second).toMatchObject({ status: 'ready', pageCount: n, reusedPageCount: n - 1, linkCount: first.linkCount });
    const fresh = await importKit(t, await createDocSet(t, {}, 'Full import'));
    const full = await fresh.importAndWait(await wellFormedZip(handbook(n, 7)));
    expect(full.reusedPageCount).toBe(0);
    expect(await contentOf(t, second.id)).toEqual(await contentOf(t, full.id));
    expect(ready.map((e) => e.snapshotId)).toEqual(expect.arrayContaining([first.id, second.id, full.id]));
  });

  it('marks imports cut short by a restart as failed INTERRUPTED and removes their rows', async () => {
    const docSetId = await createDocSet(t, {}, 'Interrupted');
    const kit = await importKit(t, docSetId);
    const previous = await kit.importAndWait(await wellFormedZip({ 'a/index.md': '# Home\n' }));
    const db = t.app.get(DbService).db;
    const [row] = await db.insert(snapshots).values({ docSetId, source: 'upload', status: 'importing' }).returning();
    await db.execute(sqlInsertPage(row.id));
    // The boot hook a restart runs (docs/threats.md, "Import pipeline" step 8); the in-memory test database survives it.
    await t.app.get(ImportExecutor).onApplicationBootstrap();
    const after = await kit.waitFor(row.id);
    expect(after).toMatchObject({ status: 'failed', errorCode: 'INTERRUPTED' });
    expect(after.error).toMatch(/interrupted by a restart; upload again/);
    expect(await kit.rows(row.id)).toEqual({ pages: 0, links: 0, assets: 0 });
    expect((await kit.state()).latestReady).toMatchObject({ id: previous.id, pages: 1 });
  });

  it('imports the server folder of a doc set (admin only) through the same checks', async () => {
    const folder = join(t.config.sourceRoot!, 'guide');
    mkdirSync(join(folder, 'sub'), { recursive: true });
    writeFileSync(join(folder, 'index.md'), '# Home\n\n[Sub](sub/page.md)\n');
    writeFileSync(join(folder, 'sub', 'page.md'), '# Sub page\n\n[Back](../index.md)\n');
    const admin = await t.tokenFor('admin');
    const created = await t.http
      .post('/api/doc-sets')
      .set('Authorization', `Bearer ${admin}`)
      .send({ name: 'Folder', settings: { sourceFolder: 'guide' } });
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    const editorTry = await t.http
      .post(`/api/doc-sets/${created.body.id}/snapshots/from-source`)
      .set('Authorization', `Bearer ${await t.tokenFor('editor')}`);
    expect(editorTry.status).toBe(403);
    const response = await t.http.post(`/api/doc-sets/${created.body.id}/snapshots/from-source`).set('Authorization', `Bearer ${admin}`);
    expect(response.status, JSON.stringify(response.body)).toBe(202);
    const done = await (await importKit(t, created.body.id, 'admin')).waitFor(response.body.snapshot.id);
    expect(done).toMatchObject({ status: 'ready', pageCount: 2, linkCount: 2, source: 'folder' });
  });

  it('lists snapshots newest first with paging, and refuses writers', async () => {
    const kit = await importKit(t, await createDocSet(t, {}, 'Listing'));
    const a = await kit.importAndWait(await wellFormedZip({ 'index.md': '# A\n' }));
    const b = await kit.importAndWait(await wellFormedZip({ 'index.md': '# B\n' }));
    const page = await t.http
      .get(`/api/doc-sets/${kit.docSetId}/snapshots?page=1&pageSize=1`)
      .set('Authorization', `Bearer ${await t.tokenFor('viewer')}`);
    expect(page.body).toMatchObject({ total: 2, page: 1, pageSize: 1, items: [{ id: b.id }] });
    expect(a.archiveSha256).toMatch(/^[0-9a-f]{64}$/);
    const writer = await t.http
      .post(`/api/doc-sets/${kit.docSetId}/snapshots`)
      .set('Authorization', `Bearer ${await t.tokenFor('writer')}`)
      .attach('archive', Buffer.from('PK'), 'a.zip');
    expect(writer.status).toBe(403);
  });

  // Check 35 end to end: each hand-written convention fixture of the link core (shared/src/links/fixtures) is
  // zipped and imported (read from shared's build, as the backend reads the link core); stored pages, page-to-page edges and broken/ambiguous links equal its expectations.
  for (const fixture of linkFixtures) {
    it(`35: fixture "${fixture.name}": pages, edges and problems match the hand-written expectations`, async () => {
      const kit = await importKit(t, await createDocSet(t, fixture.settings, `Fixture ${fixture.name}`));
      const done = await kit.importAndWait(await wellFormedZip(fixture.files));
      expect(done.status, done.error).toBe('ready');
      expect(await kit.pagePaths(done.id)).toEqual([...fixture.expected.pages].sort());
      const graph = await linkGraphOf(t, done.id);
      expect(graph.edges.sort(byPair)).toEqual([...fixture.expected.edges].sort(byPair));
      const key = (p: { source: string; href: string; status: string }) => `${p.source} ${p.href} ${p.status}`;
      expect(graph.problems.map(key).sort()).toEqual(fixture.expected.problems.map(key).sort());
    });
  }

  it('seeds the demo doc set in the background: versions 1, 2 and 3 imported as three snapshots, in order', async () => {
    const demo = t.app.get(DemoDocSetSeeder);
    expect((t.app.get(FirstStartSeeder) as unknown as { contentSeeders: unknown[] }).contentSeeders).toContain(demo.contentSeeder);
    await demo.contentSeeder.seed();
    const admin = await t.tokenFor('admin');
    // The registered seeder only schedules the work: boot (and health) never wait for three imports.
    const readyAtOnce = async () => {
      const sets = (await t.http.get('/api/doc-sets').set('Authorization', `Bearer ${admin}`)).body.items.filter(
        (d: { name: string }) => d.name === DEMO_DOC_SET_NAME,
      );
      if (sets.length === 0) return 0;
      const list = (await t.http.get(`/api/doc-sets/${sets[0].id}/snapshots`).set('Authorization', `Bearer ${admin}`)).body.items;
      return list.filter((i: { status: string }) => i.status === 'ready').length;
    };
    expect(await readyAtOnce()).toBeLessThan(3);
    expect((await t.http.get('/api/health')).status).toBe(200);
    let docSet: { id: string } | undefined;
    let items: Array<{ status: string; label: string; pageCount: number }> = [];
    for (const until = Date.now() + 120_000; Date.now() < until; await new Promise((r) => setTimeout(r, 200))) {
      docSet = (await t.http.get('/api/doc-sets').set('Authorization', `Bearer ${admin}`)).body.items.find(
        (d: { name: string }) => d.name === DEMO_DOC_SET_NAME,
      );
      if (!docSet) continue;
      items = (await t.http.get(`/api/doc-sets/${docSet.id}/snapshots`).set('Authorization', `Bearer ${admin}`)).body.items;
      if (items.length === 3 && items.every((i) => i.status === 'ready' || i.status === 'failed')) break;
    }
    expect(items.map((i) => [i.label, i.status])).toEqual([
      ['Version 3', 'ready'],
      ['Version 2', 'ready'],
      ['Version 1', 'ready'],
    ]);
    const markdownFiles = (v: 1 | 2 | 3) => Object.keys(generateDemoHandbook(v).files).filter((f) => f.endsWith('.md')).length;
    expect(items.map((i) => i.pageCount)).toEqual([markdownFiles(3), markdownFiles(2), markdownFiles(1)]);
  });

  it('stores link flags exactly, quotes and backslashes included', async () => {
    const kit = await importKit(t, await createDocSet(t, {}, 'Flags'));
    const done = await kit.importAndWait(await wellFormedZip({ 'index.md': '# Home\n' }));
    const [page] = (
      (await t.app.get(DbService).db.execute(sql`SELECT id FROM pages WHERE snapshot_id = ${done.id}::uuid`)) as unknown as {
        rows: { id: string }[];
      }
    ).rows;
    const flags = ['plain', 'say "hi"', 'back\\slash', '{braces},comma'];
    await t.app.get(PageStoreRepository).insertLinks(done.id, [
      {
        source_page_id: Number(page.id),
        line: 1,
        column: 1,
        href: 'x',
        kind: 'inline',
        status: 'broken',
        target_page_id: null,
        target_path: null,
        target_is_asset: false,
        anchor: null,
        reason: null,
        flags,
      },
    ]);
    const stored = (await t.app
      .get(DbService)
      .db.execute(sql`SELECT flags FROM links WHERE snapshot_id = ${done.id}::uuid`)) as unknown as { rows: { flags: string[] }[] };
    expect(stored.rows[0].flags).toEqual(flags);
  });

  // Runs last in this file: it uses up the admin's hourly allowance. IMPORTS_PER_HOUR defaults to 20.
  it('26: the import past the hourly limit is refused with 429 (ASVS 5.0 2.4.1 anti-automation); other users are unaffected', async () => {
    const docSetId = await createDocSet(t, {}, 'Quota');
    const admin = await importKit(t, docSetId, 'admin');
    const db = t.app.get(DbService).db;
    const adminCount = async () => {
      const rows = (await db.execute(
        sql`SELECT count(*) AS n FROM snapshots s JOIN users u ON u.id = s.created_by WHERE u.role = 'admin'`,
      )) as unknown as { rows: { n: string }[] };
      return Number(rows.rows[0].n);
    };
    expect(t.config.importsPerHour).toBe(20);
    while ((await adminCount()) < t.config.importsPerHour) {
      expect((await admin.importAndWait(await wellFormedZip({ 'index.md': `# ${await adminCount()}\n` }))).status).toBe('ready');
    }
    const refused = await admin.upload(await wellFormedZip({ 'index.md': '# one too many\n' }));
    expect([refused.status, refused.body.code]).toEqual([429, 'IMPORT_QUOTA_EXCEEDED']);
    expect(await adminCount()).toBe(20);
    const editor = await importKit(t, docSetId, 'editor');
    expect((await editor.importAndWait(await wellFormedZip({ 'index.md': '# editor\n' }))).status).toBe('ready');
    expect((await editor.state()).uploadFiles).toEqual([]);
  });
});

async function pageTitles(t: TestApp, snapshotId: string): Promise<Record<string, string>> {
  const result = (await t.app
    .get(DbService)
    .db.execute(sql`SELECT path, title FROM pages WHERE snapshot_id = ${snapshotId}::uuid`)) as unknown as {
    rows: { path: string; title: string }[];
  };
  return Object.fromEntries(result.rows.map((r) => [r.path, r.title]));
}

/** Pages and links by path (ids differ between snapshots), in a stable order. */
async function contentOf(t: TestApp, snapshotId: string): Promise<unknown> {
  const db = t.app.get(DbService).db;
  const pages = (await db.execute(
    sql`SELECT path, title, content_hash, word_count, facts, raw_links, text FROM pages WHERE snapshot_id = ${snapshotId}::uuid ORDER BY path`,
  )) as unknown as { rows: unknown[] };
  const links = (await db.execute(sql`
    SELECT s.path AS source, l.line, l."column", l.href, l.kind, l.status, tp.path AS target, l.target_path, l.anchor, l.flags
    FROM links l JOIN pages s ON s.id = l.source_page_id LEFT JOIN pages tp ON tp.id = l.target_page_id
    WHERE l.snapshot_id = ${snapshotId}::uuid ORDER BY s.path, l.line, l."column"`)) as unknown as { rows: unknown[] };
  return { pages: pages.rows, links: links.rows };
}

function sqlInsertPage(snapshotId: string) {
  // A half-written import: one page row exists when the process stops.
  return sql`INSERT INTO pages (snapshot_id, path, title, content_hash, facts, raw_links) VALUES (${snapshotId}::uuid, 'x.md', 'X', 'h', '{}'::jsonb, '[]'::jsonb)`;
}

async function linkGraphOf(t: TestApp, snapshotId: string) {
  const db = t.app.get(DbService).db;
  const edges = (await db.execute(sql`
    SELECT DISTINCT s.path AS source, tp.path AS target FROM links l
    JOIN pages s ON s.id = l.source_page_id JOIN pages tp ON tp.id = l.target_page_id
    WHERE l.snapshot_id = ${snapshotId}::uuid AND l.status IN ('ok', 'redirected') AND tp.id <> s.id
      AND s.snapshot_id = ${snapshotId}::uuid AND tp.snapshot_id = ${snapshotId}::uuid`)) as unknown as {
    rows: { source: string; target: string }[];
  };
  const problems = (await db.execute(sql`
    SELECT s.path AS source, l.href, l.status FROM links l JOIN pages s ON s.id = l.source_page_id
    WHERE l.snapshot_id = ${snapshotId}::uuid AND l.status IN ('broken', 'broken-anchor', 'ambiguous')`)) as unknown as {
    rows: { source: string; href: string; status: string }[];
  };
  return { edges: edges.rows.map((e) => [e.source, e.target]), problems: problems.rows };
}

/** Code-point order on both sides (database collations and localeCompare differ on case). */
function byPair(a: string[], b: string[]): number {
  const x = `${a[0]}\u0000${a[1]}`;
  const y = `${b[0]}\u0000${b[1]}`;
  return x < y ? -1 : x > y ? 1 : 0;
}
