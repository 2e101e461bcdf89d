import { Global, Injectable, Logger, Module } from '@nestjs/common';

/** What happened, for modules that react without depending on each other (e.g. a finished import starts a run). */
export interface DomainEventMap {
  'snapshot.ready': { docSetId: string; snapshotId: string; trigger: 'import' | 'nightly'; actorId: string | null };
  'snapshot.failed': { docSetId: string; snapshotId: string; code: string; message: string };
  'run.finished': { docSetId: string; runId: string; trigger: 'import' | 'manual' | 'nightly' };
  'run.failed': { docSetId: string; runId: string; message: string };
}
export type DomainEventName = keyof DomainEventMap;
type Listener<K extends DomainEventName> = (payload: DomainEventMap[K]) => Promise<void> | void;

@Injectable()
export class DomainEvents {
  private readonly logger = new Logger('Events');
  private readonly listeners = new Map<DomainEventName, Listener<never>[]>();

  on<K extends DomainEventName>(name: K, listener: Listener<K>): void {
    this.listeners.set(name, [...(this.listeners.get(name) ?? []), listener as Listener<never>]);
  }

  /** Runs every listener; one listener's failure is logged and does not stop the others. */
  async emit<K extends DomainEventName>(name: K, payload: DomainEventMap[K]): Promise<void> {
    for (const listener of this.listeners.get(name) ?? []) {
      try {
        await (listener as Listener<K>)(payload);
      } catch (error) {
        this.logger.error(`A listener of ${name} failed: ${(error as Error)?.stack ?? String(error)}`);
      }
    }
  }
}

@Global()
@Module({ providers: [DomainEvents], exports: [DomainEvents] })
export class DomainEventsModule {}
