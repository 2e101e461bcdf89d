import { Injectable } from '@nestjs/common';
import { eq, sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { docSets, subscriptions } from '../../db/schema/index.js';

/** A stored per-doc-set choice; `pruningWaiting` null means the role's default. */
export interface SubscriptionChoice {
  docSetId: string;
  digest: boolean;
  nothingChanged: boolean;
  pruningWaiting: boolean | null;
}

export type SubscriptionPatch = { docSetId: string } & Partial<Omit<SubscriptionChoice, 'docSetId'>>;

/** Per user and doc set: the digest and pruning-list choices (the `subscriptions` table). */
@Injectable()
export class SubscriptionsRepository {
  constructor(private readonly database: DbService) {}

  async forUser(userId: string): Promise<SubscriptionChoice[]> {
    return this.database.db
      .select({
        docSetId: subscriptions.docSetId,
        digest: subscriptions.digest,
        nothingChanged: subscriptions.nothingChanged,
        pruningWaiting: subscriptions.pruningWaiting,
      })
      .from(subscriptions)
      .where(eq(subscriptions.userId, userId));
  }

  /** Writes each patch over the stored row, or over `defaults(docSetId)` when there is none yet. */
  async apply(userId: string, patches: SubscriptionPatch[], defaults: (docSetId: string) => Omit<SubscriptionChoice, 'docSetId'>) {
    const stored = new Map((await this.forUser(userId)).map((s) => [s.docSetId, s]));
    await this.database.db.transaction(async (tx) => {
      for (const patch of patches) {
        const next = { ...(stored.get(patch.docSetId) ?? { docSetId: patch.docSetId, ...defaults(patch.docSetId) }), ...patch };
        // Without the digest, "also when nothing changed" has nothing to qualify.
        if (!next.digest) next.nothingChanged = false;
        await tx
          .insert(subscriptions)
          .values({ userId, ...next })
          .onConflictDoUpdate({
            target: [subscriptions.userId, subscriptions.docSetId],
            set: { digest: next.digest, nothingChanged: next.nothingChanged, pruningWaiting: next.pruningWaiting },
          });
      }
    });
  }

  async docSets(): Promise<{ id: string; name: string }[]> {
    return this.database.db
      .select({ id: docSets.id, name: docSets.name })
      .from(docSets)
      .orderBy(sql`lower(${docSets.name})`, docSets.id);
  }
}
