/**
 * A small pool of parser threads (docs/threats.md, "Limits": 2 s per page, 512 MiB heap per parser). Batches of
 * pages go to idle workers; a watchdog reads each worker's shared progress cells and, when one page runs past
 * the limit, terminates that worker, flags the page PARSE_TIMEOUT, re-queues the rest of its batch and starts
 * a replacement. A worker that dies (heap limit) fails the whole pool with PARSE_RESOURCE.
 */
import { Worker } from 'node:worker_threads';
import type { PageBytes } from '../archive/index.js';
import { parsePageSafely, type ParseOptions, type ParseOutcome } from './parse-page.js';
import { type BatchRequest, type BatchResult, PROGRESS_BATCH, PROGRESS_CELLS, PROGRESS_PAGE, PROGRESS_STARTED } from './parse-protocol.js';
import { findWorkerSource, type WorkerSource } from './worker-source.js';

export interface ParsePoolOptions {
  size: number;
  pageTimeoutMs: number;
  heapMb: number;
}

export class ParsePoolError extends Error {
  constructor(
    readonly code: 'PARSE_RESOURCE',
    message: string,
  ) {
    super(message);
  }
}

export interface PageParser {
  readonly workers: number;
  /** True once a thread died or the pool was closed: make a new one. */
  readonly failed: boolean;
  parse(pages: PageBytes[], options: ParseOptions): Promise<ParseOutcome[]>;
  close(): Promise<void>;
}

interface Job {
  id: number;
  pages: PageBytes[];
  options: ParseOptions;
  resolve(outcomes: ParseOutcome[]): void;
  reject(error: Error): void;
}

interface Slot {
  worker: Worker;
  progress: Int32Array;
  job: Job | null;
}

export function createPageParser(options: ParsePoolOptions, source: WorkerSource = findWorkerSource()): PageParser {
  return source.kind === 'in-process' ? new InProcessParser() : new ParsePool(options, source);
}

class ParsePool implements PageParser {
  private readonly slots: Slot[] = [];
  private readonly queue: Job[] = [];
  private readonly clockBase = Date.now();
  private readonly watchdog: NodeJS.Timeout;
  private nextId = 1;
  private failure: Error | null = null;
  private closed = false;

  constructor(
    private readonly options: ParsePoolOptions,
    private readonly source: Exclude<WorkerSource, { kind: 'in-process' }>,
  ) {
    for (let i = 0; i < options.size; i += 1) this.slots.push(this.spawn());
    this.watchdog = setInterval(() => this.checkTimeouts(), Math.min(250, options.pageTimeoutMs / 4));
    this.watchdog.unref();
  }

  get workers(): number {
    return this.options.size;
  }

  get failed(): boolean {
    return this.failure !== null;
  }

  parse(pages: PageBytes[], options: ParseOptions): Promise<ParseOutcome[]> {
    if (this.failure) return Promise.reject(this.failure);
    return new Promise((resolve, reject) => {
      this.queue.push({ id: this.nextId++, pages, options, resolve, reject });
      this.dispatch();
    });
  }

  async close(): Promise<void> {
    this.closed = true;
    clearInterval(this.watchdog);
    await Promise.all(this.slots.map((slot) => slot.worker.terminate()));
    this.fail(new ParsePoolError('PARSE_RESOURCE', 'The parser was closed.'));
  }

  private spawn(): Slot {
    const progressBuffer = new SharedArrayBuffer(PROGRESS_CELLS * 4);
    const init = {
      workerData: { progressBuffer, clockBase: this.clockBase },
      resourceLimits: { maxOldGenerationSizeMb: this.options.heapMb },
    };
    const worker = this.source.kind === 'file' ? new Worker(this.source.url, init) : new Worker(this.source.code, { ...init, eval: true });
    const slot: Slot = { worker, progress: new Int32Array(progressBuffer), job: null };
    worker.on('message', (result: BatchResult) => this.finish(slot, result));
    worker.on('error', (error) => this.fail(new ParsePoolError('PARSE_RESOURCE', `A parser thread stopped: ${error.message}`)));
    worker.on('exit', () => {
      if (!this.closed && this.slots.includes(slot))
        this.fail(new ParsePoolError('PARSE_RESOURCE', 'A parser thread exited unexpectedly.'));
    });
    return slot;
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (slot.job || this.queue.length === 0 || this.failure) continue;
      const job = this.queue.shift()!;
      slot.job = job;
      Atomics.store(slot.progress, PROGRESS_BATCH, 0);
      const request = pack(job);
      slot.worker.postMessage(request, [request.buffer]);
    }
  }

  private finish(slot: Slot, result: BatchResult): void {
    const job = slot.job;
    if (!job || job.id !== result.id) return;
    slot.job = null;
    job.resolve(result.outcomes);
    this.dispatch();
  }

  private checkTimeouts(): void {
    const now = Date.now() - this.clockBase;
    for (const slot of [...this.slots]) {
      const job = slot.job;
      if (!job || Atomics.load(slot.progress, PROGRESS_BATCH) !== job.id) continue;
      if (now - Atomics.load(slot.progress, PROGRESS_STARTED) <= this.options.pageTimeoutMs) continue;
      this.replaceStuck(slot, job, Atomics.load(slot.progress, PROGRESS_PAGE));
    }
  }

  /** Earlier pages of the batch are parsed again by the new worker; only the stuck page is given up. */
  private replaceStuck(slot: Slot, job: Job, stuckIndex: number): void {
    this.slots.splice(this.slots.indexOf(slot), 1);
    slot.job = null;
    void slot.worker.terminate();
    this.slots.push(this.spawn());
    const stuck = job.pages[stuckIndex];
    const rest = job.pages.filter((_, i) => i !== stuckIndex);
    const timedOut: ParseOutcome = {
      path: stuck.path,
      ok: false,
      warning: { code: 'PARSE_TIMEOUT', message: `Parsing took longer than ${this.options.pageTimeoutMs / 1000} s; the page was skipped.` },
    };
    if (rest.length === 0) job.resolve([timedOut]);
    else {
      this.queue.unshift({
        id: this.nextId++,
        pages: rest,
        options: job.options,
        resolve: (outcomes) => job.resolve([...outcomes.slice(0, stuckIndex), timedOut, ...outcomes.slice(stuckIndex)]),
        reject: job.reject,
      });
    }
    this.dispatch();
  }

  private fail(error: Error): void {
    if (this.failure) return;
    this.failure = error;
    for (const slot of this.slots) slot.job?.reject(error);
    for (const job of this.queue.splice(0)) job.reject(error);
  }
}

/** One buffer per batch, transferred (not copied) to the worker. */
function pack(job: Job): BatchRequest {
  const total = job.pages.reduce((sum, page) => sum + page.bytes.length, 0);
  const buffer = new ArrayBuffer(total);
  const view = new Uint8Array(buffer);
  const ends: number[] = [];
  let offset = 0;
  for (const page of job.pages) {
    view.set(page.bytes, offset);
    offset += page.bytes.length;
    ends.push(offset);
  }
  return { id: job.id, paths: job.pages.map((page) => page.path), ends, buffer, options: job.options };
}

/** Fallback when no worker code can be found: same results, but no per-page time limit. */
class InProcessParser implements PageParser {
  readonly workers = 1;
  readonly failed = false;

  async parse(pages: PageBytes[], options: ParseOptions): Promise<ParseOutcome[]> {
    const outcomes: ParseOutcome[] = [];
    for (const page of pages) {
      outcomes.push(parsePageSafely(page.path, page.bytes, options));
      await new Promise((resolve) => setImmediate(resolve));
    }
    return outcomes;
  }

  async close(): Promise<void> {}
}
