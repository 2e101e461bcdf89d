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
  private readonly listeners = new Map<DomainEventName, { listener: Listener<never>; last: boolean }[]>();

  /**
   * `last: true` runs the listener after every other one, for work that must see their effects (the nightly
   * job sends its digest only once tasks have been verified by the finished run).
   */
  on<K extends DomainEventName>(name: K, listener: Listener<K>, options: { last?: boolean } = {}): void {
    const entry = { listener: listener as Listener<never>, last: options.last ?? false };
    this.listeners.set(name, [...(this.listeners.get(name) ?? []), entry]);
  }

  /** Runs every listener; one listener's failure is logged and does not stop the others. */
  async emit<K extends DomainEventName>(name: K, payload: DomainEventMap[K]): Promise<void> {
    const entries = this.listeners.get(name) ?? [];
    for (const { listener } of [...entries.filter((e) => !e.last), ...entries.filter((e) => e.last)]) {
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
