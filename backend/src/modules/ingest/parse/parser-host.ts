/**
 * Keeps one parse pool for the whole app: starting a thread loads the Markdown toolchain (over a second on
 * this machine), too slow to pay per import. The pool is made on first use, replaced when it has failed,
 * closed after a minute without imports, and always closed before the app shuts down.
 */
import { Inject, Injectable, type OnApplicationShutdown } from '@nestjs/common';
import { INGEST_LIMITS, type IngestLimits } from '../ingest-limits.js';
import { createPageParser, type PageParser } from './parse-pool.js';

const IDLE_CLOSE_MS = 60_000;

@Injectable()
export class ParserHost implements OnApplicationShutdown {
  private pool: PageParser | null = null;
  private users = 0;
  private idleTimer: NodeJS.Timeout | null = null;

  constructor(@Inject(INGEST_LIMITS) private readonly limits: IngestLimits) {}

  acquire(): PageParser {
    if (this.idleTimer) clearTimeout(this.idleTimer);
    this.idleTimer = null;
    if (!this.pool || this.pool.failed) {
      void this.pool?.close();
      const { parserThreads: size, pageTimeoutMs, parserHeapMb: heapMb } = this.limits;
      this.pool = createPageParser({ size, pageTimeoutMs, heapMb });
    }
    this.users += 1;
    return this.pool;
  }

  release(): void {
    this.users -= 1;
    if (this.users > 0) return;
    this.idleTimer = setTimeout(() => void this.close(), IDLE_CLOSE_MS);
    this.idleTimer.unref();
  }

  /** After the lifecycle service has let running imports finish (beforeApplicationShutdown). */
  async onApplicationShutdown(): Promise<void> {
    await this.close();
  }

  private async close(): Promise<void> {
    if (this.idleTimer) clearTimeout(this.idleTimer);
    this.idleTimer = null;
    const pool = this.pool;
    this.pool = null;
    await pool?.close();
  }
}
