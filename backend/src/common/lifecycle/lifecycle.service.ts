import { type BeforeApplicationShutdown, Injectable, Logger, type OnModuleDestroy } from '@nestjs/common';

/**
 * Shutdown order matters with an embedded database (closing it under a running statement can wedge the
 * process): refuse new requests, wait for background work, and only then let the database close.
 */
@Injectable()
export class LifecycleService implements OnModuleDestroy, BeforeApplicationShutdown {
  private readonly logger = new Logger('Lifecycle');
  private readonly running = new Set<Promise<unknown>>();
  draining = false;

  /** Keeps a background job (import, run, mail delivery) alive through shutdown until it settles. */
  track<T>(work: Promise<T>): Promise<T> {
    this.running.add(work);
    void work.then(
      () => this.running.delete(work),
      () => this.running.delete(work),
    );
    return work;
  }

  get busy(): number {
    return this.running.size;
  }

  onModuleDestroy(): void {
    this.draining = true;
  }

  async beforeApplicationShutdown(): Promise<void> {
    if (this.running.size === 0) return;
    this.logger.log(`Waiting for ${this.running.size} background job(s) to finish before closing the database`);
    const timeout = new Promise((resolve) => setTimeout(resolve, 8_000).unref());
    await Promise.race([Promise.allSettled([...this.running]), timeout]);
  }
}
