import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { HANDBOOK_LINKS, HANDBOOK_PAGES } from '../runs/testing/findings-fixture.js';
import { createDocSet, read, snapshotOf, startRun, waitForRun } from '../runs/testing/run-test-kit.js';

describe('the link map', () => {
  let t: TestApp;
  let docSetId: string;
  beforeAll(async () => {
    t = await createTestApp();
    docSetId = await createDocSet(t, 'Map', { entryPages: ['index.md'] });
    await snapshotOf(t, docSetId, HANDBOOK_PAGES, HANDBOOK_LINKS);
    const run = await waitForRun(t, docSetId, await startRun(t, docSetId));
    expect(run.status).toBe('finished');
  });
  afterAll(async () => t?.close());

  it('draws the pages themselves while they fit, with one weighted edge per linked pair', async () => {
    const response = await read(t, `/api/doc-sets/${docSetId}/runs/latest/graph`);
    expect(response.status).toBe(200);
    expect(response.body.level).toBe('pages');
    expect(response.body.nodes).toHaveLength(HANDBOOK_PAGES.length);
    const edge = (s: string, d: string) =>
      response.body.edges.find((e: { source: string; target: string }) => e.source === s && e.target === d);
    // install.md links to advanced.md twice (once directly, once through a redirect): one edge of weight 2.
    expect(edge('tools/install.md', 'tools/advanced.md')?.weight).toBe(2);
    expect(edge('swap/left.md', 'swap/right.md')?.weight).toBe(1);
    // broken, unsafe and external links draw nothing
    expect(response.body.edges.every((e: { target: string }) => HANDBOOK_PAGES.some((p) => p.path === e.target))).toBe(true);
    const orphan = response.body.nodes.find((n: { path: string }) => n.path === 'spoke-log.md');
    expect(orphan.flags).toEqual(expect.arrayContaining(['orphan', 'unreachable']));
  });

  it('groups by folder when the pages do not fit, summing link counts between folders, and drills down', async () => {
    const folders = await read(t, `/api/doc-sets/${docSetId}/runs/latest/graph?limit=10&folderDepth=1`);
    expect(folders.status).toBe(200);
    expect(folders.body.level).toBe('pages'); // 9 pages fit in 10
    const grouped = await read(t, `/api/doc-sets/${docSetId}/runs/latest/graph?limit=10&folderDepth=1&folder=`);
    expect(grouped.body.totalPages).toBe(9);
    const tight = await t.app
      .get((await import('./link-map.service.js')).LinkMapService)
      .graph({ id: 'x', email: 'x', name: 'x', role: 'viewer' }, docSetId, 'latest', { folder: '', folderDepth: 1, limit: 5 });
    expect(tight.level).toBe('folders');
    if (tight.level !== 'folders') return;
    const ids = tight.nodes.map((n) => n.id).sort();
    expect(ids).toEqual(['(pages here)', 'notes/', 'swap/', 'tools/']);
    const tools = tight.nodes.find((n) => n.id === 'tools/')!;
    expect(tools.pageCount).toBe(4);
    // index.md -> tools/setup.md is the only link from the root pages into tools/
    expect(tight.edges.find((e) => e.source === '(pages here)' && e.target === 'tools/')?.weight).toBe(1);
    // swap/left <-> swap/right stay inside one folder and draw no folder edge
    expect(tight.edges.some((e) => e.source === 'swap/' && e.target === 'swap/')).toBe(false);
    const drill = await read(t, `/api/doc-sets/${docSetId}/runs/latest/graph?folder=tools`);
    expect(drill.body.level).toBe('pages');
    expect(drill.body.nodes.map((n: { path: string }) => n.path).sort()).toEqual([
      'tools/advanced.md',
      'tools/deep/hubs.md',
      'tools/install.md',
      'tools/setup.md',
    ]);
  });

  it('rejects bad parameters', async () => {
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/latest/graph?limit=5000`)).status).toBe(400);
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/not-a-run/graph`)).status).toBe(400);
  });
});
