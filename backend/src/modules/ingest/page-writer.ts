/**
 * Collects the pages of one import (parsed now, or reused from the previous snapshot), writes them in short
 * batches as they arrive, and keeps what link resolution needs: ids, anchors, titles and raw links.
 * Writes are chained so that batches from two parser threads never overlap.
 */
import type { FrontMatter, Heading, PageTargetInfo, RawLink } from '@linkloom/shared/links';
import type { SnapshotWarning } from '../../db/schema/index.js';
import type { ParseOutcome } from './parse/parse-page.js';
import type { PageInsert, PageStoreRepository } from './storage/page-store.repository.js';

export interface ResolverPage {
  id: number;
  path: string;
  target: PageTargetInfo;
  rawLinks: RawLink[];
}

export interface PageWriterDeps {
  store: PageStoreRepository;
  snapshotId: string;
  previousSnapshotId: string | null;
  insertBytes: number;
  onProgress(done: number): Promise<void>;
}

type Stored = { path: string; facts: Record<string, unknown>; rawLinks: unknown[]; title: string };

export class PageWriter {
  readonly pages = new Map<string, ResolverPage>();
  readonly warnings: SnapshotWarning[] = [];
  reusedCount = 0;
  private chain: Promise<void> = Promise.resolve();
  private pending: PageInsert[] = [];
  private pendingBytes = 0;
  private pendingFacts = new Map<string, Stored>();

  constructor(private readonly deps: PageWriterDeps) {}

  addParsed(outcomes: ParseOutcome[], hashes: Map<string, string>): Promise<void> {
    return this.enqueue(async () => {
      for (const outcome of outcomes) {
        if (!outcome.ok) {
          this.warnings.push({ path: outcome.path, ...outcome.warning });
          continue;
        }
        const { facts, text, rawLinks, path } = outcome;
        const front = facts.frontMatter;
        const row: PageInsert = {
          path,
          title: facts.title,
          content_hash: hashes.get(path)!,
          word_count: facts.wordCount,
          owner_email: front.owner ?? null,
          reviewed_at: front.reviewed ?? null,
          facts: facts as unknown as Record<string, unknown>,
          raw_links: rawLinks,
          text,
        };
        this.pending.push(row);
        this.pendingFacts.set(path, { path, facts: row.facts, rawLinks, title: facts.title });
        this.pendingBytes += text.length * 2 + rawLinks.length * 120 + 512;
        if (this.pendingBytes >= this.deps.insertBytes) await this.flushParsed();
      }
    });
  }

  /** Unchanged pages: copied row by row inside the database, their facts read back for resolution. */
  addReused(paths: string[]): Promise<void> {
    return this.enqueue(async () => {
      const previous = this.deps.previousSnapshotId!;
      const ids = await this.deps.store.copyPages(this.deps.snapshotId, previous, paths);
      const facts = new Map((await this.deps.store.pageFacts(previous, paths)).map((f) => [f.path, f]));
      for (const { id, path } of ids) {
        const stored = facts.get(path)!;
        this.remember(id, { path, facts: stored.facts, rawLinks: stored.rawLinks, title: stored.title });
        for (const warning of (stored.facts.warnings as SnapshotWarning[] | undefined) ?? []) this.warnings.push({ ...warning, path });
      }
      this.reusedCount += ids.length;
      await this.deps.onProgress(this.pages.size);
    });
  }

  /** Writes whatever is still buffered and waits for every queued write. */
  finish(): Promise<void> {
    return this.enqueue(() => this.flushParsed());
  }

  private async flushParsed(): Promise<void> {
    if (this.pending.length === 0) return;
    const batch = this.pending;
    const facts = this.pendingFacts;
    this.pending = [];
    this.pendingFacts = new Map();
    this.pendingBytes = 0;
    for (const { id, path } of await this.deps.store.insertPages(this.deps.snapshotId, batch)) this.remember(id, facts.get(path)!);
    for (const row of batch) {
      for (const warning of (row.facts.warnings as SnapshotWarning[]) ?? []) this.warnings.push({ ...warning, path: row.path });
    }
    await this.deps.onProgress(this.pages.size);
  }

  private remember(id: number, stored: Stored): void {
    const facts = stored.facts as { headings?: Heading[]; anchors?: string[]; blockIds?: string[]; frontMatter?: FrontMatter };
    const front = facts.frontMatter;
    this.pages.set(stored.path, {
      id,
      path: stored.path,
      rawLinks: stored.rawLinks as RawLink[],
      target: {
        title: stored.title,
        aliases: front?.aliases ?? [],
        anchors: facts.anchors ?? [],
        headings: (facts.headings ?? []).map((h) => ({ text: h.text, slug: h.slug })),
        blockIds: facts.blockIds ?? [],
        redirectFrom: front?.redirectFrom ?? [],
      },
    });
  }

  private enqueue(work: () => Promise<void>): Promise<void> {
    const next = this.chain.then(work);
    // A failed write poisons the chain: later writes are skipped and the caller sees the first error.
    this.chain = next;
    return next;
  }
}
