/**
 * Run benchmark: `node backend/dist/bench/run.bench.js [--pages 10000] [--links 300000] [--listPages 100000]
 *   [--listLinks 5] [--seconds 30] [--clients 16]`
 * 1. A whole run (load from the database, compute in the worker thread, store metrics, mark finished) over
 *    a synthetic snapshot written straight into a fresh PGlite data folder. Target < 10 s. The suggestion
 *    precompute that follows a finished run is timed apart (phasesMs.suggestions).
 * 2. The page-list API under load: a run of a 100,000-page snapshot, then `clients` concurrent loopback
 *    clients for `seconds` sending sorted and filtered page-list requests. Target p95 < 100 ms.
 * Each measurement prints one `BENCH {json}` line.
 */
import 'reflect-metadata';
import type { INestApplication } from '@nestjs/common';
import { mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { monitorEventLoopDelay } from 'node:perf_hooks';
import { parseArgs } from 'node:util';
import { sql } from 'drizzle-orm';
import { loadConfig } from '../config/app-config.js';
import { createApp } from '../create-app.js';
import { DbService } from '../db/db.service.js';
import { DocSetsService } from '../modules/doc-sets/doc-sets.service.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../modules/demo/demo-accounts.js';
import { RunExecutor } from '../modules/runs/run-executor.service.js';
import { RunsRepository } from '../modules/runs/runs.repository.js';
import { RunsService } from '../modules/runs/runs.service.js';
import { queryRows } from '../modules/runs/sql-values.js';
import { writeSnapshot } from '../modules/runs/testing/snapshot-writer.js';
import { syntheticLinkGraph } from '../modules/runs/testing/synthetic-link-graph.js';

const { values: args } = parseArgs({
  options: {
    pages: { type: 'string', default: '10000' },
    skipSmall: { type: 'boolean', default: false },
    links: { type: 'string', default: '300000' },
    listPages: { type: 'string', default: '100000' },
    listLinks: { type: 'string', default: '5' },
    seconds: { type: 'string', default: '30' },
    clients: { type: 'string', default: '16' },
  },
});
const MIX_KINDS = 8;
const ADMIN = { id: null as unknown as string, email: 'bench', name: 'bench', role: 'admin' as const };

const work = await mkdtemp(join(tmpdir(), 'linkloom-run-bench-'));
try {
  const app = await createApp(
    loadConfig({ DEMO: 'true', DEMO_CONTENT: 'false', LOG_REQUESTS: 'false' }, { dataDir: join(work, 'data'), host: '127.0.0.1', port: 0 }),
    { logger: false },
  );
  try {
    const pages = Number(args.pages);
    if (!args.skipSmall) await benchWholeRun(app, 'run-10k', pages, Math.round(Number(args.links) / pages));
    const listRunId = await benchWholeRun(app, 'run-100k', Number(args.listPages), Number(args.listLinks));
    await benchPageList(app, listRunId.docSetId, Number(args.clients), Number(args.seconds) * 1000);
  } finally {
    await app.close();
  }
} finally {
  await rm(work, { recursive: true, force: true });
}

async function benchWholeRun(app: INestApplication, label: string, pageCount: number, linksPerPage: number) {
  const graph = syntheticLinkGraph(pageCount, linksPerPage);
  const docSet = await app.get(DocSetsService).create(ADMIN, { name: label, description: '', settings: {} });
  const writeStarted = performance.now();
  await writeSnapshot(app.get(DbService).db, docSet.id, graph.pages, graph.links);
  const writeMs = performance.now() - writeStarted;
  const started = performance.now();
  const run = await app.get(RunsService).startRun(docSet.id, 'manual');
  const finished = await waitUntilDone(app, run.id);
  const wallMs = performance.now() - started;
  await app.get(RunsService).whenIdle(docSet.id);
  const phases = app.get(RunExecutor).lastPhases;
  const [{ n }] = await queryRows<{ n: unknown }>(
    app.get(DbService).db,
    sql`select count(distinct target_page_id) as n from link_suggestions where run_id = ${run.id}`,
  );
  const result = {
    label,
    pages: pageCount,
    links: graph.links.length,
    status: finished.status,
    runDurationMs: finished.durationMs,
    wallMs: Math.round(wallMs),
    pagesWithSuggestions: Number(n),
    needyPagesAsked: Math.min(
      200,
      (finished.counts?.orphans ?? 0) + (finished.counts?.unreachable ?? 0) + (finished.counts?.deepPages ?? 0),
    ),
    phasesMs: Object.fromEntries(Object.entries(phases).map(([k, v]) => [k, Math.round(v)])),
    iterations: finished.iterations,
    snapshotWriteMs: Math.round(writeMs),
    rssMb: Math.round(process.memoryUsage().rss / 2 ** 20),
    targetMs: label === 'run-10k' ? 10_000 : undefined,
  };
  console.log(`BENCH ${JSON.stringify(result)}`);
  return { docSetId: docSet.id, runId: run.id };
}

async function waitUntilDone(app: INestApplication, runId: string) {
  for (;;) {
    const row = await app.get(RunsRepository).findById(runId);
    if (row && (row.status === 'finished' || row.status === 'failed')) return row;
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
}

/** Sorted and filtered page-list requests a person would make, spread over the list. */
function requestMix(docSetId: string, k: number): string {
  const base = `/api/doc-sets/${docSetId}/runs/latest/pages?pageSize=50`;
  const page = 1 + (k % 200);
  const mix = [
    `&sort=-stationaryScore&page=${page}`,
    `&sort=-inboundCount&page=${page}`,
    `&sort=path&page=${page}`,
    `&flags=orphan&sort=-stationaryScore`,
    `&flags=dead-end,deep&sort=-outboundCount&page=${1 + (k % 5)}`,
    `&q=section-${k % 1000}/&sort=-stationaryScore`,
    `&minDepth=3&sort=depth&page=${1 + (k % 20)}`,
    `&sort=-stationaryScore&minScore=0.00001&page=${1 + (k % 10)}`,
  ];
  return base + mix[k % mix.length];
}

async function benchPageList(app: INestApplication, docSetId: string, clients: number, durationMs: number) {
  await app.listen(0, '127.0.0.1');
  const url = await app.getUrl();
  const account = DEMO_ACCOUNTS.find((a) => a.role === 'viewer')!;
  const signIn = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: account.email, password: DEMO_PASSWORD }),
  });
  const { accessToken } = (await signIn.json()) as { accessToken: string };
  const headers = { authorization: `Bearer ${accessToken}` };
  const latencies: number[] = [];
  const byKind = new Map<number, number[]>();
  let errors = 0;
  let counter = 0;
  const loopDelay = monitorEventLoopDelay({ resolution: 10 });
  loopDelay.enable();
  const deadline = performance.now() + durationMs;
  await Promise.all(
    Array.from({ length: clients }, async () => {
      while (performance.now() < deadline) {
        const started = performance.now();
        const k = counter++;
        const response = await fetch(url + requestMix(docSetId, k), { headers });
        await response.arrayBuffer();
        latencies.push(performance.now() - started);
        byKind.set(k % MIX_KINDS, [...(byKind.get(k % MIX_KINDS) ?? []), performance.now() - started]);
        if (response.status !== 200) errors++;
      }
    }),
  );
  loopDelay.disable();
  const at = (q: number, values = latencies) => {
    const sorted = [...values].sort((a, b) => a - b);
    return Math.round(sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))] * 10) / 10;
  };
  const result = {
    label: 'page-list-100k',
    clients,
    seconds: durationMs / 1000,
    requests: latencies.length,
    errors,
    requestsPerSecond: Math.round(latencies.length / (durationMs / 1000)),
    p50Ms: at(0.5),
    p95Ms: at(0.95),
    p99Ms: at(0.99),
    maxMs: at(1),
    eventLoopP99Ms: Math.round(loopDelay.percentile(99) / 1e5) / 10,
    targetP95Ms: 100,
    p95MsByRequest: Object.fromEntries(
      [...byKind]
        .sort((a, b) => a[0] - b[0])
        .map(([kind, values]) => [
          requestMix('…', kind)
            .split('pageSize=50&')[1]
            .replace(/&page=\d+/, ''),
          at(0.95, values),
        ]),
    ),
  };
  console.log(`BENCH ${JSON.stringify(result)}`);
}
