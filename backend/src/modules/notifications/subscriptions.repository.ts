import { Injectable } from '@nestjs/common';
import { eq, sql } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { docSets, subscriptions, users } from '../../db/schema/index.js';

export interface SubscriptionChoice {
  docSetId: string;
  digest: boolean;
  nothingChanged: boolean;
}

@Injectable()
export class SubscriptionsRepository {
  constructor(private readonly database: DbService) {}

  async forUser(userId: string): Promise<SubscriptionChoice[]> {
    return this.database.db
      .select({ docSetId: subscriptions.docSetId, digest: subscriptions.digest, nothingChanged: subscriptions.nothingChanged })
      .from(subscriptions)
      .where(eq(subscriptions.userId, userId));
  }

  async replace(userId: string, choices: SubscriptionChoice[]): Promise<void> {
    await this.database.db.transaction(async (tx) => {
      for (const c of choices) {
        await tx
          .insert(subscriptions)
          .values({ userId, ...c })
          .onConflictDoUpdate({
            target: [subscriptions.userId, subscriptions.docSetId],
            set: { digest: c.digest, nothingChanged: c.nothingChanged },
          });
      }
    });
  }

  async docSetIds(): Promise<string[]> {
    return (await this.database.db.select({ id: docSets.id }).from(docSets)).map((r) => r.id);
  }

  /**
   * Who gets the digest of a doc set: explicit choices win; without one, editors and admins get it (the
   * people who triage), writers and viewers do not. Disabled users never do.
   */
  async digestRecipients(docSetId: string): Promise<{ userId: string; email: string; name: string; nothingChanged: boolean }[]> {
    const result = await this.database.db.execute(sql`
      select u.id as "userId", u.email, u.name, coalesce(s.nothing_changed, false) as "nothingChanged"
      from ${users} u left join ${subscriptions} s on s.user_id = u.id and s.doc_set_id = ${docSetId}
      where u.disabled = false and coalesce(s.digest, u.role in ('admin', 'editor'))
      order by u.email`);
    return (result as unknown as { rows: { userId: string; email: string; name: string; nothingChanged: boolean }[] }).rows;
  }
}
