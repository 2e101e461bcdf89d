/**
 * Pass 2 of an import (docs/threats.md, "Import pipeline" steps 5-7): stream the pages, hash each, reuse unchanged pages of
 * the previous ready snapshot, parse the rest in the thread pool, write pages as batches complete, resolve
 * every link against the new file list, then flip the snapshot to `ready` in one small transaction.
 */
import { createHash } from 'node:crypto';
import { isDeepStrictEqual } from 'node:util';
import type { DocSetSettings } from '@linkloom/shared';
import type { ArchivePlan, PageBytes } from './archive/index.js';
import { importTimedOut } from './import-failure.js';
import type { IngestLimits } from './ingest-limits.js';
import { resolveAndWriteLinks } from './link-writer.js';
import { PageWriter } from './page-writer.js';
import type { PageParser } from './parse/parse-pool.js';
import type { PageStoreRepository } from './storage/page-store.repository.js';
import type { ReadyCounts, SnapshotsRepository } from './storage/snapshots.repository.js';

export interface ImportInput {
  snapshotId: string;
  previousSnapshotId: string | null;
  settings: DocSetSettings;
  plan: ArchivePlan;
  readPages(): AsyncIterable<PageBytes>;
}

export interface ImportDeps {
  snapshots: SnapshotsRepository;
  store: PageStoreRepository;
  limits: IngestLimits;
  parsers: { acquire(): PageParser; release(): void };
}

export async function runImport(input: ImportInput, deps: ImportDeps): Promise<ReadyCounts & { workers: number }> {
  const started = performance.now();
  const checkDeadline = () => {
    if (performance.now() - started > deps.limits.importTimeoutMs) throw importTimedOut(deps.limits.importTimeoutMs / 1000);
  };
  const pageTotal = input.plan.entries.filter((entry) => entry.kind === 'page').length;
  await deps.snapshots.markImporting(input.snapshotId, pageTotal);
  const writer = new PageWriter({
    store: deps.store,
    snapshotId: input.snapshotId,
    previousSnapshotId: input.previousSnapshotId,
    insertBytes: deps.limits.pageInsertBytes,
    onProgress: (done) => deps.snapshots.progress(input.snapshotId, done),
  });
  const workers = await readAndParse(input, deps, writer, checkDeadline);
  checkDeadline();
  const assets = input.plan.entries.filter((entry) => entry.kind === 'asset');
  for (let i = 0; i < assets.length; i += deps.limits.linkInsertRows) {
    await deps.store.insertAssets(
      input.snapshotId,
      assets.slice(i, i + deps.limits.linkInsertRows).map((a) => ({ path: a.path, bytes: a.size })),
    );
  }
  const linkCount = await resolveAndWriteLinks(
    writer.pages,
    assets.map((a) => a.path),
    {
      store: deps.store,
      snapshotId: input.snapshotId,
      settings: input.settings,
      batchRows: deps.limits.linkInsertRows,
      checkDeadline,
    },
  );
  checkDeadline();
  const counts: ReadyCounts = {
    pageCount: writer.pages.size,
    linkCount,
    assetCount: assets.length,
    reusedPageCount: writer.reusedCount,
    warnings: capWarnings(writer, deps.limits.maxStoredWarnings),
    importMs: Math.round(performance.now() - started),
  };
  await deps.snapshots.markReady(input.snapshotId, counts);
  return { ...counts, workers };
}

/** Returns how many parser threads ran (0 when every page was reused). */
async function readAndParse(input: ImportInput, deps: ImportDeps, writer: PageWriter, checkDeadline: () => void): Promise<number> {
  const { limits } = deps;
  const reusable = input.previousSnapshotId ? await deps.store.pageHashes(input.previousSnapshotId) : new Map();
  const options = { wikiLinks: input.settings.wikiLinks, pageExtensions: input.settings.extensions };
  // Back-pressure: a few batches per thread in flight, so memory holds a window, not the archive.
  const window = new InflightWindow(limits.parserThreads * 3);
  const hashes = new Map<string, string>();
  let parser: PageParser | null = null;
  let batch: PageBytes[] = [];
  let reused: string[] = [];
  const sendBatch = async () => {
    parser ??= deps.parsers.acquire();
    const pages = batch.splice(0);
    await window.add(parser.parse(pages, options).then((outcomes) => writer.addParsed(outcomes, hashes)));
  };
  try {
    for await (const page of input.readPages()) {
      window.throwIfFailed();
      checkDeadline();
      const hash = createHash('sha256').update(page.bytes).digest('hex');
      const before = reusable.get(page.path);
      if (before && before.hash === hash && isDeepStrictEqual(before.parseOptions, options)) {
        reused.push(page.path);
        if (reused.length >= 500) await window.add(writer.addReused(reused.splice(0)));
        continue;
      }
      hashes.set(page.path, hash);
      batch.push(page);
      if (batch.length >= limits.parseBatchPages || batchBytes(batch) >= limits.parseBatchBytes) await sendBatch();
    }
    if (batch.length > 0) await sendBatch();
    if (reused.length > 0) await window.add(writer.addReused(reused));
    await window.drain();
    window.throwIfFailed();
    await writer.finish();
    return parser ? (parser as PageParser).workers : 0;
  } finally {
    await window.drain();
    if (parser) deps.parsers.release();
  }
}

function batchBytes(pages: PageBytes[]): number {
  let total = 0;
  for (const page of pages) total += page.bytes.length;
  return total;
}

/** Work in flight with a bound on how much; the first failure is kept and rethrown by the reader loop. */
class InflightWindow {
  private readonly inflight: Promise<void>[] = [];
  private failure: unknown = null;

  constructor(private readonly max: number) {}

  async add(work: Promise<void>): Promise<void> {
    this.inflight.push(work.catch((error) => void (this.failure ??= error)));
    while (this.inflight.length > this.max) await this.inflight.shift();
  }

  async drain(): Promise<void> {
    await Promise.all(this.inflight.splice(0));
  }

  throwIfFailed(): void {
    if (this.failure) throw this.failure;
  }
}

function capWarnings(writer: PageWriter, max: number): ReadyCounts['warnings'] {
  const all = writer.warnings;
  if (all.length <= max) return all;
  const kept = all.slice(0, max);
  kept.push({ path: '', code: 'MORE_WARNINGS', message: `${all.length - max} more warnings are not listed.` });
  return kept;
}
