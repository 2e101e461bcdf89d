import 'reflect-metadata';
import { buildLinkGraph, computeStationaryScore } from '@linkloom/shared/graph';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import { HANDBOOK_LINKS, HANDBOOK_LINKS_V2, HANDBOOK_PAGES, HANDBOOK_PAGES_V2 } from './testing/findings-fixture.js';
import { createDocSet, read, snapshotOf, startRun, waitForRun } from './testing/run-test-kit.js';

describe('run comparison and ranked search', () => {
  let t: TestApp;
  let docSetId: string;
  let first: Record<string, any>;
  let second: Record<string, any>;

  beforeAll(async () => {
    t = await createTestApp();
    docSetId = await createDocSet(t, 'Workshop');
    await snapshotOf(t, docSetId, HANDBOOK_PAGES, HANDBOOK_LINKS);
    first = await waitForRun(t, docSetId, await startRun(t, docSetId));
    await snapshotOf(t, docSetId, HANDBOOK_PAGES_V2, HANDBOOK_LINKS_V2);
    second = await waitForRun(t, docSetId, await startRun(t, docSetId));
  });
  afterAll(async () => t?.close());

  it('says what appeared and disappeared between two runs of two snapshots', async () => {
    expect(second.snapshotId).not.toBe(first.snapshotId);
    const diff = (await read(t, `/api/doc-sets/${docSetId}/runs/latest/diff?against=${first.id}`)).body;
    expect(diff.runId).toBe(second.id);
    expect(diff.kinds.brokenLinks.appeared).toEqual({ total: 1, items: [{ sourcePath: 'tools/deep/hubs.md', href: 'bearings.md' }] });
    expect(diff.kinds.brokenLinks.disappeared).toEqual({ total: 1, items: [{ sourcePath: 'index.md', href: 'missing.md' }] });
    expect(diff.kinds.orphans).toEqual({
      appeared: { total: 0, items: [] },
      disappeared: { total: 1, items: [{ path: 'spoke-log.md', title: 'Spoke tension log' }] },
    });
    expect(diff.kinds.unreachable.disappeared.items.map((i: { path: string }) => i.path)).toEqual(['spoke-log.md']);
    expect(diff.kinds.deadEnds).toEqual({ appeared: { total: 0, items: [] }, disappeared: { total: 0, items: [] } });
    const moves = diff.scoreMoves as { path: string; before: number; after: number; change: number }[];
    expect(moves[0].path).toBe('spoke-log.md');
    expect(moves[0].change).toBeGreaterThan(0);
    for (const move of moves) expect(move.change).toBeCloseTo(move.after - move.before, 15);
    for (let i = 1; i < moves.length; i++) expect(Math.abs(moves[i - 1].change)).toBeGreaterThanOrEqual(Math.abs(moves[i].change));
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/latest/diff?against=yesterday`)).status).toBe(400);
  });

  it('ranks full-text matches by the documented blend of text rank and link score', async () => {
    const body = (await read(t, `/api/doc-sets/${docSetId}/runs/${first.id}/search?q=wheel&mode=blend`)).body;
    expect(body.explanation).toMatch(/textRank \/ best textRank\)\^1 x timesAverage\^0\.25/);
    expect(body.items.map((i: { path: string }) => i.path).sort()).toEqual([
      'spoke-log.md',
      'tools/advanced.md',
      'tools/install.md',
      'tools/setup.md',
    ]);
    const best = Math.max(...body.items.map((i: { textRank: number }) => i.textRank));
    const pages = (await read(t, `/api/doc-sets/${docSetId}/runs/${first.id}/pages?pageSize=50`)).body.items as {
      path: string;
      timesAverage: number;
    }[];
    for (const item of body.items) {
      const timesAverage = pages.find((p) => p.path === item.path)!.timesAverage;
      expect(item.score).toBeCloseTo((item.textRank / best) * timesAverage ** 0.25, 12);
      expect(item.snippet).toMatch(/«wheel/i);
      expect(item.why).toMatch(/text match/);
    }
    for (let i = 1; i < body.items.length; i++) expect(body.items[i - 1].score).toBeGreaterThanOrEqual(body.items[i].score);
  });

  it('ranks by the stationary score of the subgraph of matching pages, as the engine computes it', async () => {
    const body = (await read(t, `/api/doc-sets/${docSetId}/runs/${first.id}/search?q=wheel&mode=subgraph`)).body;
    const matched = body.items.map((i: { path: string }) => i.path) as string[];
    // The pure engine on the links among the matched pages only (same damping 0.85, uniform teleport).
    const inside = HANDBOOK_LINKS.filter(
      (l) => l.to && ['ok', 'redirected'].includes(l.status ?? 'ok') && matched.includes(l.from) && matched.includes(l.to),
    );
    const { graph } = buildLinkGraph(
      matched,
      inside.map((l) => [l.from, l.to!] as const),
    );
    const { scores } = computeStationaryScore(graph, { damping: 0.85 });
    body.items.forEach((item: { score: number }, i: number) => expect(item.score).toBeCloseTo(scores[i], 12));
    expect(matched[0]).toBe('tools/advanced.md');
    expect(body.explanation).toMatch(/matching pages only/);
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/${first.id}/search?q=`)).status).toBe(400);
    expect((await read(t, `/api/doc-sets/${docSetId}/runs/${first.id}/search?q=wheel&mode=magic`)).status).toBe(400);
  });
});
